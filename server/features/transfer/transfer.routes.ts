import { Router, type RequestHandler } from 'express';
import { exportCsvParams, importRowsRequest } from '../../../shared/contracts/transfer';
import { route } from '../../lib/async-route';
import { currentUser } from '../../lib/auth-middleware';
import { logger } from '../../lib/logger';
import { parse } from '../../lib/validate';
import type { ExportService } from './export.service';
import type { ImportService } from './import.service';

export function transferRoutes(exporter: ExportService, importer: ImportService, requireAuth: RequestHandler): Router {
  const router = Router();
  router.get(
    '/export/json',
    requireAuth,
    route(async (req, res) => {
      await streamed(res, () => exporter.json(res, currentUser(req).id));
    }),
  );
  router.get(
    '/export/:kind.csv',
    requireAuth,
    route(async (req, res) => {
      const { kind } = parse(exportCsvParams, req.params);
      await streamed(res, () => exporter.csv(res, currentUser(req).id, kind));
    }),
  );
  router.post(
    '/import/rows',
    requireAuth,
    route(async (req, res) => {
      res.json(await importer.importRows(currentUser(req).id, parse(importRowsRequest, req.body)));
    }),
  );
  return router;
}

/** Once the first bytes are out, an error can only cut the download short; before that it is a normal error answer. */
async function streamed(res: import('express').Response, run: () => Promise<void>): Promise<void> {
  try {
    await run();
  } catch (error) {
    if (!res.headersSent) throw error;
    if ((error as Error).message !== 'client went away') logger.error({ err: error }, 'export stopped part-way');
    res.destroy();
  }
}
