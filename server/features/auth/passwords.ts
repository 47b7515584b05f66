import argon2 from 'argon2';

/**
 * argon2id at OWASP's recommended cost for interactive sign-in (Password Storage Cheat Sheet):
 * m = 19 MiB, t = 2, p = 1. The library hashes on libuv's thread pool, never on the event loop; the
 * pool's size (UV_THREADPOOL_SIZE, 4 by default) bounds how many hashes run at once per process.
 */
export const HASH_OPTIONS = { type: argon2.argon2id, memoryCost: 19 * 1024, timeCost: 2, parallelism: 1 } as const;

export const hashPassword = (password: string) => argon2.hash(password, HASH_OPTIONS);

export async function verifyPassword(hash: string, password: string): Promise<boolean> {
  try {
    return await argon2.verify(hash, password);
  } catch {
    return false;
  }
}

/** True when a stored hash was made with other parameters (the old 64 MiB default); re-hashed on sign-in. */
export function needsRehash(hash: string): boolean {
  try {
    return argon2.needsRehash(hash, HASH_OPTIONS);
  } catch {
    return false;
  }
}

/** A hash of a random password, verified against when the e-mail is unknown so timing doesn't tell. */
let decoy: Promise<string> | undefined;
export function decoyHash(): Promise<string> {
  // Per process by design: any decoy with the same cost serves.
  decoy ??= hashPassword(`decoy-${Math.random()}-${Date.now()}`);
  return decoy;
}
