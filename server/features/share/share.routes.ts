import { Router, type RequestHandler } from 'express';
import { idParams } from '../../../shared/contracts/common';
import { shareParams, sharePhotoParams } from '../../../shared/contracts/share';
import { route } from '../../lib/async-route';
import { currentUser } from '../../lib/auth-middleware';
import { parse } from '../../lib/validate';
import { sendPhoto } from '../photos/photos.routes';
import type { ShareService } from './share.service';

export function shareRoutes(share: ShareService, requireAuth: RequestHandler): Router {
  const router = Router();
  // The owner's side.
  router.get(
    '/keepers/:id/share',
    requireAuth,
    route(async (req, res) => {
      res.json(await share.status(currentUser(req).id, parse(idParams, req.params).id));
    }),
  );
  router.post(
    '/keepers/:id/share',
    requireAuth,
    route(async (req, res) => {
      res.status(201).json(await share.create(currentUser(req).id, parse(idParams, req.params).id));
    }),
  );
  router.delete(
    '/keepers/:id/share',
    requireAuth,
    route(async (req, res) => {
      await share.revoke(currentUser(req).id, parse(idParams, req.params).id);
      res.status(204).end();
    }),
  );
  // Anyone holding the link: no sign-in, and nothing cached by proxies.
  router.get(
    '/share/:token',
    route(async (req, res) => {
      res.setHeader('Cache-Control', 'no-store');
      res.setHeader('Referrer-Policy', 'no-referrer');
      res.json(await share.view(parse(shareParams, req.params).token));
    }),
  );
  router.get(
    '/share/:token/photos/:photoId',
    route(async (req, res) => {
      const { token, photoId } = parse(sharePhotoParams, req.params);
      sendPhoto(res, await share.photo(token, photoId, false), req, 'private, no-cache');
    }),
  );
  router.get(
    '/share/:token/photos/:photoId/thumb',
    route(async (req, res) => {
      const { token, photoId } = parse(sharePhotoParams, req.params);
      sendPhoto(res, await share.photo(token, photoId, true), req, 'private, no-cache');
    }),
  );
  return router;
}
