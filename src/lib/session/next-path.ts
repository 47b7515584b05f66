/**
 * Where to go after signing in, from a `next` search parameter: only a path inside the app, never
 * another site (`//host`, `https:`), so a crafted sign-in link cannot send anyone away.
 */
export function safeNext(value: unknown, fallback = '/sift'): string {
  const text = Array.isArray(value) ? value[0] : value;
  if (typeof text !== 'string' || !text.startsWith('/') || text.startsWith('//') || text.includes('\\')) return fallback;
  return text;
}

/** Adds `next` to a sign-in or create-account link when there is somewhere to come back to. */
export function withNext(path: string, next: string | null): string {
  return next ? `${path}?next=${encodeURIComponent(next)}` : path;
}
