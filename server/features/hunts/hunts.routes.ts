import { Router, type RequestHandler } from 'express';
import { idParams } from '../../../shared/contracts/common';
import { createHuntRequest, huntListQuery, updateHuntRequest } from '../../../shared/contracts/hunts';
import { route } from '../../lib/async-route';
import { currentUser } from '../../lib/auth-middleware';
import { parse } from '../../lib/validate';
import type { HuntsService } from './hunts.service';

export function huntsRoutes(hunts: HuntsService, requireAuth: RequestHandler): Router {
  const router = Router();
  router.get(
    '/hunts',
    requireAuth,
    route(async (req, res) => {
      const user = currentUser(req);
      res.json(await hunts.list(user.id, parse(huntListQuery, req.query), user.weights));
    }),
  );
  router.post(
    '/hunts',
    requireAuth,
    route(async (req, res) => {
      res.status(201).json(await hunts.create(currentUser(req).id, parse(createHuntRequest, req.body)));
    }),
  );
  router.get(
    '/hunts/:id',
    requireAuth,
    route(async (req, res) => {
      res.json(await hunts.get(currentUser(req).id, parse(idParams, req.params).id));
    }),
  );
  router.patch(
    '/hunts/:id',
    requireAuth,
    route(async (req, res) => {
      const { id } = parse(idParams, req.params);
      res.json(await hunts.update(currentUser(req).id, id, parse(updateHuntRequest, req.body)));
    }),
  );
  router.delete(
    '/hunts/:id',
    requireAuth,
    route(async (req, res) => {
      await hunts.remove(currentUser(req).id, parse(idParams, req.params).id);
      res.status(204).end();
    }),
  );
  router.post(
    '/hunts/:id/close',
    requireAuth,
    route(async (req, res) => {
      res.json(await hunts.close(currentUser(req).id, parse(idParams, req.params).id));
    }),
  );
  return router;
}
