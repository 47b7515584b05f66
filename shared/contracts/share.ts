import { z } from 'zod';
import { facility } from './keepers';
import { isoDateTime, patternId, serialDigits, uuid } from './common';
import { photoSide } from './photos';

/** 32 random bytes in base64url: 43 characters. Anything else is not a share link. */
export const shareToken = z.string().regex(/^[A-Za-z0-9_-]{43}$/, 'is not a share link');
export const shareParams = z.object({ token: shareToken });
export const sharePhotoParams = z.object({ token: shareToken, photoId: uuid });

/**
 * A keeper's share link as its owner sees it. Only a hash of the token is stored, so `url` is in the
 * answer that creates the link and nowhere else; later the owner sees that a link is active, not the link.
 */
export const shareLinkView = z.object({ id: uuid, createdAt: isoDateTime, url: z.string().optional() });
export type ShareLinkView = z.infer<typeof shareLinkView>;

export const shareStatus = z.object({ active: shareLinkView.nullable() });
export type ShareStatus = z.infer<typeof shareStatus>;

/**
 * What a share link shows: the note and nothing about its owner — no name, no value, no status, no notes,
 * no dates, no hunt. Odds are the engine's (the same for everyone), not the owner's weights.
 */
export const sharedKeeper = z.object({
  serial: z.string(),
  digits: serialDigits,
  prefix: z.string(),
  suffix: z.string(),
  star: z.boolean(),
  series: z.string().nullable(),
  district: z.string().nullable(),
  facility: facility.nullable(),
  denomination: z.number().int().nullable(),
  grade: z.number().int().nullable(),
  patterns: z.array(z.object({ id: patternId, name: z.string(), oneIn: z.number().nullable() })),
  photos: z.array(z.object({ id: uuid, side: photoSide, url: z.string(), thumbUrl: z.string(), width: z.number().int(), height: z.number().int() })),
});
export type SharedKeeper = z.infer<typeof sharedKeeper>;
