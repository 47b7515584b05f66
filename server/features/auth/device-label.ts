const BROWSERS: Array<[RegExp, string]> = [
  [/Edg\//, 'Edge'],
  [/Firefox\//, 'Firefox'],
  [/Chrom(e|ium)\//, 'Chrome'],
  [/Safari\//, 'Safari'],
  [/okhttp|Expo|ReactNative/i, 'the app'],
  [/node|undici|supertest|curl/i, 'a script'],
];
const SYSTEMS: Array<[RegExp, string]> = [
  [/Android/, 'Android'],
  [/iPhone|iPad|iOS/, 'iOS'],
  [/Mac OS X|Macintosh/, 'macOS'],
  [/Windows/, 'Windows'],
  [/Linux/, 'Linux'],
];

/**
 * A short, human label for a sign-in ("Chrome on Android"); the raw User-Agent is not stored, as it is
 * both long and more identifying than the owner needs.
 *
 * deviceLabel('Mozilla/5.0 (Linux; Android 14) … Chrome/130.0 Mobile Safari/537.36') → 'Chrome on Android'
 */
export function deviceLabel(userAgent: string | undefined): string {
  const agent = userAgent ?? '';
  const browser = BROWSERS.find(([pattern]) => pattern.test(agent))?.[1];
  const system = SYSTEMS.find(([pattern]) => pattern.test(agent))?.[1];
  if (browser && system) return `${browser} on ${system}`;
  return browser ?? system ?? 'Unknown device';
}
