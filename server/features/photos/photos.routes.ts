import { Router, type RequestHandler, type Response } from 'express';
import { idParams } from '../../../shared/contracts/common';
import { PHOTO_MAX_BYTES, photoParams, photoUploadFields } from '../../../shared/contracts/photos';
import { route } from '../../lib/async-route';
import { currentUser } from '../../lib/auth-middleware';
import { HttpError } from '../../lib/errors';
import { uploadOne } from '../../lib/upload';
import { parse } from '../../lib/validate';
import type { PhotoBytes, PhotosService } from './photos.service';

/**
 * Photo bytes never go to a shared cache. The owner's browser may keep them (a photo id's bytes never
 * change); a share page's browser must ask again each time, so a withdrawn link stops showing them.
 */
export function sendPhoto(res: Response, photo: PhotoBytes, req: { get(name: string): string | undefined }, cache = 'private, max-age=86400'): void {
  res.setHeader('Cache-Control', cache);
  res.setHeader('ETag', photo.etag);
  res.setHeader('X-Content-Type-Options', 'nosniff');
  if (req.get('if-none-match') === photo.etag) {
    res.status(304).end();
    return;
  }
  res.type(photo.contentType).send(photo.body);
}

export function photosRoutes(photos: PhotosService, requireAuth: RequestHandler): Router {
  const router = Router();
  router.post(
    '/keepers/:id/photos',
    requireAuth,
    uploadOne('photo', PHOTO_MAX_BYTES, 'A photo'),
    route(async (req, res) => {
      const { id } = parse(idParams, req.params);
      const { side } = parse(photoUploadFields, req.body ?? {});
      if (!req.file) throw new HttpError(400, 'invalid', 'Some fields need attention', { photo: 'is required: a JPEG, PNG or WebP file' });
      res.status(201).json(await photos.upload(currentUser(req).id, id, side, req.file.buffer));
    }),
  );
  router.get(
    '/keepers/:id/photos',
    requireAuth,
    route(async (req, res) => {
      res.json({ items: await photos.list(currentUser(req).id, parse(idParams, req.params).id) });
    }),
  );
  router.get(
    '/keepers/:id/photos/:photoId',
    requireAuth,
    route(async (req, res) => {
      const { id, photoId } = parse(photoParams, req.params);
      sendPhoto(res, await photos.bytes(currentUser(req).id, id, photoId, false), req);
    }),
  );
  router.get(
    '/keepers/:id/photos/:photoId/thumb',
    requireAuth,
    route(async (req, res) => {
      const { id, photoId } = parse(photoParams, req.params);
      sendPhoto(res, await photos.bytes(currentUser(req).id, id, photoId, true), req);
    }),
  );
  router.delete(
    '/keepers/:id/photos/:photoId',
    requireAuth,
    route(async (req, res) => {
      const { id, photoId } = parse(photoParams, req.params);
      await photos.remove(currentUser(req).id, id, photoId);
      res.status(204).end();
    }),
  );
  return router;
}
