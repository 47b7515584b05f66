import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { appVersion } from '../../lib/version';
import { databaseAnswers } from './health.service';

export function healthRoutes(dataSource: DataSource): Router {
  const router = Router();
  router.get('/health', async (_req, res) => {
    if (await databaseAnswers(dataSource)) res.json({ ok: true, db: 'up', version: appVersion, pid: process.pid });
    else res.status(503).json({ ok: false, db: 'down', version: appVersion, pid: process.pid });
  });
  return router;
}
