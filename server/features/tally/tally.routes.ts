import { Router, type RequestHandler } from 'express';
import { idParams } from '../../../shared/contracts/common';
import { tallyQuery } from '../../../shared/contracts/tally';
import { route } from '../../lib/async-route';
import { currentUser } from '../../lib/auth-middleware';
import { parse } from '../../lib/validate';
import type { TallyService } from './tally.service';

export function tallyRoutes(tally: TallyService, requireAuth: RequestHandler): Router {
  const router = Router();
  router.get(
    '/hunts/:id/tally',
    requireAuth,
    route(async (req, res) => {
      const user = currentUser(req);
      res.json(await tally.hunt(user.id, parse(idParams, req.params).id, user.weights));
    }),
  );
  router.get(
    '/tally',
    requireAuth,
    route(async (req, res) => {
      const user = currentUser(req);
      res.json(await tally.period(user.id, parse(tallyQuery, req.query), user.weights));
    }),
  );
  return router;
}
