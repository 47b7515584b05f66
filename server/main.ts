import 'reflect-metadata';
import { ConfigError, config } from './config';
import { createApp } from './app';
import { AppDataSource } from './db/data-source';
import { logger } from './lib/logger';
import { sweepExpiredLimits } from './lib/rate-limit';
import type { Services } from './services';

/** One app process: npm start runs several of these under server/cluster.ts; tests and rigs run one. */
async function main(): Promise<void> {
  const settings = config();
  await AppDataSource.initialize();
  const app = createApp({ dataSource: AppDataSource, webDist: settings.WEB_DIST });
  const server = app.listen(settings.PORT, settings.HOST, () => {
    logger.info({ url: settings.PUBLIC_URL }, 'Strapsift is listening');
  });
  // A client that dribbles its headers or body cannot hold a socket for long; keep-alive stays shorter
  // than a typical balancer's idle timeout so the balancer, not us, closes idle connections first.
  server.headersTimeout = settings.HEADERS_TIMEOUT_MS;
  server.requestTimeout = settings.REQUEST_TIMEOUT_MS;
  server.keepAliveTimeout = 65_000;

  // Expired rate-limit counters are deleted now and then; every process may do it, the DELETE is idempotent.
  const sweep = setInterval(() => void sweepExpiredLimits(AppDataSource).catch(() => undefined), 5 * 60 * 1000 + Math.random() * 60_000);
  sweep.unref();

  let stopping = false;
  const stop = (signal: string) => {
    if (stopping) return;
    stopping = true;
    logger.info({ signal }, 'stopping: no new connections, finishing requests in flight');
    clearInterval(sweep);
    // Stop accepting, let requests in flight finish, then close the pool.
    server.close(() => {
      const services = app.locals.services as Services;
      void services.passwordReset
        .settled()
        .then(() => AppDataSource.destroy())
        .finally(() => process.exit(0));
    });
    server.closeIdleConnections();
    // A request that never ends must not hold the stop forever.
    setTimeout(() => {
      server.closeAllConnections();
      process.exit(1);
    }, 10_000).unref();
  };
  process.on('SIGINT', () => stop('SIGINT'));
  process.on('SIGTERM', () => stop('SIGTERM'));
}

main().catch((error: unknown) => {
  if (error instanceof ConfigError) {
    console.error(error.message);
  } else {
    logger.fatal({ err: error }, 'Strapsift failed to start');
  }
  process.exit(1);
});
