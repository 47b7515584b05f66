import { createHash, randomBytes } from 'node:crypto';

/** 256 random bits as 43 base64url characters: unguessable, and safe in a URL path. */
export const newSecretToken = () => randomBytes(32).toString('base64url');

/** Links store only this, so a copy of the table opens nothing. */
export const hashSecretToken = (token: string) => createHash('sha256').update(token, 'utf8').digest('hex');
