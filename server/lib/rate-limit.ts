import type { RequestHandler } from 'express';
import { HttpError } from './errors';

/**
 * Counts requests per key in a sliding window kept in memory (one process serves the app).
 * Used where each request costs us or someone else: reset mails and reset attempts.
 */
export class SlidingWindow {
  private hits = new Map<string, number[]>();

  constructor(
    private readonly limit: number,
    private readonly windowMs: number,
    private readonly now: () => number = Date.now,
  ) {}

  /** Records a hit and returns the seconds to wait when over the limit, else 0. */
  hit(key: string): number {
    const cutoff = this.now() - this.windowMs;
    const recent = (this.hits.get(key) ?? []).filter((time) => time > cutoff);
    if (recent.length >= this.limit) {
      this.hits.set(key, recent);
      return Math.max(1, Math.ceil((recent[0] + this.windowMs - this.now()) / 1000));
    }
    recent.push(this.now());
    this.hits.set(key, recent);
    if (this.hits.size > 50_000) this.prune(cutoff);
    return 0;
  }

  private prune(cutoff: number): void {
    for (const [key, times] of this.hits) if (!times.some((time) => time > cutoff)) this.hits.delete(key);
  }
}

/** 429 with Retry-After when any of the keys for this request is over its window. */
export function rateLimit(windows: { window: SlidingWindow; key: (req: Parameters<RequestHandler>[0]) => string | null }[], message: string): RequestHandler {
  return (req, res, next) => {
    let wait = 0;
    for (const { window, key } of windows) {
      const value = key(req);
      if (value) wait = Math.max(wait, window.hit(value));
    }
    if (wait > 0) {
      res.setHeader('Retry-After', String(wait));
      next(new HttpError(429, 'too_many_requests', message));
      return;
    }
    next();
  };
}

const emailOf = (body: unknown): string | null => {
  const email = (body as { email?: unknown } | null)?.email;
  return typeof email === 'string' ? email.trim().toLowerCase().slice(0, 254) : null;
};

/** Reset mails: 5 an hour per address, 30 a quarter-hour per client address; reset tries: 20 a quarter-hour per client. */
export function resetRateLimits() {
  const perEmail = new SlidingWindow(5, 60 * 60 * 1000);
  const perIpForgot = new SlidingWindow(30, 15 * 60 * 1000);
  const perIpReset = new SlidingWindow(20, 15 * 60 * 1000);
  return {
    forgot: rateLimit(
      [
        { window: perEmail, key: (req) => emailOf(req.body) },
        { window: perIpForgot, key: (req) => req.ip ?? null },
      ],
      'Too many reset requests; wait a while before asking again',
    ),
    reset: rateLimit([{ window: perIpReset, key: (req) => req.ip ?? null }], 'Too many reset attempts; wait a while before trying again'),
  };
}
