import { Router, type RequestHandler } from 'express';
import { idParams } from '../../../shared/contracts/common';
import { createWatchRequest } from '../../../shared/contracts/watch';
import { route } from '../../lib/async-route';
import { currentUser } from '../../lib/auth-middleware';
import { parse } from '../../lib/validate';
import type { WatchService } from './watch.service';

export function watchRoutes(watch: WatchService, requireAuth: RequestHandler): Router {
  const router = Router();
  router.use('/watch', requireAuth);
  router.get(
    '/watch',
    route(async (req, res) => {
      res.json(await watch.list(currentUser(req).id));
    }),
  );
  router.post(
    '/watch',
    route(async (req, res) => {
      res.status(201).json(await watch.create(currentUser(req).id, parse(createWatchRequest, req.body)));
    }),
  );
  router.delete(
    '/watch/:id',
    route(async (req, res) => {
      const { id } = parse(idParams, req.params);
      await watch.remove(currentUser(req).id, id);
      res.status(204).end();
    }),
  );
  return router;
}
