import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';
import { BaseSequencer, type TestSpecification } from 'vitest/node';
import { START_RANK, laneOf } from './test/support/e2e-lane-plan.mjs';

const alias = {
  '@shared': fileURLToPath(new URL('./shared', import.meta.url)),
  '@': fileURLToPath(new URL('./src', import.meta.url)),
};

/** Vitest's own order (failed first, then longest first), with the browser files started lane by lane. */
class BrowserLanesSequencer extends BaseSequencer {
  override async sort(files: TestSpecification[]): Promise<TestSpecification[]> {
    const sorted = await super.sort(files);
    const browser = sorted.filter((spec) => spec.project.name === 'e2e');
    // The browser project is a group of its own, last; Array.prototype.sort is stable, so within a lane Vitest's order stands.
    browser.sort((a, b) => START_RANK[laneOf(a.moduleId)] - START_RANK[laneOf(b.moduleId)]);
    return [...sorted.filter((spec) => spec.project.name !== 'e2e'), ...browser];
  }
}

// Kinds of test with different needs: the engine is pure and parallel; the server's files share one real
// PostgreSQL database and run side by side, each with accounts of its own (a file whose checks cover whole
// tables makes a database of its own: openScratchApi); components need a DOM; the browser tests drive
// Chromium against the served app.
export default defineConfig({
  resolve: { alias },
  test: {
    // Two files at a time in every project: the machine has two cores (and more would only queue on PostgreSQL).
    maxWorkers: 2,
    sequence: { sequencer: BrowserLanesSequencer },
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
          // Two files at a time against the one served app; each file first takes its lane, so files that
          // share the demo accounts, or time the page, never overlap (test/support/e2e-lanes.ts).
          // After every other project (its own group), so the timed files never share the machine with server tests.
          sequence: { groupOrder: 1 },
          setupFiles: ['test/support/e2e-lanes.ts'],
          testTimeout: 120_000,
          hookTimeout: 120_000,
        },
      },
    ],
  },
});
