import { basename } from 'node:path';

/**
 * Which browser-test files may run beside which (they run two at a time against one served app and one
 * seeded database; test/support/e2e-lanes.ts enforces this, the sequencer in vitest.config.mts uses the order):
 * - "own": files that use only accounts they create (or only read the demo accounts); they run beside anything
 *   but an "alone" file.
 * - "alone": files that time the page (key-to-paint, typing at 13 notes a second, a fake camera at 10 frames a
 *   second) and need the machine to themselves.
 * - "demo": every other file, the safe default: files that change the demo accounts' data or check exact
 *   figures of it (or the admin console's totals); one at a time, beside "own" files.
 */
export type Lane = 'own' | 'alone' | 'demo';

const OWN = new Set(['accessibility', 'import', 'invitations', 'photos']);
const ALONE = new Set(['sift', 'sift-fast-typing', 'camera-sift']);

export function laneOf(file: string): Lane {
  const name = basename(file).replace(/\.test\.ts$/, '');
  if (ALONE.has(name)) return 'alone';
  return OWN.has(name) ? 'own' : 'demo';
}

/**
 * Start order: the "alone" files first (nothing else can run meanwhile anyway), then the "own" files (the
 * accessibility sweep, the longest file, starts early), then the "demo" files, which take turns beside them.
 */
export const START_RANK: Record<Lane, number> = { alone: 0, own: 1, demo: 2 };
