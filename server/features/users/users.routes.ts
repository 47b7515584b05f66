import { Router, type RequestHandler } from 'express';
import { undoEmailRequest, updateMeRequest } from '../../../shared/contracts/auth';
import { idParams } from '../../../shared/contracts/common';
import { route } from '../../lib/async-route';
import { currentSession, currentUser } from '../../lib/auth-middleware';
import { parse } from '../../lib/validate';
import type { SessionsService } from '../auth/sessions.service';
import type { UsersService } from './users.service';

export function usersRoutes(users: UsersService, sessions: SessionsService, requireAuth: RequestHandler, limitUndo: RequestHandler): Router {
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
      res.json(await users.update(currentUser(req).id, currentSession(req), parse(updateMeRequest, req.body)));
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
  router.get(
    '/me/sessions',
    requireAuth,
    route(async (req, res) => {
      res.json({ items: await sessions.list(currentUser(req).id, currentSession(req)) });
    }),
  );
  router.delete(
    '/me/sessions/:id',
    requireAuth,
    route(async (req, res) => {
      await sessions.end(currentUser(req).id, parse(idParams, req.params).id, 'logout');
      res.status(204).end();
    }),
  );
  // "Sign out everywhere": this device too; the client forgets its tokens when this answers.
  router.post(
    '/me/sessions/end-all',
    requireAuth,
    route(async (req, res) => {
      await sessions.endAll(currentUser(req).id, 'everywhere');
      res.status(204).end();
    }),
  );
  // Signed out on purpose: the mail goes to the old address, whose owner may no longer be able to sign in.
  router.post(
    '/auth/undo-email-change',
    limitUndo,
    route(async (req, res) => {
      res.json(await users.undoEmailChange(parse(undoEmailRequest, req.body).token));
    }),
  );
  return router;
}
