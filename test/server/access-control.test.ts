import jwt from 'jsonwebtoken';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { config } from '../../server/config';
import { addCrew, createHunt, openTestApi, registerAdmin, registerUser, scanOf, type TestApi, type TestUser } from '../support/api';

/**
 * Every route against every kind of caller. The rules: no usable token → 401; another user's
 * hunt, scan, keeper, table or pattern → 404 as if it did not exist; crew may read a hunt and log
 * notes but only the owner edits, closes or deletes it; admin routes → 403 for anyone but an admin.
 */
type Actor = 'none' | 'expired' | 'tampered' | 'disabled' | 'collector' | 'crew' | 'owner' | 'admin';
const ACTORS: Actor[] = ['none', 'expired', 'tampered', 'disabled', 'collector', 'crew', 'owner', 'admin'];

interface Fixture {
  huntId: string;
  scanId: string;
  keeperId: string;
  weightId: string;
  watchId: string;
  crewId: string;
  victimId: string;
}

interface RouteCase {
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  path: (f: Fixture) => string;
  body?: (f: Fixture) => unknown;
  /** Destructive or one-shot routes get a fresh hunt and records for each caller. */
  fresh?: boolean;
  expect: Partial<Record<Actor, number>> & { authed?: number };
}

// Each fixture and each create call needs its own values: keepers and watch patterns are unique per user.
let unique = 0;
const nextSerial = () => String(40_000_000 + (unique += 1) * 7).padStart(8, '0');
const nextDate = () => `date:19${String(50 + ((unique += 1) % 49)).padStart(2, '0')}-0${(unique % 9) + 1}-1${unique % 10}`;

const NO_TOKEN = { none: 401, expired: 401, tampered: 401, disabled: 401 } as const;
const huntRead = { ...NO_TOKEN, collector: 404, admin: 404, crew: 200, owner: 200 };
const ownerOnly = (ok: number) => ({ ...NO_TOKEN, collector: 404, admin: 404, crew: 403, owner: ok });
const privateToOwner = (ok: number) => ({ ...NO_TOKEN, collector: 404, admin: 404, crew: 404, owner: ok });
const anyAuthed = (ok: number) => ({ ...NO_TOKEN, collector: ok, admin: ok, crew: ok, owner: ok });
const adminOnly = { ...NO_TOKEN, collector: 403, crew: 403, owner: 403, admin: 200 };

const ROUTES: RouteCase[] = [
  { method: 'get', path: () => '/api/me', expect: anyAuthed(200) },
  { method: 'patch', path: () => '/api/me', body: () => ({ displayName: 'Renamed hunter' }), expect: anyAuthed(200) },
  { method: 'get', path: () => '/api/hunts', expect: anyAuthed(200) },
  { method: 'post', path: () => '/api/hunts', body: () => ({ title: 'A hunt', source: 'Larkspur Valley CU', denomination: 1, plannedStraps: 1 }), expect: anyAuthed(201) },
  { method: 'get', path: (f) => `/api/hunts/${f.huntId}`, expect: huntRead },
  { method: 'patch', path: (f) => `/api/hunts/${f.huntId}`, body: () => ({ title: 'Retitled' }), expect: ownerOnly(200) },
  { method: 'post', path: (f) => `/api/hunts/${f.huntId}/close`, fresh: true, expect: ownerOnly(200) },
  { method: 'delete', path: (f) => `/api/hunts/${f.huntId}`, fresh: true, expect: ownerOnly(204) },
  { method: 'get', path: (f) => `/api/hunts/${f.huntId}/straps`, expect: huntRead },
  { method: 'patch', path: (f) => `/api/hunts/${f.huntId}/straps/1`, body: () => ({ swappedIn: 1 }), expect: huntRead },
  { method: 'get', path: (f) => `/api/hunts/${f.huntId}/scans`, expect: huntRead },
  { method: 'get', path: (f) => `/api/hunts/${f.huntId}/tally`, expect: huntRead },
  { method: 'get', path: (f) => `/api/hunts/${f.huntId}/members`, expect: huntRead },
  { method: 'delete', path: (f) => `/api/hunts/${f.huntId}/members/${f.crewId}`, fresh: true, expect: { ...NO_TOKEN, collector: 404, admin: 404, crew: 204, owner: 204 } },
  { method: 'post', path: () => '/api/scans/batch', body: (f) => ({ scans: [scanOf(f.huntId, '31740598')] }), expect: anyAuthed(200) },
  { method: 'delete', path: (f) => `/api/scans/${f.scanId}`, fresh: true, expect: { ...NO_TOKEN, collector: 404, admin: 404, crew: 403, owner: 204 } },
  { method: 'get', path: () => '/api/tally', expect: anyAuthed(200) },
  { method: 'get', path: () => '/api/keepers', expect: anyAuthed(200) },
  { method: 'post', path: () => '/api/keepers', body: () => ({ serial: nextSerial() }), expect: anyAuthed(201) },
  { method: 'get', path: (f) => `/api/keepers/${f.keeperId}`, expect: privateToOwner(200) },
  { method: 'patch', path: (f) => `/api/keepers/${f.keeperId}`, body: () => ({ grade: 64 }), expect: privateToOwner(200) },
  { method: 'delete', path: (f) => `/api/keepers/${f.keeperId}`, fresh: true, expect: privateToOwner(204) },
  { method: 'get', path: () => '/api/weights', expect: anyAuthed(200) },
  { method: 'post', path: () => '/api/weights', body: () => ({ name: 'Another table' }), expect: anyAuthed(201) },
  { method: 'post', path: (f) => `/api/weights/${f.weightId}/activate`, expect: privateToOwner(200) },
  { method: 'get', path: () => '/api/watch', expect: anyAuthed(200) },
  { method: 'post', path: () => '/api/watch', body: () => ({ pattern: nextDate() }), expect: anyAuthed(201) },
  { method: 'delete', path: (f) => `/api/watch/${f.watchId}`, fresh: true, expect: privateToOwner(204) },
  { method: 'get', path: (f) => `/api/keepers/${f.keeperId}/photos`, expect: privateToOwner(200) },
  { method: 'get', path: (f) => `/api/keepers/${f.keeperId}/share`, expect: privateToOwner(200) },
  { method: 'get', path: (f) => `/api/hunts/${f.huntId}/invites`, expect: ownerOnly(200) },
  { method: 'get', path: () => '/api/export/json', expect: anyAuthed(200) },
  { method: 'get', path: () => '/api/export/keepers.csv', expect: anyAuthed(200) },
  { method: 'get', path: () => '/api/admin/users', expect: adminOnly },
  { method: 'get', path: () => '/api/admin/stats', expect: adminOnly },
  { method: 'patch', path: (f) => `/api/admin/users/${f.victimId}`, body: () => ({ disabled: false }), expect: adminOnly },
];

