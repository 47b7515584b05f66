import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { read } from '../../shared/engine';

const root = fileURLToPath(new URL('../..', import.meta.url));
const tsx = `${root}node_modules/.bin/tsx`;

function run(args: string[], input: string) {
  const result = spawnSync(tsx, ['scripts/reading.ts', ...args], { cwd: root, input, encoding: 'utf8', timeout: 60_000 });
  return { status: result.status, lines: result.stdout.split('\n').filter((l) => l !== ''), stderr: result.stderr };
}

describe('scripts/reading.ts', () => {
  it('when serials arrive on stdin with --json, then each line gives exactly the fields of issue 3, in order', () => {
    const { status, lines } = run(['--json'], '27272727\nMB 0000 0001 *\n12 34\n');
    expect(status).toBe(0);
    expect(lines).toHaveLength(3);
    const [good, starred, bad] = lines.map((l) => JSON.parse(l));
    expect(Object.keys(good)).toEqual([
      'input', 'ok', 'digits', 'patterns', 'lowTier', 'longestRun', 'maxDigitCount', 'distinctDigits',
      'nearMiss', 'neighbours', 'odds', 'score', 'serial', 'tradeNotes',
    ]);
    expect(Object.keys(good.nearMiss)).toEqual(['binary', 'trinary', 'solid', 'radar', 'repeater', 'ladder', 'super-radar', 'true-binary']);
    expect(Object.keys(good.nearMiss.solid)).toEqual(['distance', 'target', 'positions']);
    expect(Object.keys(good.neighbours.trinary)).toEqual(['below', 'above']);
    const direct = read('27272727');
    if (!direct.ok) throw new Error('must read');
    expect(good).toMatchObject({ input: '27272727', ok: true, patterns: direct.patterns, odds: direct.odds, score: direct.score });
    expect(starred.digits).toBe('00000001');
    expect(bad).toEqual({ input: '12 34', ok: false, error: { code: 'too-few-digits', message: 'A serial has 8 digits; this has 4.' } });
  }, 60_000);

  it('when run without --json, then it prints a header and one table row per serial', () => {
    const { status, lines } = run([], '27272727\n12 34\n');
    expect(status).toBe(0);
    expect(lines[0]).toMatch(/^input\s+digits\s+patterns/);
    expect(lines[1]).toContain('repeater, super repeater, binary');
    expect(lines[2]).toContain('error: A serial has 8 digits');
  }, 60_000);

  it('when asked to --sweep a range, then it lists each hit and a summary', () => {
    const { status, lines } = run(['--sweep', '11111100', '30', '--patterns', 'solid,radar'], '');
    expect(status).toBe(0);
    expect(lines).toContain('11111111  solid, radar');
    expect(lines.at(-1)).toBe('1 hits in 11111100–11111129, 30 serials');
  }, 60_000);

  it('when flags give series, denomination, district, facility and star, then each line carries the serial parts and every trade note the app shows (issue 12)', () => {
    const flags = ['--series', '2013', '--denomination', '1', '--district', 'B', '--facility', 'FW', '--star'];
    const { status, lines } = run(['--json', ...flags], 'B 0025 0000 *\nMB 9700 0000 A\n');
    expect(status).toBe(0);
    const [dup, wrong] = lines.map((l) => JSON.parse(l));
    expect(dup.serial).toEqual({ prefix: 'B', seriesLetter: null, district: 'B', suffix: '', star: true });
    const direct = read('B 0025 0000 *', { series: '2013', denomination: 1, district: 'B', facility: 'FW', star: true });
    if (!direct.ok) throw new Error('must read');
    expect(dup.tradeNotes).toEqual(direct.trade.map(({ id, severity, text, source }) => ({ id, severity, text, source })));
    expect(dup.tradeNotes.map((n: { id: string }) => n.id)).toContain('duplicate-star-serials');
    for (const note of dup.tradeNotes) {
      expect(Object.keys(note)).toEqual(['id', 'severity', 'text', 'source']);
      expect(['info', 'check', 'warning']).toContain(note.severity);
    }
    expect(wrong.serial).toEqual({ prefix: 'MB', seriesLetter: 'M', district: 'B', suffix: 'A', star: true });
    const ids = wrong.tradeNotes.map((n: { id: string }) => n.id);
    expect(ids).toContain('serial-format');
    expect(ids).toContain('run-end');
    expect(wrong.tradeNotes.find((n: { id: string }) => n.id === 'serial-format').text).toContain('$1 notes carry one prefix letter: the district');
  }, 60_000);

  it('when a sweep is given a denomination, then it stops at that denomination’s run end', () => {
    const { status, lines } = run(['--sweep', '95999990', '100', '--patterns', 'solid,trinary', '--denomination', '20'], '');
    expect(status).toBe(0);
    expect(lines.at(-1)).toContain('(stopped at 96000000)');
  }, 60_000);

  it('when an option is wrong, then it exits 2 with the reason', () => {
    const { status, stderr } = run(['--low-limit', '50'], '');
    expect(status).toBe(2);
    expect(stderr).toContain('--low-limit must be');
  }, 60_000);
});
