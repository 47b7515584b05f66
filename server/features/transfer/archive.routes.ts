import { Router, type RequestHandler, type Response } from 'express';
import { ARCHIVE_LIMITS, archiveImportQuery, type ArchiveProgressLine } from '../../../shared/contracts/archive';
import { route } from '../../lib/async-route';
import { currentUser } from '../../lib/auth-middleware';
import { HttpError } from '../../lib/errors';
import { logger } from '../../lib/logger';
import { parse } from '../../lib/validate';
import type { ArchiveExportService } from './archive-export.service';
import type { ArchiveImportService } from './archive-import.service';
import { ArchiveProblem, badArchive } from './archive/archive-problem';
import { archiveUpload } from './archive/archive-upload';

const line = (res: Response, value: ArchiveProgressLine) => res.write(`${JSON.stringify(value)}\n`);

export function archiveRoutes(exporter: ArchiveExportService, importer: ArchiveImportService, requireAuth: RequestHandler): Router {
  const router = Router();
  router.get(
    '/export/archive/summary',
    requireAuth,
    route(async (req, res) => {
      res.json(await exporter.summary(currentUser(req).id));
    }),
  );
  router.get(
    '/export/archive',
    requireAuth,
    route(async (req, res) => {
      try {
        await exporter.write(res, currentUser(req).id);
      } catch (error) {
        if (!res.headersSent) throw error;
        // Once bytes are out, an error can only cut the download short (the zip will not open).
        if ((error as Error).message !== 'client went away') logger.error({ err: error }, 'archive export stopped part-way');
        res.destroy();
      }
    }),
  );
  router.post(
    '/import/archive',
    requireAuth,
    archiveUpload('archive', ARCHIVE_LIMITS.uploadBytes),
    route(async (req, res) => {
      const { preview } = parse(archiveImportQuery, req.query);
      if (!req.file) throw new HttpError(400, 'invalid', 'Some fields need attention', { archive: 'is required: a Strapsift archive (.zip)' });
      const userId = currentUser(req).id;
      const path = req.file.path;
      try {
        if (preview === '1' || preview === 'true') {
          res.json(await importer.restore(userId, path, { preview: true }));
          return;
        }
        // A client that asks for progress gets one JSON line per part, then the result; the check runs
        // first, so a bad archive is still a plain 400 before any line is written.
        if (req.accepts(['application/json', 'application/x-ndjson']) === 'application/x-ndjson') {
          const checked = await importer.check(userId, path);
          if (checked.problems.length) throw badArchive(checked.problems);
          res.status(200).type('application/x-ndjson').setHeader('Cache-Control', 'no-store');
          try {
            const result = await importer.apply(userId, path, checked, (progress) => void line(res, progress));
            line(res, { result });
          } catch (error) {
            logger.error({ err: error }, 'archive restore stopped part-way');
            line(res, { error: { code: 'restore_failed', message: 'The restore stopped part-way; what was restored is kept, and restoring again fills in the rest' } });
          }
          res.end();
          return;
        }
        res.json(await importer.restore(userId, path, { preview: false }));
      } catch (error) {
        if (error instanceof ArchiveProblem) throw badArchive([{ where: error.where, message: error.message }]);
        throw error;
      }
    }),
  );
  return router;
}
