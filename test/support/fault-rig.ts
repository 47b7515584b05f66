import { execFileSync, spawn, type ChildProcess } from 'node:child_process';
import http from 'node:http';
import { chmodSync, chownSync, existsSync, mkdirSync, readdirSync, rmSync } from 'node:fs';
import { resolve } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { ApiError } from '../../src/lib/api/api-error';
import type { BatchAnswer, QueueTransport } from '../../src/lib/storage/scan-queue';

const root = resolve(__dirname, '../..');

function pgBin(): string {
  const versions = readdirSync('/usr/lib/postgresql').sort((a, b) => Number(b) - Number(a));
  for (const version of versions) {
    const bin = `/usr/lib/postgresql/${version}/bin`;
    if (existsSync(`${bin}/initdb`)) return bin;
  }
  throw new Error('PostgreSQL binaries not found (npm test installs them)');
}

const asRoot = process.getuid?.() === 0;

/** Runs a PostgreSQL tool as the postgres user when we are root (initdb and postgres refuse root). */
function pg(tool: string, args: string[]): void {
  const bin = `${pgBin()}/${tool}`;
  if (asRoot) execFileSync('runuser', ['-u', 'postgres', '--', bin, ...args], { stdio: 'pipe' });
  else execFileSync(bin, args, { stdio: 'pipe' });
}

/**
 * A PostgreSQL cluster of its own under .data/, so a fault test can restart it without touching
 * the cluster every other test uses.
 */
export class OwnCluster {
  readonly dir: string;
  readonly socketDir: string;
  readonly url: string;

  constructor(
    readonly name: string,
    readonly port: number,
  ) {
    this.dir = resolve(root, `.data/${name}`);
    this.socketDir = resolve(root, `.data/${name}-socket`);
    this.url = `postgres://postgres@127.0.0.1:${port}/strapsift`;
  }

  start(): void {
    rmSync(this.dir, { recursive: true, force: true });
    mkdirSync(this.dir, { recursive: true });
    mkdirSync(this.socketDir, { recursive: true });
    if (asRoot) {
      const pwUid = Number(execFileSync('id', ['-u', 'postgres']).toString().trim());
      const pwGid = Number(execFileSync('id', ['-g', 'postgres']).toString().trim());
      chownSync(this.dir, pwUid, pwGid);
      chownSync(this.socketDir, pwUid, pwGid);
      chmodSync(this.dir, 0o700);
    }
    pg('initdb', ['-D', this.dir, '-U', 'postgres', '--auth=trust', '-E', 'UTF8', '--locale=C.UTF-8']);
    this.up();
    execFileSync(`${pgBin()}/psql`, ['-h', '127.0.0.1', '-p', String(this.port), '-U', 'postgres', '-qc', 'CREATE DATABASE strapsift'], { stdio: 'pipe' });
  }

  private up(): void {
    pg('pg_ctl', ['-D', this.dir, '-l', `${this.dir}/server.log`, '-w', '-t', '60', '-o', `-p ${this.port} -k ${this.socketDir} -c listen_addresses=127.0.0.1`, 'start']);
  }

  /** A fast restart: open connections are cut, as in a crash-and-recover of the database. */
  restart(): void {
    pg('pg_ctl', ['-D', this.dir, '-m', 'fast', '-w', '-t', '60', 'stop']);
    this.up();
  }

  stop(): void {
    try {
      pg('pg_ctl', ['-D', this.dir, '-m', 'fast', '-w', 'stop']);
    } catch {
      // already stopped
    }
    rmSync(this.dir, { recursive: true, force: true });
    rmSync(this.socketDir, { recursive: true, force: true });
  }
}

export interface ApiProcessOptions {
  /** server/main.ts (one process) or server/cluster.ts (WORKERS processes on one port). */
  script?: 'server/main.ts' | 'server/cluster.ts';
  /** Keep what the process writes (its log) in `output`. */
  capture?: boolean;
}

/** The API as its own process (server/main.ts), so it can be killed and started again. */
export class ApiProcess {
  private child: ChildProcess | null = null;
  readonly baseUrl: string;
  /** Everything the process wrote, when started with `capture`. */
  readonly output: string[] = [];

  constructor(
    readonly port: number,
    private readonly env: Record<string, string>,
    private readonly options: ApiProcessOptions = {},
  ) {
    this.baseUrl = `http://127.0.0.1:${port}`;
  }

