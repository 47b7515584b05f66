import { z } from 'zod';
import { isoDateTime, uuid } from './common';

/** Largest photo the API takes; a bigger upload is refused with 413 before it is stored. */
export const PHOTO_MAX_BYTES = 10 * 1024 * 1024;

/** What the server accepts, judged by the file's first bytes, never by its name or declared type. */
export const PHOTO_TYPES = ['image/jpeg', 'image/png', 'image/webp'] as const;
export const photoContentType = z.enum(PHOTO_TYPES);
export type PhotoContentType = z.infer<typeof photoContentType>;

export const photoSide = z.enum(['front', 'back'], { message: 'must be front or back' });
export type PhotoSide = z.infer<typeof photoSide>;

/** The multipart form's text fields beside the `photo` file. */
export const photoUploadFields = z.object({ side: photoSide }).strict();
export type PhotoUploadFields = z.infer<typeof photoUploadFields>;

export const photoParams = z.object({ id: uuid, photoId: uuid });

/**
 * One stored photo. `url` and `thumbUrl` are API paths (under /api) that answer the bytes to the
 * keeper's owner only; a share page gets its own paths.
 */
export const photoView = z.object({
  id: uuid,
  keeperId: uuid,
  side: photoSide,
  contentType: photoContentType,
  byteSize: z.number().int(),
  width: z.number().int(),
  height: z.number().int(),
  url: z.string(),
  thumbUrl: z.string(),
  createdAt: isoDateTime,
});
export type PhotoView = z.infer<typeof photoView>;

export const photoList = z.object({ items: z.array(photoView) });
export type PhotoList = z.infer<typeof photoList>;
