import { Router, type RequestHandler } from 'express';
import { idParams } from '../../../shared/contracts/common';
import { scanBatchEnvelope, scanListQuery } from '../../../shared/contracts/scans';
import { route } from '../../lib/async-route';
import { currentUser } from '../../lib/auth-middleware';
import { parse } from '../../lib/validate';
import type { ScansService } from './scans.service';

export function scansRoutes(scans: ScansService, requireAuth: RequestHandler): Router {
  const router = Router();
  router.post(
    '/scans/batch',
    requireAuth,
    route(async (req, res) => {
      // The envelope and ids are checked here; each scan's other fields are checked one by one in the
      // service, so a single bad note is rejected on its own instead of failing the batch.
      const { scans: items } = parse(scanBatchEnvelope, req.body);
      res.json(await scans.storeBatch(currentUser(req).id, items));
    }),
  );
  router.delete(
    '/scans/:id',
    requireAuth,
    route(async (req, res) => {
      await scans.remove(currentUser(req).id, parse(idParams, req.params).id);
      res.status(204).end();
    }),
  );
  router.get(
    '/hunts/:id/scans',
    requireAuth,
    route(async (req, res) => {
      const { id } = parse(idParams, req.params);
      res.json(await scans.list(currentUser(req).id, id, parse(scanListQuery, req.query)));
    }),
  );
  return router;
}
