import { execFile } from 'node:child_process';
import { existsSync, readdirSync } from 'node:fs';
import { join } from 'node:path';
import { promisify } from 'node:util';

const run = promisify(execFile);

/** PostgreSQL's own tools: PG_BIN as scripts/lib/common.sh finds it, else the newest installed version. */
export function pgTool(name: 'pg_dump' | 'pg_restore'): string {
  const fromEnv = process.env.PG_BIN;
  if (fromEnv && existsSync(join(fromEnv, name))) return join(fromEnv, name);
  const root = '/usr/lib/postgresql';
  const versions = existsSync(root) ? readdirSync(root).sort((a, b) => Number(a) - Number(b)) : [];
  for (const version of versions.reverse()) {
    const path = join(root, version, 'bin', name);
    if (existsSync(path)) return path;
  }
  return name;
}

export async function runTool(name: 'pg_dump' | 'pg_restore', args: string[]): Promise<void> {
  try {
    await run(pgTool(name), args, { maxBuffer: 16 * 1024 * 1024 });
  } catch (error) {
    const stderr = (error as { stderr?: string }).stderr?.trim();
    throw new Error(`${name} failed${stderr ? `: ${stderr}` : ''}`);
  }
}
