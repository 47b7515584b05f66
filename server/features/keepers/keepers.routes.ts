import { Router, type RequestHandler } from 'express';
import { idParams } from '../../../shared/contracts/common';
import { createKeeperRequest, keeperListQuery, updateKeeperRequest } from '../../../shared/contracts/keepers';
import { route } from '../../lib/async-route';
import { currentUser } from '../../lib/auth-middleware';
import { parse } from '../../lib/validate';
import type { KeepersService } from './keepers.service';

export function keepersRoutes(keepers: KeepersService, requireAuth: RequestHandler): Router {
  const router = Router();
  router.use('/keepers', requireAuth);
  router.get(
    '/keepers',
    route(async (req, res) => {
      res.json(await keepers.list(currentUser(req).id, parse(keeperListQuery, req.query)));
    }),
  );
  router.post(
    '/keepers',
    route(async (req, res) => {
      const { keeper, created } = await keepers.create(currentUser(req).id, parse(createKeeperRequest, req.body));
      res.status(created ? 201 : 200).json(keeper);
    }),
  );
  router.get(
    '/keepers/:id',
    route(async (req, res) => {
      res.json(await keepers.get(currentUser(req).id, parse(idParams, req.params).id));
    }),
  );
  router.patch(
    '/keepers/:id',
    route(async (req, res) => {
      const { id } = parse(idParams, req.params);
      res.json(await keepers.update(currentUser(req).id, id, parse(updateKeeperRequest, req.body)));
    }),
  );
  router.delete(
    '/keepers/:id',
    route(async (req, res) => {
      await keepers.remove(currentUser(req).id, parse(idParams, req.params).id);
      res.status(204).end();
    }),
  );
  return router;
}
