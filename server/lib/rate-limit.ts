import { createHash } from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import { RateLimiterPostgres, RateLimiterRes } from 'rate-limiter-flexible';
import type { DataSource } from 'typeorm';
import { HttpError } from './errors';

/**
 * Every limit lives in PostgreSQL (table `rate_limits`, made by a migration), so it holds across any
 * number of app processes and hosts. rate-limiter-flexible does the counting with one atomic upsert a hit.
 */
export const RATE_LIMIT_TABLE = 'rate_limits';

export interface LimitRule {
  points: number;
  seconds: number;
}

/** The limits; generous for people, tight for scripts. Tests and deployments can pass their own. */
export const DEFAULT_LIMITS = {
  /** Every sign-in attempt from one client address, right or wrong: argon2 is paid before any answer. */
  signInPerClient: { points: 100, seconds: 15 * 60 },
  /** Failed sign-ins for one account from one client; a stranger elsewhere can't lock the owner out. */
  signInFailuresPerClientAndAccount: { points: 10, seconds: 15 * 60 },
  registerPerClient: { points: 20, seconds: 60 * 60 },
  forgotPerClient: { points: 30, seconds: 15 * 60 },
  forgotPerAccount: { points: 5, seconds: 60 * 60 },
  resetPerClient: { points: 20, seconds: 15 * 60 },
  /** Notes stored per user per day (a strap is 100 notes; 200 straps a day is far beyond any hunter). */
  scansPerUserPerDay: { points: 20_000, seconds: 24 * 60 * 60 },
} satisfies Record<string, LimitRule>;

export type LimitRules = typeof DEFAULT_LIMITS;

export const tooManyRequests = (message: string, retryAfterSeconds: number) =>
  new HttpError(429, 'too_many_requests', message, undefined, Math.max(1, Math.ceil(retryAfterSeconds)));

/**
 * The table's key column holds 255 characters and the store adds the limit's name in front, so a key
 * that could be long (an e-mail address typed by anyone, up to 254 characters) is stored as its hash.
 */
const MAX_PLAIN_KEY = 128;
export const storedKey = (key: string): string => (key.length <= MAX_PLAIN_KEY ? key : `sha256:${createHash('sha256').update(key).digest('hex')}`);

/** One named counter over the shared table. */
export class Limit {
  private limiter: RateLimiterPostgres | null = null;

  constructor(
    private readonly dataSource: DataSource,
    private readonly name: string,
    readonly rule: LimitRule,
  ) {}

  private store(): RateLimiterPostgres {
    // Built on first use: the pool exists only once the data source is initialised.
    this.limiter ??= new RateLimiterPostgres({
      // The app's own pg pool (TypeORM's PostgresDriver keeps it as `master`): no second set of connections.
      storeClient: (this.dataSource.driver as unknown as { master: unknown }).master,
      storeType: 'pool',
      tableName: RATE_LIMIT_TABLE,
      tableCreated: true,
      // One sweeper is enough: see sweepExpiredLimits.
      clearExpiredByTimeout: false,
      keyPrefix: this.name,
      points: this.rule.points,
      duration: this.rule.seconds,
    });
    return this.limiter;
  }

  /** Spends points; over the limit, throws a 429 carrying the wait. */
  async consume(key: string, message: string, points = 1): Promise<void> {
    try {
      await this.store().consume(storedKey(key), points);
    } catch (error) {
      if (error instanceof RateLimiterRes) throw tooManyRequests(message, error.msBeforeNext / 1000);
      throw error;
    }
  }

  /** Throws a 429 if the key has already used its points, without spending one; answers the points used so far. */
  async check(key: string, message: string): Promise<number> {
    const state = await this.store().get(storedKey(key));
    if (state && state.consumedPoints >= this.rule.points) throw tooManyRequests(message, state.msBeforeNext / 1000);
    return state?.consumedPoints ?? 0;
  }

  /** Counts a hit that may go over the limit without refusing this request (the refusal comes with the next). */
  async penalise(key: string, points = 1): Promise<void> {
    await this.store().penalty(storedKey(key), points);
  }

  async clear(key: string): Promise<void> {
    await this.store().delete(storedKey(key));
  }
}

/** Deletes counters that ran out over an hour ago; one call per process start and then every few minutes. */
export async function sweepExpiredLimits(dataSource: DataSource): Promise<void> {
  await dataSource.query(`DELETE FROM ${RATE_LIMIT_TABLE} WHERE expire < $1`, [Date.now() - 60 * 60 * 1000]);
}

/** The client address as Express resolved it with the configured proxy list (`trust proxy`). */
export const clientAddress = (req: Request): string => req.ip ?? req.socket.remoteAddress ?? 'unknown';

export const emailOf = (body: unknown): string | null => {
  const email = (body as { email?: unknown } | null)?.email;
  return typeof email === 'string' ? email.trim().toLowerCase().slice(0, 254) : null;
};

/** The app's limits, each with its own key prefix under one namespace (tests give each app its own). */
export function createLimits(dataSource: DataSource, rules: LimitRules = DEFAULT_LIMITS, namespace = 'rl') {
  const limit = (name: keyof LimitRules) => new Limit(dataSource, `${namespace}:${name}`, rules[name]);
  const limits = {
    signInPerClient: limit('signInPerClient'),
    signInFailures: limit('signInFailuresPerClientAndAccount'),
    registerPerClient: limit('registerPerClient'),
    forgotPerClient: limit('forgotPerClient'),
    forgotPerAccount: limit('forgotPerAccount'),
    resetPerClient: limit('resetPerClient'),
    scansPerDay: limit('scansPerUserPerDay'),
  };
  const perClient =
    (counter: Limit, message: string): RequestHandler =>
    (req, _res, next) => {
      counter.consume(clientAddress(req), message).then(() => next(), next);
    };
  return {
    ...limits,
    signIn: perClient(limits.signInPerClient, 'Too many sign-ins from this address; wait a while before trying again'),
    register: perClient(limits.registerPerClient, 'Too many new accounts from this address; wait a while before trying again'),
    reset: perClient(limits.resetPerClient, 'Too many reset attempts; wait a while before trying again'),
    forgot: ((req, _res, next) => {
      const email = emailOf(req.body);
      const message = 'Too many reset requests; wait a while before asking again';
      limits.forgotPerClient
        .consume(clientAddress(req), message)
        .then(() => (email ? limits.forgotPerAccount.consume(email, message) : undefined))
        .then(() => next(), next);
    }) as RequestHandler,
  };
}

export type Limits = ReturnType<typeof createLimits>;
