import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { appVersion } from '../../lib/version';

export function healthRoutes(dataSource: DataSource): Router {
  const router = Router();
  router.get('/health', async (_req, res) => {
    try {
      // A real round trip, so "ok" means the database answers, not merely that it was configured.
      await dataSource.query('SELECT 1');
      res.json({ ok: true, db: 'up', version: appVersion, pid: process.pid });
    } catch {
      res.status(503).json({ ok: false, db: 'down', version: appVersion, pid: process.pid });
    }
  });
  return router;
}
