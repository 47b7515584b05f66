import { Router, type RequestHandler } from 'express';
import { idParams } from '../../../shared/contracts/common';
import { createWeightTableRequest, replaceWeightTableRequest } from '../../../shared/contracts/weights';
import { route } from '../../lib/async-route';
import { currentUser } from '../../lib/auth-middleware';
import { parse } from '../../lib/validate';
import type { WeightsService } from './weights.service';

export function weightsRoutes(weights: WeightsService, requireAuth: RequestHandler): Router {
  const router = Router();
  router.use('/weights', requireAuth);
  router.get(
    '/weights',
    route(async (req, res) => {
      res.json(await weights.list(currentUser(req).id));
    }),
  );
  router.post(
    '/weights',
    route(async (req, res) => {
      res.status(201).json(await weights.create(currentUser(req).id, parse(createWeightTableRequest, req.body)));
    }),
  );
  router.put(
    '/weights/:id',
    route(async (req, res) => {
      const { id } = parse(idParams, req.params);
      res.json(await weights.replace(currentUser(req).id, id, parse(replaceWeightTableRequest, req.body)));
    }),
  );
  router.post(
    '/weights/:id/activate',
    route(async (req, res) => {
      const { id } = parse(idParams, req.params);
      res.json(await weights.activate(currentUser(req).id, id));
    }),
  );
  router.delete(
    '/weights/:id',
    route(async (req, res) => {
      const { id } = parse(idParams, req.params);
      await weights.remove(currentUser(req).id, id);
      res.status(204).end();
    }),
  );
  return router;
}
