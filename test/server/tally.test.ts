import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEFAULT_WEIGHTS, MIXED_CAVEAT, PATTERN_IDS, SEQUENTIAL_CAVEAT, classify, expectedHits, sequentialHits } from '../../shared/engine';
import type { PatternId } from '../../shared/engine';
import { huntTally, periodTally } from '../../shared/contracts/tally';
import { addCrew, createHunt, missingId, openTestApi, ordinarySerial, postBatch, registerUser, scanOf, type TestApi, type TestUser } from '../support/api';

let api: TestApi;
let owner: TestUser;
let stranger: TestUser;

beforeAll(async () => {
  api = await openTestApi();
  [owner, stranger] = await Promise.all([registerUser(api.app, 'tally-owner'), registerUser(api.app, 'tally-stranger')]);
});
afterAll(async () => {
  await api.close();
});

const FANCY = ['12121212', '38055083', '00000417', '99995555', '10688901', '33030303', '52252922', '77777777', '12345678', '00000009'];

function engineCounts(serials: string[], lowLimit = DEFAULT_WEIGHTS.lowLimit): Record<PatternId, number> {
  const counts = Object.fromEntries(PATTERN_IDS.map((id) => [id, 0])) as Record<PatternId, number>;
  for (const serial of serials) for (const id of classify(serial, { lowLimit })) counts[id] += 1;
  return counts;
}

describe('GET /api/hunts/:id/tally', () => {
  it('when a hunt holds plain and fancy notes, then hits per pattern, per 1,000, expected and Poisson tail match the engine', async () => {
    const hunt = await createHunt(api.app, owner);
    const serials = [...FANCY, ...Array.from({ length: 190 }, (_, i) => ordinarySerial(i))];
    await postBatch(api.app, owner, serials.map((serial, i) => scanOf(hunt.id, serial, { strap: 1 + Math.floor(i / 100), pulled: i < 3 })));

    const response = await request(api.app).get(`/api/hunts/${hunt.id}/tally`).set(owner.auth);

    expect(response.status).toBe(200);
    const tally = huntTally.parse(response.body);
    const counts = engineCounts(serials);
    const expected = expectedHits(serials.length, counts, { lowLimit: DEFAULT_WEIGHTS.lowLimit });
    expect(tally.notes).toBe(200);
    expect(tally.pulled).toBe(3);
    expect(tally.hits).toBe(serials.filter((s) => classify(s).length > 0).length);
    expect(tally.perThousand).toBeCloseTo((tally.hits * 1000) / 200, 9);
    for (const row of expected.rows) {
      const served = tally.patterns.find((p) => p.id === row.id)!;
      expect(served.hits, row.id).toBe(counts[row.id]);
      expect(served.expected, row.id).toBeCloseTo(row.expected, 12);
      expect(served.pAtLeast, row.id).toBeCloseTo(row.pAtLeast!, 12);
      expect(served.perThousand, row.id).toBeCloseTo((counts[row.id] * 1000) / 200, 9);
    }
    expect(tally.caveat).toBe(expected.caveat);
  });

  it('when the caller’s low limit is 9, then low counts and expectations use 9 for both', async () => {
    const user = await registerUser(api.app, 'tally-low');
    const weights = { ...DEFAULT_WEIGHTS, lowLimit: 9 };
    await request(api.app).post('/api/weights').set(user.auth).send({ name: 'Tight low', weights, activate: true }).expect(201);
    const hunt = await createHunt(api.app, user);
    await postBatch(api.app, user, ['00000009', '00000417', '00000010'].map((s) => scanOf(hunt.id, s)));

    const tally = huntTally.parse((await request(api.app).get(`/api/hunts/${hunt.id}/tally`).set(user.auth)).body);

    expect(tally.lowLimit).toBe(9);
    const low = tally.patterns.find((p) => p.id === 'low')!;
    expect(low.hits).toBe(1);
    expect(low.expected).toBeCloseTo(expectedHits(3, {}, { lowLimit: 9 }).rows.find((r) => r.id === 'low')!.expected, 12);
  });

  it('when the hunt is empty, then every figure is zero and nothing divides by zero', async () => {
    const hunt = await createHunt(api.app, owner);
    const tally = huntTally.parse((await request(api.app).get(`/api/hunts/${hunt.id}/tally`).set(owner.auth)).body);
    expect(tally).toMatchObject({ notes: 0, hits: 0, perThousand: 0 });
    expect(tally.patterns.every((p) => p.hits === 0 && p.expected === 0 && p.pAtLeast === 1)).toBe(true);
  });

  it('when a stranger asks, then 404; a bad id 400; no token 401', async () => {
    const hunt = await createHunt(api.app, owner);
    expect((await request(api.app).get(`/api/hunts/${hunt.id}/tally`).set(stranger.auth)).status).toBe(404);
    expect((await request(api.app).get('/api/hunts/bad/tally').set(owner.auth)).status).toBe(400);
    expect((await request(api.app).get(`/api/hunts/${missingId()}/tally`)).status).toBe(401);
  });
});

