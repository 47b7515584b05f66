import argon2 from 'argon2';

// argon2id with the library's defaults (64 MiB, 3 passes): slow for an attacker, ~50 ms for us.
export const hashPassword = (password: string) => argon2.hash(password, { type: argon2.argon2id });

export async function verifyPassword(hash: string, password: string): Promise<boolean> {
  try {
    return await argon2.verify(hash, password);
  } catch {
    return false;
  }
}

/** A hash of a random password, verified against when the e-mail is unknown so timing doesn't tell. */
let decoy: Promise<string> | undefined;
export function decoyHash(): Promise<string> {
  decoy ??= hashPassword(`decoy-${Math.random()}-${Date.now()}`);
  return decoy;
}
