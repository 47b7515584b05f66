import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

const alias = {
  '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
  '@': fileURLToPath(new URL('./src', import.meta.url)),
};

// Three kinds of test with different needs: the engine is pure and parallel,
// the server shares one real PostgreSQL database (so its files run one at a time),
// components need a DOM, and the browser tests drive Chromium against the served app.
export default defineConfig({
  resolve: { alias },
  test: {
    projects: [
      {
        resolve: { alias },
        test: { name: 'engine', include: ['test/engine/**/*.test.ts'], environment: 'node' },
      },
      {
        resolve: { alias },
        // The camera's recogniser in Node: card accuracy on a fixed subset, the parser, the CLI.
        test: { name: 'camera', include: ['test/camera/**/*.test.ts'], environment: 'node', testTimeout: 180_000 },
      },
      {
        resolve: { alias },
        test: {
          name: 'server',
          include: ['test/server/**/*.test.ts'],
          environment: 'node',
          fileParallelism: false,
          testTimeout: 30_000,
          hookTimeout: 60_000,
        },
      },
      {
        resolve: {
          // The components run as they do in the web export: react-native-web and .web files first.
          alias: { ...alias, 'react-native': 'react-native-web' },
          extensions: ['.web.tsx', '.web.ts', '.web.js', '.tsx', '.ts', '.mjs', '.js', '.json'],
        },
        define: { __DEV__: 'true', 'process.env.EXPO_OS': '"web"' },
        test: {
          name: 'components',
          include: ['test/components/**/*.test.{ts,tsx}'],
          // react-native-svg's CommonJS build requires react-native; inlining lets the alias above apply.
          server: { deps: { inline: ['react-native-svg'] } },
          environment: 'happy-dom',
          setupFiles: ['test/support/components-setup.ts'],
        },
      },
      {
        resolve: { alias },
        test: {
          name: 'e2e',
          include: ['test/e2e/**/*.test.ts'],
          environment: 'node',
          fileParallelism: false,
          testTimeout: 120_000,
          hookTimeout: 120_000,
        },
      },
    ],
  },
});
