import { Router, type RequestHandler } from 'express';
import { idParams } from '../../../shared/contracts/common';
import { createInviteRequest, inviteParams, inviteTokenParams } from '../../../shared/contracts/invites';
import { route } from '../../lib/async-route';
import { currentUser } from '../../lib/auth-middleware';
import { parse } from '../../lib/validate';
import type { InvitesService } from './invites.service';

export function invitesRoutes(invites: InvitesService, requireAuth: RequestHandler): Router {
  const router = Router();
  router.get(
    '/hunts/:id/invites',
    requireAuth,
    route(async (req, res) => {
      res.json(await invites.list(currentUser(req).id, parse(idParams, req.params).id));
    }),
  );
  router.post(
    '/hunts/:id/invites',
    requireAuth,
    route(async (req, res) => {
      const { id } = parse(idParams, req.params);
      res.status(201).json(await invites.invite(currentUser(req).id, id, parse(createInviteRequest, req.body).email));
    }),
  );
  router.delete(
    '/hunts/:id/invites/:inviteId',
    requireAuth,
    route(async (req, res) => {
      const { id, inviteId } = parse(inviteParams, req.params);
      await invites.revoke(currentUser(req).id, id, inviteId);
      res.status(204).end();
    }),
  );
  // The accept page reads this before anyone signs in.
  router.get(
    '/invites/:token',
    route(async (req, res) => {
      res.setHeader('Cache-Control', 'no-store');
      res.json(await invites.preview(parse(inviteTokenParams, req.params).token));
    }),
  );
  router.post(
    '/invites/:token/accept',
    requireAuth,
    route(async (req, res) => {
      res.json(await invites.accept(currentUser(req).id, parse(inviteTokenParams, req.params).token));
    }),
  );
  return router;
}
