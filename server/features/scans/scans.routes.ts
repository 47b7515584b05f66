import { Router, type RequestHandler } from 'express';
import { idParams } from '../../../shared/contracts/common';
import { scanBatchEnvelope, scanListQuery } from '../../../shared/contracts/scans';
import { route } from '../../lib/async-route';
import { currentUser } from '../../lib/auth-middleware';
import type { Limits } from '../../lib/rate-limit';
import { parse } from '../../lib/validate';
import type { ScansService } from './scans.service';

export function scansRoutes(scans: ScansService, requireAuth: RequestHandler, limits: Pick<Limits, 'scansPerDay'>): Router {
  const router = Router();
  router.post(
    '/scans/batch',
    requireAuth,
    route(async (req, res) => {
      // The envelope and ids are checked here; each scan's other fields are checked one by one in the
      // service, so a single bad note is rejected on its own instead of failing the batch.
      const { scans: items } = parse(scanBatchEnvelope, req.body);
      const user = currentUser(req);
      // Notes sent a day per account (shared by every app process): generous, but a runaway script stops.
      // Counted as sent; a retried batch counts again, which the allowance's margin absorbs. The upsert
      // runs beside the batch's reads (one round trip less to wait for) and the service stores nothing
      // until it has passed; the catch only keeps an early refusal from being reported as unhandled.
      const allowance = limits.scansPerDay.consume(
        user.id,
        `This account has sent ${limits.scansPerDay.rule.points.toLocaleString('en-US')} notes in a day, the most it takes; the rest stay queued on your device and go up later`,
        items.length,
      );
      allowance.catch(() => undefined);
      res.json(await scans.storeBatch(user.id, items, user.weights, allowance));
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
