import express, { type Router } from 'express';
import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';

/**
 * Serves the Expo web export and lets every client route fall back to its HTML,
 * so a reload on /hunts/abc opens the app instead of a 404.
 */
export function webAppRoutes(distDir: string): Router {
  const router = express.Router();
  const root = resolve(distDir);
  const indexHtml = join(root, 'index.html');
  router.use(
    express.static(root, {
      index: false,
      setHeaders(res, path) {
        // Hashed bundles never change; the HTML and service worker must always be checked again.
        if (/\/_expo\/static\//.test(path) || /\/assets\//.test(path)) {
          res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
        } else {
          res.setHeader('Cache-Control', 'no-cache');
        }
      },
    }),
  );
  router.get(/^(?!\/api(\/|$)).*/, (_req, res, next) => {
    if (!existsSync(indexHtml)) {
      next();
      return;
    }
    res.setHeader('Cache-Control', 'no-cache');
    // dotfiles: the export may live under .data/ (screenshots, benches); the path is ours, not the caller's.
    res.sendFile(indexHtml, { dotfiles: 'allow' });
  });
  return router;
}
