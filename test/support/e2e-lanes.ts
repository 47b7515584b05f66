import { mkdir, readdir, readFile, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll } from 'vitest';
import { laneOf } from './e2e-lane-plan.mjs';

/**
 * Each browser-test file takes its lane (e2e-lane-plan.mts) before it starts and gives it back at the end:
 * - the "demo" mutex, held by one "demo" or "alone" file at a time;
 * - the machine, held shared by every "own" and "demo" file and alone by an "alone" file.
 * An "alone" file takes the demo mutex first, then the machine, and no file waits for the demo mutex while
 * holding the machine, so no two files can each hold one and wait for the other.
 * Everything is a folder or a file under the system's temporary folder, one set per served app (E2E_PORT),
 * holding the owner's pid, so a holder that died (a killed run) is passed over.
 */
const base = join(tmpdir(), `strapsift-e2e-${process.env.E2E_PORT ?? 'default'}`);
const demoMutex = `${base}-demo.lock`;
const aloneMutex = `${base}-alone.lock`;
const sharers = `${base}-sharers`;

const pause = () => new Promise((resolve) => setTimeout(resolve, 200));

function alive(pid: number): boolean {
  if (!pid) return false;
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

const pidIn = async (file: string) => Number(await readFile(file, 'utf8').catch(() => '0'));

/** mkdir is atomic: whoever creates the folder holds the mutex. */
async function lock(dir: string): Promise<void> {
  for (;;) {
    try {
      await mkdir(dir);
      await writeFile(join(dir, 'pid'), String(process.pid));
      return;
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
    }
    const holder = await pidIn(join(dir, 'pid'));
    // A folder without a pid yet is being taken right now; one whose pid is gone was left by a killed run.
    if (holder && !alive(holder)) await rm(dir, { recursive: true, force: true });
    else await pause();
  }
}

async function unlock(dir: string): Promise<void> {
  if ((await pidIn(join(dir, 'pid'))) === process.pid) await rm(dir, { recursive: true, force: true });
}

/** The machine, shared: say so first, then step back and wait while an "alone" file holds or wants it. */
async function share(): Promise<void> {
  await mkdir(sharers, { recursive: true });
  const mine = join(sharers, String(process.pid));
  for (;;) {
    await writeFile(mine, String(process.pid));
    const holder = await pidIn(join(aloneMutex, 'pid'));
    if (!holder || !alive(holder)) return;
    await rm(mine, { force: true });
    await pause();
  }
}

/** The machine, alone: claim it, then wait until every file sharing it has finished. */
async function takeAlone(): Promise<void> {
  await lock(aloneMutex);
  await mkdir(sharers, { recursive: true });
  for (;;) {
    const others = (await readdir(sharers)).map(Number).filter((pid) => pid !== process.pid && alive(pid));
    if (others.length === 0) return;
    await pause();
  }
}

let release: Array<() => Promise<void>> = [];

async function takeLanes(file: string): Promise<void> {
  const lane = laneOf(file);
  if (lane !== 'own') {
    await lock(demoMutex);
    release.push(() => unlock(demoMutex));
  }
  if (lane === 'alone') {
    await takeAlone();
    release.push(() => unlock(aloneMutex));
  } else {
    await share();
    release.push(() => rm(join(sharers, String(process.pid)), { force: true }));
  }
}

// The first argument is the fixture context (vitest insists on a destructuring pattern there); the file is in the second.
// A file may wait for the whole of one or two other files before it starts. Lanes are taken before the file's own
// preparation too (the camera's card video takes about 20 s of drawing): taken later, that drawing would share the
// machine with a file that is timing the page.
// eslint-disable-next-line no-empty-pattern
beforeAll(async ({}, suite) => {
  await takeLanes(suite.file.filepath);
}, 600_000);

afterAll(async () => {
  for (const give of release.reverse()) await give();
  release = [];
});
