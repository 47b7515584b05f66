import fc from 'fast-check';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createHunt, openScratchApi, registerUser, scanOf, type TestApi, type TestUser } from '../support/api';

/**
 * Arbitrary input at every route: whatever arrives, the answer is never a 5xx, and a request that
 * is refused leaves no row behind.
 */
const ROUTES: { method: 'get' | 'post' | 'put' | 'patch' | 'delete'; path: string }[] = [
  { method: 'post', path: '/api/auth/register' },
  { method: 'post', path: '/api/auth/login' },
  { method: 'post', path: '/api/auth/refresh' },
  { method: 'post', path: '/api/auth/forgot' },
  { method: 'post', path: '/api/auth/reset' },
  { method: 'get', path: '/api/me' },
  { method: 'patch', path: '/api/me' },
  { method: 'get', path: '/api/hunts' },
  { method: 'post', path: '/api/hunts' },
  { method: 'get', path: '/api/hunts/:hunt' },
  { method: 'patch', path: '/api/hunts/:hunt' },
  { method: 'post', path: '/api/hunts/:hunt/close' },
  { method: 'get', path: '/api/hunts/:hunt/straps' },
  { method: 'patch', path: '/api/hunts/:hunt/straps/:n' },
  { method: 'get', path: '/api/hunts/:hunt/scans' },
  { method: 'get', path: '/api/hunts/:hunt/tally' },
  { method: 'get', path: '/api/hunts/:hunt/members' },
  { method: 'post', path: '/api/hunts/:hunt/members' },
  { method: 'delete', path: '/api/hunts/:hunt/members/:id' },
  { method: 'post', path: '/api/scans/batch' },
  { method: 'delete', path: '/api/scans/:id' },
  { method: 'get', path: '/api/tally' },
  { method: 'get', path: '/api/keepers' },
  { method: 'post', path: '/api/keepers' },
  { method: 'get', path: '/api/keepers/:id' },
  { method: 'patch', path: '/api/keepers/:id' },
  { method: 'get', path: '/api/weights' },
  { method: 'post', path: '/api/weights' },
  { method: 'put', path: '/api/weights/:id' },
  { method: 'post', path: '/api/weights/:id/activate' },
  { method: 'get', path: '/api/watch' },
  { method: 'post', path: '/api/watch' },
  { method: 'get', path: '/api/admin/users' },
];

const nasty = fc.constantFrom(
  "'; DROP TABLE scans; --",
  "1' OR '1'='1",
  '<script>alert(1)</script>',
  '${7*7}{{7*7}}',
  '../../etc/passwd',
  '\u0000\u0001\uFFFF',
  '💵★★★',
  'ＡＢ１２３４５６７８',
  '9'.repeat(400),
  '-0',
  'NaN',
  'Infinity',
  '__proto__',
  'constructor',
);
const text = fc.oneof(fc.string(), fc.string({ unit: 'grapheme', maxLength: 40 }), nasty);
const number = fc.oneof(fc.integer(), fc.double(), fc.constantFrom(1e308, -1e308, 2 ** 53 + 1, -0, 1e-320));
const leaf = fc.oneof(text, number, fc.boolean(), fc.constant(null));
const deep = fc.letrec((tie) => ({
  node: fc.oneof({ depthSize: 'small', withCrossShrink: true }, leaf, fc.array(tie('node'), { maxLength: 4 }), fc.dictionary(text, tie('node'), { maxKeys: 4 })),
})).node;
/** Bodies shaped like the real ones (right keys, wrong values) and plain junk. */
const body = fc.oneof(
  deep,
  fc.record(
    {
      email: leaf,
      password: leaf,
      displayName: leaf,
      title: leaf,
      source: leaf,
      denomination: leaf,
      plannedStraps: leaf,
      serial: leaf,
      scanId: leaf,
      grade: leaf,
      estimatedValueCents: leaf,
      name: leaf,
      weights: deep,
      pattern: leaf,
      swappedIn: leaf,
      disabled: leaf,
      token: leaf,
      scans: fc.array(fc.oneof(deep, fc.record({ id: leaf, huntId: leaf, strap: leaf, serial: leaf, scannedAt: leaf })), { maxLength: 5 }),
    },
    { requiredKeys: [] },
  ),
  fc.array(deep, { maxLength: 3 }),
);
const query = fc.dictionary(fc.constantFrom('cursor', 'limit', 'query', 'sort', 'status', 'from', 'to', 'strap', 'x'), text, { maxKeys: 4 });
const param = fc.oneof(fc.uuid(), text, fc.constant('00000000-0000-0000-0000-000000000000'));

