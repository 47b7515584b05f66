import { Router, type RequestHandler } from 'express';
import { updateMeRequest } from '../../../shared/contracts/auth';
import { route } from '../../lib/async-route';
import { currentUser } from '../../lib/auth-middleware';
import { parse } from '../../lib/validate';
import type { UsersService } from './users.service';

export function usersRoutes(users: UsersService, requireAuth: RequestHandler): Router {
  const router = Router();
  router.get(
    '/me',
    requireAuth,
    route(async (req, res) => {
      res.json(await users.get(currentUser(req).id));
    }),
  );
  router.patch(
    '/me',
    requireAuth,
    route(async (req, res) => {
      res.json(await users.update(currentUser(req).id, parse(updateMeRequest, req.body)));
    }),
  );
  router.delete(
    '/me',
    requireAuth,
    route(async (req, res) => {
      await users.remove(currentUser(req).id);
      res.status(204).end();
    }),
  );
  return router;
}
