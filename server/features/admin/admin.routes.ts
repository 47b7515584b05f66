import { Router, type RequestHandler } from 'express';
import { adminUserQuery, updateAdminUserRequest } from '../../../shared/contracts/admin';
import { idParams } from '../../../shared/contracts/common';
import { route } from '../../lib/async-route';
import { currentUser, requireRole } from '../../lib/auth-middleware';
import { parse } from '../../lib/validate';
import type { AdminService } from './admin.service';

export function adminRoutes(admin: AdminService, requireAuth: RequestHandler): Router {
  const router = Router();
  router.use('/admin', requireAuth, requireRole('admin'));
  router.get(
    '/admin/users',
    route(async (req, res) => {
      res.json(await admin.users(parse(adminUserQuery, req.query)));
    }),
  );
  router.patch(
    '/admin/users/:id',
    route(async (req, res) => {
      const { id } = parse(idParams, req.params);
      const { disabled } = parse(updateAdminUserRequest, req.body);
      res.json(await admin.setDisabled(currentUser(req).id, id, disabled));
    }),
  );
  router.get(
    '/admin/stats',
    route(async (_req, res) => {
      res.json(await admin.stats());
    }),
  );
  return router;
}