describe('GET /api/tally', () => {
  it('when a period is asked for, then only notes scanned in it count, with series by hunt and by week', async () => {
    const user = await registerUser(api.app, 'tally-period');
    const october = await createHunt(api.app, user, { title: 'October', startedAt: '2026-10-05T14:00:00.000Z' });
    const november = await createHunt(api.app, user, { title: 'November', startedAt: '2026-11-09T14:00:00.000Z' });
    await postBatch(api.app, user, [
      scanOf(october.id, '12121212', { scannedAt: '2026-10-05T14:01:00.000Z' }),
      scanOf(october.id, '48213377', { scannedAt: '2026-10-05T14:02:00.000Z' }),
      scanOf(november.id, '38055083', { scannedAt: '2026-11-09T14:01:00.000Z' }),
      scanOf(november.id, '57130264', { scannedAt: '2026-11-10T09:00:00.000Z' }),
    ]);

    const all = periodTally.parse((await request(api.app).get('/api/tally').set(user.auth).expect(200)).body);
    const novemberOnly = periodTally.parse((await request(api.app).get('/api/tally?from=2026-11-01&to=2026-11-09').set(user.auth).expect(200)).body);

    expect(all).toMatchObject({ notes: 4, hits: 2, bucket: 'week', from: null, to: null });
    expect(all.byHunt.map((h) => [h.title, h.notes, h.hits])).toEqual([
      ['October', 2, 1],
      ['November', 2, 1],
    ]);
    expect(all.overTime.map((b) => [b.start, b.notes])).toEqual([
      ['2026-10-05T00:00:00.000Z', 2],
      ['2026-11-09T00:00:00.000Z', 2],
    ]);
    expect(novemberOnly).toMatchObject({ notes: 1, hits: 1, from: '2026-11-01T00:00:00.000Z', to: '2026-11-09T23:59:59.999Z' });
    expect(novemberOnly.patterns.find((p) => p.id === 'radar')!.hits).toBe(1);
  });

  it('when crew logged notes into the caller’s hunt, then the caller’s tally includes them; a stranger’s tally does not', async () => {
    const user = await registerUser(api.app, 'tally-crew-owner');
    const crew = await registerUser(api.app, 'tally-crew');
    const hunt = await createHunt(api.app, user);
    await addCrew(api.app, user, hunt.id, crew);
    await postBatch(api.app, crew, [scanOf(hunt.id, '24682468')]);

    const owners = periodTally.parse((await request(api.app).get('/api/tally').set(user.auth)).body);
    const strangers = periodTally.parse((await request(api.app).get('/api/tally').set(stranger.auth)).body);

    expect(owners.notes).toBe(1);
    expect(strangers.byHunt.find((h) => h.huntId === hunt.id)).toBeUndefined();
  });

  it('when dates are malformed or reversed, then it answers 400 naming the field; no token 401', async () => {
    const malformed = await request(api.app).get('/api/tally?from=yesterday&bucket=year').set(owner.auth);
    const reversed = await request(api.app).get('/api/tally?from=2026-11-02&to=2026-11-01').set(owner.auth);

    expect(malformed.status).toBe(400);
    expect(Object.keys(malformed.body.error.fields).sort()).toEqual(['bucket', 'from']);
    expect(reversed.status).toBe(400);
    expect(reversed.body.error.fields).toHaveProperty('to');
    expect((await request(api.app).get('/api/tally')).status).toBe(401);
  });
});

describe('tally for notes in sequence (TRADE.md: the exact distribution over every starting serial, not Poisson)', () => {
  it('when a hunt in sequence holds a strap of 100 consecutive notes with no radar, then Tally says no comparison, not "fewer than chance", and uses the run distribution', async () => {
    const hunt = await createHunt(api.app, owner, { inSequence: true });
    // 40,000,100 … 40,000,199: a plain strap of new notes from a $1 block.
    const serials = Array.from({ length: 100 }, (_, i) => String(40_000_100 + i).padStart(8, '0'));
    await postBatch(api.app, owner, serials.map((serial) => scanOf(hunt.id, serial)));

    const tally = huntTally.parse((await request(api.app).get(`/api/hunts/${hunt.id}/tally`).set(owner.auth)).body);

    expect(tally.basis).toBe('sequence');
    const counts = engineCounts(serials);
    const engine = sequentialHits(100, counts, { lowLimit: DEFAULT_WEIGHTS.lowLimit, domainLast: 96_000_000 });
    for (const row of engine.rows) {
      const served = tally.patterns.find((p) => p.id === row.id)!;
      expect(served.verdict, row.id).toBe(row.verdict);
      expect(served.pAtMost, row.id).toBeCloseTo(row.pAtMost!, 12);
      expect(served.expected, row.id).toBeCloseTo(row.expected, 12);
    }
    expect(tally.patterns.find((p) => p.id === 'radar')!.verdict).toBe('no-comparison');
    expect(tally.patterns.some((p) => p.verdict === 'fewer')).toBe(false);
    expect(tally.caveat).toBe(SEQUENTIAL_CAVEAT);
  });

  it('when the same notes are a circulated hunt, then Poisson judges them', async () => {
    const hunt = await createHunt(api.app, owner);
    await postBatch(api.app, owner, [scanOf(hunt.id, '12121212')]);
    const tally = huntTally.parse((await request(api.app).get(`/api/hunts/${hunt.id}/tally`).set(owner.auth)).body);
    expect(tally.basis).toBe('poisson');
  });

  it('when the period mixes hunts in sequence and circulated hunts, then it says so and combines them', async () => {
    const user = await registerUser(api.app, 'tally-mixed');
    const run = await createHunt(api.app, user, { inSequence: true });
    const mixed = await createHunt(api.app, user);
    await postBatch(api.app, user, Array.from({ length: 50 }, (_, i) => scanOf(run.id, String(30_000_000 + i).padStart(8, '0'))));
    await postBatch(api.app, user, Array.from({ length: 50 }, (_, i) => scanOf(mixed.id, ordinarySerial(i))));
    const tally = periodTally.parse((await request(api.app).get('/api/tally').set(user.auth)).body);
    expect(tally.basis).toBe('mixed');
    expect(tally.caveat).toBe(MIXED_CAVEAT);
    expect(tally.patterns.every((p) => ['more', 'fewer', 'as-chance', 'no-comparison'].includes(p.verdict))).toBe(true);
  });
});