describe('bad input at every route', () => {
  let api: TestApi;
  let owner: TestUser;
  let huntId: string;
  let tables: string[];

  async function rowCount(): Promise<number> {
    const sql = tables.map((table) => `(SELECT count(*) FROM "${table}")`).join(' + ');
    const [{ total }] = await api.dataSource.query(`SELECT (${sql})::int AS total`);
    return total;
  }

  beforeAll(async () => {
    // A database of its own: "stores nothing" is judged over every table, which other test files write to.
    api = await openScratchApi('bad_input');
    owner = await registerUser(api.app, 'fuzzed');
    huntId = (await createHunt(api.app, owner)).id;
    await request(api.app).post('/api/scans/batch').set(owner.auth).send({ scans: [scanOf(huntId, '12344321')] }).expect(200);
    const rows: { table_name: string }[] = await api.dataSource.query(
      // rate_limits counts every attempt by design (a refused request is still an attempt); it holds no one's data.
      "SELECT table_name FROM information_schema.tables WHERE table_schema = 'public' AND table_type = 'BASE TABLE' AND table_name NOT IN ('migrations', 'rate_limits')",
    );
    tables = rows.map((row) => row.table_name);
  });

  afterAll(async () => {
    await api.close();
  });

  /** Per route: cases that reached the app, and refused ones whose "stores nothing" check actually ran. */
  const exercised = new Map<string, { tried: number; refused: number }>();

  it.each(ROUTES)('$method $path: arbitrary bodies, queries and params never give a 5xx, and refused requests store nothing', async (route) => {
    let tried = 0;
    let refused = 0;
    await fc.assert(
      fc.asyncProperty(body, query, param, param, fc.boolean(), async (payload, search, id, n, useHunt) => {
        tried += 1;
        const path = route.path
          .replace(':hunt', useHunt ? huntId : encodeURIComponent(String(id)))
          .replace(':id', encodeURIComponent(String(id)))
          .replace(':n', encodeURIComponent(String(n)));
        const before = await rowCount();
        let call = request(api.app)[route.method](path).query(search).set(owner.auth);
        // Sent as JSON text, so bare numbers, booleans and null reach the server as a client could send them.
        if (route.method !== 'get' && route.method !== 'delete') call = call.set('Content-Type', 'application/json').send(JSON.stringify(payload) ?? 'null');
        const response = await call;
        expect(response.status, `${route.method} ${path} → ${response.status} ${JSON.stringify(response.body)}`).toBeLessThan(500);
        if (response.status >= 400) {
          refused += 1;
          expect(response.body?.error?.code).toEqual(expect.any(String));
          expect(await rowCount()).toBe(before);
        }
      }),
      { numRuns: 25 },
    );
    // Every generated case reached the app (a property that bailed out early would not count 25).
    expect(tried).toBe(25);
    exercised.set(`${route.method} ${route.path}`, { tried, refused });
  });

  it('when the runs above are added up, then every route that takes a body or a parameter refused junk at least once, so the "stores nothing" check ran', () => {
    const judged = ROUTES.filter((route) => route.method !== 'get' || route.path.includes(':'));
    const unrefused = judged.map((route) => `${route.method} ${route.path}`).filter((key) => (exercised.get(key)?.refused ?? 0) === 0);
    expect(exercised.size).toBe(ROUTES.length);
    expect(unrefused).toEqual([]);
  });

  it('when headers are junk (odd content types, broken auth, huge values), then answers stay below 500', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.constantFrom('application/json', 'text/plain', 'application/x-www-form-urlencoded', 'multipart/form-data; boundary=x', 'application/json; charset=utf-7', 'garbage/\u00ff'),
        // Only characters HTTP allows in a header; Node's client refuses to send the rest at all.
        fc.oneof(fc.string({ unit: fc.constantFrom(...'abcXYZ019.-_ =+/!"') }), fc.constant('Bearer '), fc.constant(`Bearer ${'a'.repeat(10_000)}`), fc.constant('Basic dXNlcjpwYXNz'), fc.constant('Bearer a.b.c')),
        fc.string({ maxLength: 2000 }),
        async (contentType, authorization, raw) => {
          const response = await request(api.app).post('/api/hunts').set('Content-Type', contentType).set('Authorization', authorization).send(raw);
          expect(response.status).toBeLessThan(500);
          expect(response.status).toBeGreaterThanOrEqual(400);
        },
      ),
      { numRuns: 60 },
    );
  });

  it('when a body is larger than the limit or nested very deeply, then it is refused with a 4xx', async () => {
    const huge = { title: 'x'.repeat(3 * 1024 * 1024) };
    const tooBig = await request(api.app).post('/api/hunts').set(owner.auth).send(huge);
    expect(tooBig.status).toBe(413);
    // Written as text: building it as an object and stringifying would overflow the test's own stack.
    for (const depth of [5_000, 300_000]) {
      const nested = `${'{"a":'.repeat(depth)}"leaf"${'}'.repeat(depth)}`;
      const deepResponse = await request(api.app).post('/api/hunts').set(owner.auth).set('Content-Type', 'application/json').send(nested);
      expect(deepResponse.status).toBeGreaterThanOrEqual(400);
      expect(deepResponse.status).toBeLessThan(500);
    }
  });
});
