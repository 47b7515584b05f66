import 'reflect-metadata';
import express, { type Express } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import type { DataSource } from 'typeorm';
import { healthRoutes } from './features/health/health.routes';
import { apiNotFound, errorHandler } from './lib/errors';
import { logger } from './lib/logger';
import { webAppRoutes } from './lib/web-app';

export interface AppOptions {
  dataSource: DataSource;
  /** Folder of the Expo web export to serve beside the API; omitted in API-only tests. */
  webDist?: string;
}

/** Builds the Express app without listening, so tests can drive it in-process with supertest. */
export function createApp({ dataSource, webDist }: AppOptions): Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: true,
        directives: {
          // react-native-web writes its styles into a <style> tag at run time.
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'worker-src': ["'self'"],
        },
      },
      crossOriginEmbedderPolicy: false,
    }),
  );
  app.use(pinoHttp({ logger, autoLogging: { ignore: (req) => req.url === '/api/health' } }));

  const api = express.Router();
  api.use(express.json({ limit: '2mb' }));
  api.use(healthRoutes(dataSource));
  api.use(apiNotFound);
  app.use('/api', api);

  if (webDist) app.use(webAppRoutes(webDist));
  app.use(errorHandler);
  return app;
}