  async start(): Promise<void> {
    if (await this.answers()) throw new Error(`port ${this.port} already has a server; the fault test needs it free`);
    // node --import tsx, not the tsx binary: the binary runs the server in a child process, and
    // killing the parent would leave the server answering.
    this.child = spawn(process.execPath, ['--import', 'tsx', this.options.script ?? 'server/main.ts'], {
      cwd: root,
      env: { ...process.env, LOG_LEVEL: 'silent', ...this.env, PORT: String(this.port), HOST: '127.0.0.1', WEB_DIST: '.data/no-web' },
      stdio: this.options.capture ? ['ignore', 'pipe', 'pipe'] : 'ignore',
    });
    const keep = (chunk: Buffer) => this.output.push(chunk.toString('utf8'));
    this.child.stdout?.on('data', keep);
    this.child.stderr?.on('data', keep);
    for (let attempt = 0; attempt < 300; attempt++) {
      try {
        const response = await fetch(`${this.baseUrl}/api/health`);
        if (response.ok) return;
      } catch {
        // not listening yet
      }
      await sleep(100);
    }
    // Never leave it behind: a cluster's primary would go on starting workers after the test run ends.
    await this.stop();
    throw new Error(`the API on port ${this.port} did not start`);
  }

  private async answers(): Promise<boolean> {
    try {
      await fetch(`${this.baseUrl}/api/health`, { signal: AbortSignal.timeout(500) });
      return true;
    } catch {
      return false;
    }
  }

  async stop(signal: NodeJS.Signals = 'SIGKILL'): Promise<void> {
    const child = this.child;
    if (!child || child.exitCode !== null) return;
    const exited = new Promise<void>((done) => child.once('exit', () => done()));
    // SIGKILL by default, not a polite stop: the point is a process that dies mid-request.
    child.kill(signal);
    await exited;
    this.child = null;
  }

  async restart(): Promise<void> {
    await this.stop();
    await this.start();
  }
}

/** The pid that answers /api/health on a fresh connection (no keep-alive), so a cluster can hand it to any worker. */
export function healthPid(baseUrl: string): Promise<number | null> {
  return new Promise((resolve) => {
    const req = http.get(`${baseUrl}/api/health`, { agent: false, timeout: 2000 }, (res) => {
      let text = '';
      res.on('data', (chunk: Buffer) => (text += chunk.toString()));
      res.on('end', () => resolve(res.statusCode === 200 ? (JSON.parse(text) as { pid: number }).pid : null));
    });
    req.on('timeout', () => req.destroy());
    req.on('error', () => resolve(null));
  });
}

/** Kills one worker of a clustered API (SIGKILL, mid-request); the cluster's primary starts another. */
export async function killOneWorker(baseUrl: string): Promise<number> {
  for (let attempt = 0; attempt < 100; attempt++) {
    const pid = await healthPid(baseUrl);
    if (pid) {
      process.kill(pid, 'SIGKILL');
      return pid;
    }
    await sleep(100);
  }
  throw new Error('no worker answered /api/health');
}

/** The app's queue transport, over plain fetch from Node, with the same error shapes as the app's client. */
export function fetchTransport(baseUrl: string, token: string): QueueTransport {
  async function call(method: string, path: string, body?: unknown): Promise<unknown> {
    let response: Response;
    try {
      response = await fetch(`${baseUrl}/api${path}`, {
        method,
        headers: { 'Content-Type': 'application/json', Authorization: `Bearer ${token}` },
        body: body === undefined ? undefined : JSON.stringify(body),
        signal: AbortSignal.timeout(15_000),
      });
    } catch {
      throw new ApiError(0, 'offline', 'no connection');
    }
    const text = await response.text();
    if (!response.ok) throw new ApiError(response.status, 'http_error', text.slice(0, 200));
    return text ? JSON.parse(text) : null;
  }
  return {
    upload: async (scans) => (await call('POST', '/scans/batch', { scans })) as BatchAnswer,
    remove: async (id) => {
      try {
        await call('DELETE', `/scans/${id}`);
      } catch (error) {
        if (error instanceof ApiError && error.status === 404) return;
        throw error;
      }
    },
  };
}

export function memoryStorage() {
  const data = new Map<string, string>();
  return {
    async get<T>(key: string): Promise<T | null> {
      const raw = data.get(key);
      return raw ? (JSON.parse(raw) as T) : null;
    },
    async set(key: string, value: unknown): Promise<void> {
      data.set(key, JSON.stringify(value));
    },
  };
}
