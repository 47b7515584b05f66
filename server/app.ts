import 'reflect-metadata';
import express, { type Express } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import type { DataSource } from 'typeorm';
import { adminRoutes } from './features/admin/admin.routes';
import { authRoutes } from './features/auth/auth.routes';
import type { ResetMailer } from './features/auth/reset-mailer';
import { crewRoutes } from './features/crew/crew.routes';
import { invitesRoutes } from './features/crew/invites.routes';
import { huntSummaryRoutes } from './features/hunts/hunt-summary';
import { healthRoutes } from './features/health/health.routes';
import { huntsRoutes } from './features/hunts/hunts.routes';
import { keepersRoutes } from './features/keepers/keepers.routes';
import { photosRoutes } from './features/photos/photos.routes';
import { scansRoutes } from './features/scans/scans.routes';
import { shareRoutes } from './features/share/share.routes';
import { strapsRoutes } from './features/straps/straps.routes';
import { tallyRoutes } from './features/tally/tally.routes';
import { archiveRoutes } from './features/transfer/archive.routes';
import { transferRoutes } from './features/transfer/transfer.routes';
import { usersRoutes } from './features/users/users.routes';
import { watchRoutes } from './features/watch/watch.routes';
import { weightsRoutes } from './features/weights/weights.routes';
import { requireAuth } from './lib/auth-middleware';
import { apiNotFound, errorHandler } from './lib/errors';
import { logger, scrubUrl, serializeError } from './lib/logger';
import type { Mailer } from './lib/mail';
import type { ObjectStore } from './lib/object-store';
import { createLimits, DEFAULT_LIMITS, type LimitRules } from './lib/rate-limit';
import { rejectControlCharacters } from './lib/text-hygiene';
import { webAppRoutes } from './lib/web-app';
import { config } from './config';
import { createServices } from './services';

export interface AppOptions {
  dataSource: DataSource;
  /** Folder of the Expo web export to serve beside the API; omitted in API-only tests. */
  webDist?: string;
  /** Where password-reset messages go; by default rendered and sent through `mailer`. */
  resetMailer?: ResetMailer;
  /** Where mail goes; by default SMTP from the config (locally the mail catcher). */
  mailer?: Mailer;
  /** Where photo bytes go; by default S3 from the config (locally the s3rver fake). */
  objectStore?: ObjectStore;
  /** Addresses of proxies whose X-Forwarded-For is believed (Express `trust proxy`); by default TRUSTED_PROXIES, else none. */
  trustedProxies?: string[];
  /** The rate limits; by default DEFAULT_LIMITS. */
  limits?: LimitRules;
  /** Prefix of this app's counters in the shared rate_limits table; tests give each app its own. */
  limitNamespace?: string;
}

/** Builds the Express app without listening, so tests can drive it in-process with supertest. */
export function createApp({ dataSource, webDist, resetMailer, mailer, objectStore, trustedProxies, limits: limitRules, limitNamespace }: AppOptions): Express {
  const app = express();
  app.disable('x-powered-by');
  // X-Forwarded-For is believed only from the proxies named in the configuration; by default from none,
  // so a client cannot pick its own address to dodge the per-client limits.
  const proxies = trustedProxies ?? config().TRUSTED_PROXIES;
  app.set('trust proxy', proxies.length ? proxies : false);
  app.use(
    helmet({
      contentSecurityPolicy: {
        useDefaults: true,
        directives: {
          // react-native-web writes its styles into a <style> tag at run time.
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'worker-src': ["'self'"],
          // The camera's recogniser is WebAssembly compiled in its worker; 'wasm-unsafe-eval' allows exactly
          // that and no JavaScript eval. Its worker script is our own file, so worker-src stays 'self'.
          'script-src': ["'self'", "'wasm-unsafe-eval'"],
        },
      },
      crossOriginEmbedderPolicy: false,
    }),
  );
  app.use(
    pinoHttp({
      logger,
      autoLogging: { ignore: (req) => req.url === '/api/health' },
      // Share, invitation and reset links carry their secret in the address: it never reaches a log line.
      serializers: {
        // One short line a request: method, scrubbed address and status; headers stay out of the log.
        req: (req: { id?: unknown; method?: string; url?: string }) => ({ id: req.id, method: req.method, url: scrubUrl(req.url ?? '') }),
        res: (res: { statusCode?: number }) => ({ statusCode: res.statusCode }),
        err: serializeError,
      },
    }),
  );

  const api = express.Router();
  api.use(express.json({ limit: '2mb' }));
  api.use(rejectControlCharacters);
  const limits = createLimits(dataSource, limitRules ?? DEFAULT_LIMITS, limitNamespace);
  const services = createServices(dataSource, { resetMailer, mailer, objectStore, limits });
  // Tests wait on background work (reset mails go out after the answer) through this.
  app.locals.services = services;
  const authed = requireAuth(dataSource);
  api.use(healthRoutes(dataSource));
  api.use(authRoutes(services.auth, services.passwordReset, services.sessions, limits, authed));
  api.use(usersRoutes(services.users, services.sessions, authed, limits.reset));
  api.use(huntsRoutes(services.hunts, authed));
  api.use(crewRoutes(services.crew, authed));
  api.use(invitesRoutes(services.invites, authed));
  api.use(huntSummaryRoutes(services.huntSummary, authed));
  api.use(strapsRoutes(services.straps, authed));
  api.use(scansRoutes(services.scans, authed, limits));
  api.use(tallyRoutes(services.tally, authed));
  // Photos and share links before the keepers' own routes, which guard all of /keepers themselves.
  api.use(photosRoutes(services.photos, authed));
  api.use(shareRoutes(services.share, authed));
  api.use(keepersRoutes(services.keepers, authed));
  api.use(transferRoutes(services.exporter, services.importer, authed));
  api.use(archiveRoutes(services.archives.exporter, services.archives.importer, authed));
  api.use(weightsRoutes(services.weights, authed));
  api.use(watchRoutes(services.watch, authed));
  api.use(adminRoutes(services.admin, authed));
  api.use(apiNotFound);
  app.use('/api', api);

  if (webDist) app.use(webAppRoutes(webDist));
  app.use(errorHandler);
  return app;
}
