import { Router, type Request, type RequestHandler } from 'express';
import { forgotRequest, loginRequest, refreshRequest, registerRequest, resetRequest } from '../../../shared/contracts/auth';
import { route } from '../../lib/async-route';
import { currentSession, currentUser } from '../../lib/auth-middleware';
import { HttpError } from '../../lib/errors';
import { clientAddress, type Limits } from '../../lib/rate-limit';
import { parse } from '../../lib/validate';
import type { AuthService, ClientInfo } from './auth.service';
import type { PasswordResetService } from './password-reset.service';
import type { SessionsService } from './sessions.service';

const clientOf = (req: Request): ClientInfo => ({ userAgent: req.get('user-agent') });

export function authRoutes(
  auth: AuthService,
  passwordReset: PasswordResetService,
  sessions: SessionsService,
  limits: Limits,
  requireAuth: RequestHandler,
): Router {
  const router = Router();
  router.post(
    '/auth/register',
    limits.register,
    route(async (req, res) => {
      res.status(201).json(await auth.register(parse(registerRequest, req.body), clientOf(req)));
    }),
  );
  router.post(
    '/auth/login',
    limits.signIn,
    route(async (req, res) => {
      const body = parse(loginRequest, req.body);
      // Failures count per client and account together: a stranger elsewhere cannot lock the owner out.
      const pair = `${clientAddress(req)}|${body.email}`;
      const wait = 'Too many failed sign-ins for this e-mail from here; wait a while before trying again';
      const failedBefore = await limits.signInFailures.check(pair, wait);
      try {
        const session = await auth.login(body, clientOf(req));
        if (failedBefore > 0) await limits.signInFailures.clear(pair);
        res.json(session);
      } catch (error) {
        if (error instanceof HttpError && error.status === 401) await limits.signInFailures.penalise(pair);
        throw error;
      }
    }),
  );
  router.post(
    '/auth/refresh',
    route(async (req, res) => {
      res.json(await auth.refresh(parse(refreshRequest, req.body).refreshToken));
    }),
  );
  router.post(
    '/auth/logout',
    requireAuth,
    route(async (req, res) => {
      await sessions.end(currentUser(req).id, currentSession(req), 'logout');
      res.status(204).end();
    }),
  );
  router.post(
    '/auth/forgot',
    limits.forgot,
    route(async (req, res) => {
      res.status(202).json(await passwordReset.forgot(parse(forgotRequest, req.body).email));
    }),
  );
  router.post(
    '/auth/reset',
    limits.reset,
    route(async (req, res) => {
      res.json(await passwordReset.reset(parse(resetRequest, req.body), clientOf(req)));
    }),
  );
  return router;
}
