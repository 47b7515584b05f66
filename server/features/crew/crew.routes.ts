import { Router, type RequestHandler } from 'express';
import { idParams } from '../../../shared/contracts/common';
import { addMemberRequest, memberParams } from '../../../shared/contracts/crew';
import { route } from '../../lib/async-route';
import { currentUser } from '../../lib/auth-middleware';
import { parse } from '../../lib/validate';
import type { CrewService } from './crew.service';

export function crewRoutes(crew: CrewService, requireAuth: RequestHandler): Router {
  const router = Router();
  router.get(
    '/hunts/:id/members',
    requireAuth,
    route(async (req, res) => {
      res.json(await crew.list(currentUser(req).id, parse(idParams, req.params).id));
    }),
  );
  router.post(
    '/hunts/:id/members',
    requireAuth,
    route(async (req, res) => {
      const { id } = parse(idParams, req.params);
      res.status(201).json(await crew.add(currentUser(req).id, id, parse(addMemberRequest, req.body)));
    }),
  );
  router.delete(
    '/hunts/:id/members/:userId',
    requireAuth,
    route(async (req, res) => {
      const { id, userId } = parse(memberParams, req.params);
      await crew.remove(currentUser(req).id, id, userId);
      res.status(204).end();
    }),
  );
  return router;
}
