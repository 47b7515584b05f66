import { Router, type RequestHandler } from 'express';
import { idParams } from '../../../shared/contracts/common';
import { strapParams, updateStrapRequest } from '../../../shared/contracts/straps';
import { route } from '../../lib/async-route';
import { currentUser } from '../../lib/auth-middleware';
import { parse } from '../../lib/validate';
import type { StrapsService } from './straps.service';

export function strapsRoutes(straps: StrapsService, requireAuth: RequestHandler): Router {
  const router = Router();
  router.get(
    '/hunts/:id/straps',
    requireAuth,
    route(async (req, res) => {
      res.json(await straps.sheet(currentUser(req).id, parse(idParams, req.params).id));
    }),
  );
  router.patch(
    '/hunts/:id/straps/:n',
    requireAuth,
    route(async (req, res) => {
      const { id, n } = parse(strapParams, req.params);
      res.json(await straps.update(currentUser(req).id, id, n, parse(updateStrapRequest, req.body)));
    }),
  );
  return router;
}
