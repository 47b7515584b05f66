import { randomBytes, randomUUID } from 'node:crypto';
import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { createApp, type AppOptions } from '../../server/app';
import type { Services } from '../../server/services';
import { InMemoryResetOutbox } from '../../server/features/auth/reset-mailer';
import { authResponse, type AuthResponse } from '../../shared/contracts/auth';
import { huntDetail, type CreateHuntRequest, type HuntDetail } from '../../shared/contracts/hunts';
import type { ScanInput } from '../../shared/contracts/scans';
import { openTestDataSource } from './database';
import { dropDatabase, freshDatabase } from './scratch-database';

export interface TestApi {
  dataSource: DataSource;
  app: Express;
  outbox: InMemoryResetOutbox;
  /** Waits for work done after an answer (reset mails go out after the 202). */
  settled(): Promise<void>;
  close(): Promise<void>;
}

/**
 * One app per test file, on the database the test script migrated, with a readable reset outbox.
 * The limits are the real ones, but each app counts under its own namespace, and it believes
 * X-Forwarded-For from loopback so helpers can give each registered test user an address of its own.
 */
export async function openTestApi(options: Partial<AppOptions> = {}): Promise<TestApi> {
  return appOn(await openTestDataSource(), options);
}

/**
 * The same app on a database of its own, migrated from empty and dropped on close, for a file whose
 * checks cover whole tables (every account, every row): the shared database holds other files' rows,
 * which change while server test files run side by side. `name` must be unique among the test files.
 */
export async function openScratchApi(name: string, options: Partial<AppOptions> = {}): Promise<TestApi> {
  const url = await freshDatabase(name);
  const dataSource = await openTestDataSource(url);
  await dataSource.runMigrations();
  const api = appOn(dataSource, options);
  return {
    ...api,
    close: async () => {
      await dataSource.destroy();
      await dropDatabase(url);
    },
  };
}

function appOn(dataSource: DataSource, options: Partial<AppOptions>): TestApi {
  const outbox = new InMemoryResetOutbox();
  const app = createApp({ dataSource, resetMailer: outbox, trustedProxies: ['loopback'], limitNamespace: `test-${randomUUID()}`, ...options });
  const services = app.locals.services as Services;
  return { dataSource, app, outbox, settled: () => services.passwordReset.settled(), close: () => dataSource.destroy() };
}

/** A made-up client address (TEST-NET-2, RFC 5737), one per call, for X-Forwarded-For. */
export function clientAddress(): string {
  const value = randomBytes(2);
  return `198.51.${value[0]}.${value[1]}`;
}

export interface TestUser {
  id: string;
  email: string;
  password: string;
  token: string;
  auth: { Authorization: string };
  session: AuthResponse;
}

/** Registers a fresh account with a unique e-mail, so test files never collide on the shared database. */
export async function registerUser(app: Express, label = 'hunter'): Promise<TestUser> {
  const email = `${label}-${randomUUID().slice(0, 8)}@strapsift.test`;
  const password = 'strap-and-sift-1';
  // Each test user registers from an address of its own, so the per-client limit on new accounts holds
  // as in production without hundreds of test registrations tripping it.
  const response = await request(app).post('/api/auth/register').set('X-Forwarded-For', clientAddress()).send({ email, password, displayName: `Test ${label}` });
  if (response.status !== 201) throw new Error(`register failed: ${response.status} ${JSON.stringify(response.body)}`);
  const session = authResponse.parse(response.body);
  return { id: session.user.id, email, password, token: session.token, auth: { Authorization: `Bearer ${session.token}` }, session };
}

/** Turns an account into an admin directly in the database (there is no route for it, by design). */
export async function registerAdmin(api: TestApi): Promise<TestUser> {
  const user = await registerUser(api.app, 'admin');
  await api.dataSource.query(`UPDATE users SET role = 'admin' WHERE id = $1`, [user.id]);
  return user;
}

export async function createHunt(app: Express, user: TestUser, overrides: Partial<CreateHuntRequest> = {}): Promise<HuntDetail> {
  const response = await request(app)
    .post('/api/hunts')
    .set(user.auth)
    .send({ title: 'Tuesday $1 straps', source: 'Larkspur Valley Credit Union, Mill Street', denomination: 1, plannedStraps: 3, ...overrides });
  if (response.status !== 201) throw new Error(`create hunt failed: ${response.status} ${JSON.stringify(response.body)}`);
  return huntDetail.parse(response.body);
}

/** Adds `crew` to the owner's hunt through the route. */
export async function addCrew(app: Express, owner: TestUser, huntId: string, crew: TestUser): Promise<void> {
  const response = await request(app).post(`/api/hunts/${huntId}/members`).set(owner.auth).send({ email: crew.email });
  if (response.status !== 201) throw new Error(`add crew failed: ${response.status} ${JSON.stringify(response.body)}`);
}

let clock = Date.parse('2026-11-02T15:00:00.000Z');

/** A scan as a device would send it; each call gets a new id and a later time. */
export function scanOf(huntId: string, serial: string, overrides: Partial<ScanInput> = {}): ScanInput {
  clock += 1000;
  return { id: randomUUID(), huntId, strap: 1, serial, scannedAt: new Date(clock).toISOString(), ...overrides };
}

/** Distinct, ordinary serials for filling a hunt: value i spread over the domain. */
export function ordinarySerial(i: number): string {
  return String(10_000_000 + ((i * 7919) % 80_000_000)).padStart(8, '0');
}

export async function postBatch(app: Express, user: TestUser, scans: unknown[]) {
  return request(app).post('/api/scans/batch').set(user.auth).send({ scans });
}

export const missingId = () => randomUUID();
