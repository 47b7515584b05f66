import 'reflect-metadata';
import { ConfigError, config } from './config';
import { createApp } from './app';
import { AppDataSource } from './db/data-source';
import { logger } from './lib/logger';

async function main(): Promise<void> {
  const settings = config();
  await AppDataSource.initialize();
  const app = createApp({ dataSource: AppDataSource, webDist: settings.WEB_DIST });
  const server = app.listen(settings.PORT, settings.HOST, () => {
    logger.info({ url: settings.PUBLIC_URL }, 'Strapsift is listening');
  });

  const stop = (signal: string) => {
    logger.info({ signal }, 'stopping');
    server.close(() => {
      void AppDataSource.destroy().finally(() => process.exit(0));
    });
    // Keep-alive sockets can hold close() open; don't let a stop hang.
    setTimeout(() => process.exit(0), 3000).unref();
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
