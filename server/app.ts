import 'reflect-metadata';
import express, { type Express } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import type { DataSource } from 'typeorm';
import { authRoutes } from './features/auth/auth.routes';
import { healthRoutes } from './features/health/health.routes';
import { usersRoutes } from './features/users/users.routes';
import { requireAuth } from './lib/auth-middleware';
import { apiNotFound, errorHandler } from './lib/errors';
import { logger } from './lib/logger';
import { webAppRoutes } from './lib/web-app';
import { createServices } from './services';

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
  const services = createServices(dataSource);
  const authed = requireAuth(dataSource);
  api.use(healthRoutes(dataSource));
  api.use(authRoutes(services.auth));
  api.use(usersRoutes(services.users, authed));
  api.use(apiNotFound);
  app.use('/api', api);

  if (webDist) app.use(webAppRoutes(webDist));
  app.use(errorHandler);
  return app;
}
