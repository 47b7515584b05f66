import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

const alias = {
  '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
  '@': fileURLToPath(new URL('./src', import.meta.url)),
};

// Kinds of test with different needs: the engine is pure and parallel; the server's files share one real
// PostgreSQL database and run side by side, each with accounts of its own (a file whose checks cover whole
// tables makes a database of its own: openScratchApi); components need a DOM; the browser tests drive
// Chromium against the served app.
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
          // Two files at a time: the machine has two cores, and more would only queue on PostgreSQL.
          maxWorkers: 2,
          // A group of its own, so a machine with more cores (a different default for the others) still starts.
          sequence: { groupOrder: 1 },
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
