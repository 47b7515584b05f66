import { dictionary } from '@zxcvbn-ts/language-common';
import { HttpError } from '../../lib/errors';

export const PASSWORD_MIN_LENGTH = 10;

// zxcvbn-ts ships its list of ~49,000 leaked passwords inside the package, so no check goes over the
// network. Only entries long enough to pass the length rule can matter; they are kept, lower-cased, once
// per process by design (the list is part of the code).
let common: Set<string> | undefined;
function commonPasswords(): Set<string> {
  common ??= new Set(
    (dictionary['passwords-common'] as string[]).filter((word) => word.length >= PASSWORD_MIN_LENGTH).map((word) => word.toLowerCase()),
  );
  return common;
}

/**
 * The rule beyond the contract's length check: not a common password, not the account's e-mail or
 * display name (nor the e-mail's name part). Returns the reason, or null when the password is fine.
 */
export function passwordProblem(password: string, account: { email?: string; displayName?: string }): string | null {
  const lowered = password.trim().toLowerCase();
  if (commonPasswords().has(lowered)) return 'is one of the most common passwords; choose another';
  const email = account.email?.trim().toLowerCase();
  const name = account.displayName?.trim().toLowerCase();
  if (email && (lowered === email || lowered === email.split('@')[0])) return 'must not be your e-mail address';
  if (name && lowered === name) return 'must not be your display name';
  return null;
}

/** Throws the usual 400 naming `field` when the password breaks the rule. */
export function assertPasswordAllowed(password: string, account: { email?: string; displayName?: string }, field = 'password'): void {
  const problem = passwordProblem(password, account);
  if (problem) throw new HttpError(400, 'invalid', 'Some fields need attention', { [field]: problem });
}
