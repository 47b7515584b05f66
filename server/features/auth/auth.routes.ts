import { Router } from 'express';
import { loginRequest, refreshRequest, registerRequest } from '../../../shared/contracts/auth';
import { route } from '../../lib/async-route';
import { parse } from '../../lib/validate';
import type { AuthService } from './auth.service';

export function authRoutes(auth: AuthService): Router {
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
  return router;
}