describe('access control: every route × every kind of caller', () => {
  let api: TestApi;
  const users = {} as Record<'collector' | 'crew' | 'owner' | 'admin' | 'disabled' | 'victim', TestUser>;
  const headers = {} as Record<Actor, Record<string, string>>;
  let shared: Fixture;

  async function makeFixture(): Promise<Fixture> {
    const hunt = await createHunt(api.app, users.owner);
    await addCrew(api.app, users.owner, hunt.id, users.crew);
    const scan = scanOf(hunt.id, nextSerial());
    await request(api.app).post('/api/scans/batch').set(users.owner.auth).send({ scans: [scan] }).expect(200);
    const keeper = await request(api.app).post('/api/keepers').set(users.owner.auth).send({ scanId: scan.id }).expect(201);
    // Weight tables are capped per user, so one serves every fixture.
    const weightId = shared?.weightId ?? (await request(api.app).post('/api/weights').set(users.owner.auth).send({ name: 'Access table' }).expect(201)).body.id;
    const watch = await request(api.app).post('/api/watch').set(users.owner.auth).send({ pattern: nextDate() }).expect(201);
    return {
      huntId: hunt.id,
      scanId: scan.id,
      keeperId: keeper.body.id,
      weightId,
      watchId: watch.body.id,
      crewId: users.crew.id,
      victimId: users.victim.id,
    };
  }

  beforeAll(async () => {
    api = await openTestApi();
    for (const name of ['collector', 'crew', 'owner', 'disabled', 'victim'] as const) users[name] = await registerUser(api.app, name);
    users.admin = await registerAdmin(api);
    await api.dataSource.query('UPDATE users SET disabled = true WHERE id = $1', [users.disabled.id]);
    const secret = config().JWT_SECRET;
    const expired = jwt.sign({ ver: 0, typ: 'access' }, secret, { subject: users.owner.id, expiresIn: -60, algorithm: 'HS256', issuer: 'strapsift' });
    // The owner's own token with the subject swapped for the admin's: the signature no longer matches.
    const [head, , signature] = users.owner.token.split('.');
    const forged = Buffer.from(JSON.stringify({ ...JSON.parse(Buffer.from(users.owner.token.split('.')[1], 'base64url').toString()), sub: users.admin.id })).toString('base64url');
    headers.none = {};
    headers.expired = { Authorization: `Bearer ${expired}` };
    headers.tampered = { Authorization: `Bearer ${head}.${forged}.${signature}` };
    headers.disabled = users.disabled.auth;
    for (const name of ['collector', 'crew', 'owner', 'admin'] as const) headers[name] = users[name].auth;
    shared = await makeFixture();
  });

  afterAll(async () => {
    await api.close();
  });

  const cases = ROUTES.flatMap((route) =>
    ACTORS.filter((actor) => route.expect[actor] !== undefined).map((actor) => ({
      name: `${route.method.toUpperCase()} ${route.path({ huntId: ':id', scanId: ':id', keeperId: ':id', weightId: ':id', watchId: ':id', crewId: ':crew', victimId: ':user' })} as ${actor} → ${route.expect[actor]}`,
      route,
      actor,
    })),
  );

  it.each(cases)('$name', async ({ route, actor }) => {
    const fixture = route.fresh ? await makeFixture() : shared;
    let call = request(api.app)[route.method](route.path(fixture)).set(headers[actor]);
    if (route.body) call = call.send(route.body(fixture) as object);
    const response = await call;
    expect({ status: response.status, body: response.status >= 400 ? response.body : undefined }).toMatchObject({ status: route.expect[actor] });
    if (response.status >= 400) expect(response.body.error.code).toEqual(expect.any(String));
  });

  it('when a stranger posts notes into a hunt they are not in, then the batch answers 200 but stores nothing', async () => {
    const scan = scanOf(shared.huntId, '55555555');
    const response = await request(api.app).post('/api/scans/batch').set(users.collector.auth).send({ scans: [scan] });
    expect(response.body).toMatchObject({ stored: [], duplicates: [], rejected: [{ id: scan.id, code: 'hunt-not-found' }] });
    const [{ count }] = await api.dataSource.query('SELECT count(*)::int AS count FROM scans WHERE id = $1', [scan.id]);
    expect(count).toBe(0);
  });
});
