const WINDOW_MS = 15 * 60 * 1000;
const MAX_FAILURES = 10;

/**
 * Counts failed sign-ins per e-mail in a sliding 15-minute window. After 10 failures the e-mail is
 * refused (429) until the oldest failure leaves the window, whether or not the next password is right.
 */
export class LoginThrottle {
  private failures = new Map<string, number[]>();

  constructor(private readonly now: () => number = Date.now) {}

  private recent(key: string): number[] {
    const cutoff = this.now() - WINDOW_MS;
    const kept = (this.failures.get(key) ?? []).filter((time) => time > cutoff);
    if (kept.length) this.failures.set(key, kept);
    else this.failures.delete(key);
    return kept;
  }

  /** Seconds until another try is allowed, or 0 when it is allowed now. */
  retryAfterSeconds(key: string): number {
    const recent = this.recent(key);
    if (recent.length < MAX_FAILURES) return 0;
    return Math.max(1, Math.ceil((recent[recent.length - MAX_FAILURES] + WINDOW_MS - this.now()) / 1000));
  }

  fail(key: string): void {
    this.failures.set(key, [...this.recent(key), this.now()]);
  }

  succeed(key: string): void {
    this.failures.delete(key);
  }
}
