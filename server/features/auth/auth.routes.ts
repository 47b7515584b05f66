import { Router } from 'express';
import { forgotRequest, loginRequest, refreshRequest, registerRequest, resetRequest } from '../../../shared/contracts/auth';
import { route } from '../../lib/async-route';
import { parse } from '../../lib/validate';
import type { AuthService } from './auth.service';
import type { PasswordResetService } from './password-reset.service';

export function authRoutes(auth: AuthService, passwordReset: PasswordResetService): Router {
  const router = Router();
  router.post(
    '/auth/register',
    route(async (req, res) => {
      res.status(201).json(await auth.register(parse(registerRequest, req.body)));
    }),
  );
  router.post(
    '/auth/login',
    route(async (req, res) => {
      res.json(await auth.login(parse(loginRequest, req.body)));
    }),
  );
  router.post(
    '/auth/refresh',
    route(async (req, res) => {
      res.json(await auth.refresh(parse(refreshRequest, req.body).refreshToken));
    }),
  );
  router.post(
    '/auth/forgot',
    route(async (req, res) => {
      res.status(202).json(await passwordReset.forgot(parse(forgotRequest, req.body).email));
    }),
  );
  router.post(
    '/auth/reset',
    route(async (req, res) => {
      res.json(await passwordReset.reset(parse(resetRequest, req.body)));
    }),
  );
  return router;
}
