import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { cardSpecs, expectedSerial } from './cards/card-specs';
import { drawCard } from './cards/draw-card';

const root = fileURLToPath(new URL('../..', import.meta.url));
let dir: string;
const cards = cardSpecs('clean', 3, 777);

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'strapsift-read-image-'));
  for (const card of cards) writeFileSync(join(dir, `card-${card.index}.jpg`), await drawCard(card));
  writeFileSync(join(dir, 'not-a-picture.jpg'), 'these bytes are text, not a JPEG');
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function run(args: string[]) {
  const result = spawnSync('npm', ['run', '--silent', 'read-image', '--', ...args], { cwd: root, encoding: 'utf8', timeout: 120_000 });
  return { status: result.status, lines: result.stdout.split('\n').filter(Boolean), stderr: result.stderr };
}

describe('npm run read-image', () => {
  it('when given cards, a broken file and a missing one with --json, then one object per file comes back in order and the run completes', () => {
    const files = [join(dir, 'card-0.jpg'), join(dir, 'not-a-picture.jpg'), join(dir, 'card-1.jpg'), join(dir, 'missing.png'), join(dir, 'card-2.jpg')];
    const { status, lines } = run(['--json', ...files]);
    expect(status).toBe(0);
    const results = lines.map((line) => JSON.parse(line));
    expect(results.map((r) => r.file)).toEqual(files);
    for (const [position, card] of [[0, cards[0]!], [2, cards[1]!], [4, cards[2]!]] as const) {
      const r = results[position];
      expect(Object.keys(r)).toEqual(['file', 'ok', 'serial', 'prefix', 'digits', 'suffix', 'star', 'confidence', 'accepted']);
      expect(r.ok).toBe(true);
      expect(r.digits).toBe(card.digits);
      // An accepted read must be the serial printed on the card.
      if (r.accepted) expect(r.serial).toBe(expectedSerial(card));
      expect(r.confidence).toBeGreaterThan(0);
      expect(r.confidence).toBeLessThanOrEqual(1);
    }
    expect(results[1]).toMatchObject({ ok: false, serial: null, accepted: false, reason: 'not a picture this tool can open' });
    expect(results[3]).toMatchObject({ ok: false, reason: 'no such file' });
  }, 120_000);

  it('when run with no file, then it explains its usage and exits 2', () => {
    const { status, stderr } = run([]);
    expect(status).toBe(2);
    expect(stderr).toContain('Usage: npm run --silent read-image');
  }, 60_000);
});
