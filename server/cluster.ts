import cluster, { type Worker } from 'node:cluster';
import os from 'node:os';
import { ConfigError, config } from './config';
import { logger } from './lib/logger';

/**
 * npm start: WORKERS app processes (default one per core) on one port with Node's cluster module. The
 * processes share nothing in memory that matters: limits, sessions and data live in PostgreSQL, so a
 * worker can die and be replaced, and the same code runs as N hosts behind a balancer (docs/SCALING.md).
 */
function primary(): void {
  let settings;
  try {
    // Checked once here, so a bad setting stops the start instead of a crash loop of workers.
    settings = config();
  } catch (error) {
    console.error(error instanceof ConfigError ? error.message : error);
    process.exit(1);
  }
  const count = settings.WORKERS || os.availableParallelism();
  let stopping = false;
  const started = new Map<number, number>();

  const fork = (): Worker => {
    const worker = cluster.fork();
    started.set(worker.id, Date.now());
    return worker;
  };

  cluster.on('exit', (worker, code, signal) => {
    const lived = Date.now() - (started.get(worker.id) ?? 0);
    started.delete(worker.id);
    if (stopping) return;
    logger.warn({ worker: worker.process.pid, code, signal, livedMs: lived }, 'an app process died; starting another');
    // A worker that dies at once (database unreachable) is restarted after a pause, not in a tight loop.
    setTimeout(fork, lived < 5000 ? 2000 : 0);
  });

  const stop = (signal: NodeJS.Signals) => {
    if (stopping) return;
    stopping = true;
    logger.info({ signal, workers: Object.keys(cluster.workers ?? {}).length }, 'stopping every app process');
    for (const worker of Object.values(cluster.workers ?? {})) worker?.process.kill('SIGTERM');
    const check = setInterval(() => {
      if (Object.keys(cluster.workers ?? {}).length === 0) process.exit(0);
    }, 100);
    setTimeout(() => {
      clearInterval(check);
      process.exit(1);
    }, 15_000).unref();
  };
  process.on('SIGINT', () => stop('SIGINT'));
  process.on('SIGTERM', () => stop('SIGTERM'));

  logger.info({ workers: count }, 'starting app processes');
  for (let index = 0; index < count; index++) fork();
}

if (cluster.isPrimary) primary();
else void import('./main');
