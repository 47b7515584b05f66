import { spawnSync } from 'node:child_process';
import { describe, expect, it } from 'vitest';

const run = (script: string, ...args: string[]) =>
  spawnSync(process.execPath, ['--import', 'tsx', script, ...args], { encoding: 'utf8', timeout: 60_000, env: { ...process.env, PGPORT: '1' } });

describe("the scripts' flags (node:util parseArgs)", () => {
  it('when the load run is asked for --help, then it prints its usage and exits without starting a run', () => {
    // PGPORT points nowhere: a run that started would fail to reach a database instead of exiting 0.
    const result = run('test/load/load.ts', '--help');
    expect(result.status).toBe(0);
    expect(result.stdout).toMatch(/^usage: npm run load/);
    expect(result.stdout).toContain('--seconds N');
  });

  it('when the load run gets an unknown flag or a bad number, then it stops with the usage and exit code 2', () => {
    const unknown = run('test/load/load.ts', '--secs', '5');
    expect(unknown.status).toBe(2);
    expect(unknown.stderr).toMatch(/Unknown option '--secs'[\s\S]*usage: npm run load/);
    const bad = run('test/load/load.ts', '--seconds', 'ten');
    expect(bad.status).toBe(2);
    expect(bad.stderr).toContain('--seconds must be a positive whole number');
  });

  it('when the engine bench is asked for --help, then it prints its usage and measures nothing', () => {
    const result = run('test/bench/engine/engine-bench.ts', '--help');
    expect(result.status).toBe(0);
    expect(result.stdout).toMatch(/^usage: npm run bench/);
  });
});
