import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEFAULT_WEIGHTS, read } from '../../shared/engine';
import { scanBatchResponse, scanPage } from '../../shared/contracts/scans';
import {
  addCrew,
  createHunt,
  missingId,
  ordinarySerial,
  postBatch,
  registerUser,
  scanOf,
  openTestApi,
  type TestApi,
  type TestUser,
} from '../support/api';

let api: TestApi;
let owner: TestUser;
let stranger: TestUser;

beforeAll(async () => {
  api = await openTestApi();
  owner = await registerUser(api.app, 'scan-owner');
  stranger = await registerUser(api.app, 'scan-stranger');
});
afterAll(async () => {
  await api.close();
});

async function storedCount(ids: string[]): Promise<number> {
  const [row] = await api.dataSource.query(`SELECT count(*)::int AS n FROM scans WHERE id = ANY($1::uuid[])`, [ids]);
  return row.n;
}

describe('POST /api/scans/batch', () => {
  it('when a batch of new notes is sent, then every note is stored and listed as stored', async () => {
    const hunt = await createHunt(api.app, owner);
    const scans = [scanOf(hunt.id, '12121212'), scanOf(hunt.id, 'LB 3805 5083 C'), scanOf(hunt.id, '48213377', { strap: 2 })];

    const response = await postBatch(api.app, owner, scans);

    expect(response.status).toBe(200);
    const body = scanBatchResponse.parse(response.body);
    expect(body.stored.sort()).toEqual(scans.map((s) => s.id).sort());
    expect(body.duplicates).toEqual([]);
    expect(body.rejected).toEqual([]);
    expect(await storedCount(scans.map((s) => s.id))).toBe(3);
  });

  it('when the same batch is sent twice, then each note is stored once and the second answer names them duplicates', async () => {
    const hunt = await createHunt(api.app, owner);
    const scans = Array.from({ length: 20 }, (_, i) => scanOf(hunt.id, ordinarySerial(i)));

    const first = scanBatchResponse.parse((await postBatch(api.app, owner, scans)).body);
    const second = scanBatchResponse.parse((await postBatch(api.app, owner, scans)).body);

    expect(first.stored).toHaveLength(20);
    expect(second.stored).toEqual([]);
    expect(second.duplicates.sort()).toEqual(scans.map((s) => s.id).sort());
    expect(await storedCount(scans.map((s) => s.id))).toBe(20);
  });

  it('when two copies of a batch arrive at once, then each note is stored once between them', async () => {
    const hunt = await createHunt(api.app, owner);
    const scans = Array.from({ length: 200 }, (_, i) => scanOf(hunt.id, ordinarySerial(1000 + i)));

    const [a, b] = await Promise.all([postBatch(api.app, owner, scans), postBatch(api.app, owner, scans)]);

    const answers = [scanBatchResponse.parse(a.body), scanBatchResponse.parse(b.body)];
    expect(answers[0]!.stored.length + answers[1]!.stored.length).toBe(200);
    expect(answers[0]!.duplicates.length + answers[1]!.duplicates.length).toBe(200);
    const storedIds = new Set([...answers[0]!.stored, ...answers[1]!.stored]);
    expect(storedIds.size).toBe(200);
    expect(await storedCount(scans.map((s) => s.id))).toBe(200);
  });

  it('when one batch holds the same id twice, then the note is stored once and the repeat is a duplicate', async () => {
    const hunt = await createHunt(api.app, owner);
    const scan = scanOf(hunt.id, '55512345');

    const body = scanBatchResponse.parse((await postBatch(api.app, owner, [scan, scan])).body);

    expect(body.stored).toEqual([scan.id]);
    expect(body.duplicates).toEqual([scan.id]);
    expect(await storedCount([scan.id])).toBe(1);
  });

  it('when the client sends its own patterns and points, then the server stores the engine’s reading instead', async () => {
    const hunt = await createHunt(api.app, owner, { denomination: 1 });
    const serials = ['12121212', 'LB 3805 5083 C', '00000417', '99990123', '10688901', '31415926', 'B 7777 7777 *'];
    const scans = serials.map((serial, i) => ({ ...scanOf(hunt.id, serial, { star: i === 3 }), patterns: ['solid'], points: 999, keep: true }));

    await postBatch(api.app, owner, scans);
    const listed = scanPage.parse((await request(api.app).get(`/api/hunts/${hunt.id}/scans?limit=50`).set(owner.auth)).body);

    expect(listed.items).toHaveLength(serials.length);
    for (const scan of scans) {
      const stored = listed.items.find((item) => item.id === scan.id)!;
      const engine = read(scan.serial, { weights: DEFAULT_WEIGHTS, star: scan.star === true, denomination: 1 });
      if (!engine.ok) throw new Error(`test serial ${scan.serial} does not read`);
      expect(stored).toMatchObject({
        digits: engine.digits,
        prefix: engine.prefix,
        suffix: engine.suffix,
        star: engine.star,
        district: engine.district,
        patterns: engine.patterns,
        points: engine.score.points,
        keep: engine.score.keep,
      });
    }
    // The fixture must exercise real patterns, not only plain notes.
    expect(listed.items.some((item) => item.patterns.length >= 2)).toBe(true);
  });

  it('when notes say how they were entered, then the camera’s confidence is kept for camera notes only and the list shows both', async () => {
    const hunt = await createHunt(api.app, owner);
    const camera = scanOf(hunt.id, '31415926', { entryMethod: 'camera', cameraConfidence: 0.93 });
    const typed = scanOf(hunt.id, '27182818', { entryMethod: 'keypad', cameraConfidence: 0.5 });
    const plain = scanOf(hunt.id, '16180339');
    const star = scanOf(hunt.id, '00001234*', { star: true, starRunSize: 320_000 });

    const body = scanBatchResponse.parse((await postBatch(api.app, owner, [camera, typed, plain, star])).body);
    expect(body.stored).toHaveLength(4);

    const listed = scanPage.parse((await request(api.app).get(`/api/hunts/${hunt.id}/scans`).set(owner.auth)).body).items;
    const byId = new Map(listed.map((s) => [s.id, s]));
    expect(byId.get(camera.id)).toMatchObject({ entryMethod: 'camera', starRunSize: null });
    expect(byId.get(camera.id)!.cameraConfidence).toBeCloseTo(0.93, 5);
    expect(byId.get(typed.id)).toMatchObject({ entryMethod: 'keypad', cameraConfidence: null });
    expect(byId.get(plain.id)).toMatchObject({ entryMethod: 'keypad', cameraConfidence: null });
    expect(byId.get(star.id)).toMatchObject({ star: true, starRunSize: 320_000 });
  });

  it('when the entry method or confidence is out of range, then only that note is rejected naming the field', async () => {
    const hunt = await createHunt(api.app, owner);
    const bad = [
      scanOf(hunt.id, '31415926', { entryMethod: 'voice' as never }),
      scanOf(hunt.id, '31415927', { entryMethod: 'camera', cameraConfidence: 1.5 }),
    ];
    const good = scanOf(hunt.id, '31415928', { entryMethod: 'camera', cameraConfidence: 1 });

    const body = scanBatchResponse.parse((await postBatch(api.app, owner, [...bad, good])).body);

    expect(body.stored).toEqual([good.id]);
    expect(body.rejected.map((r) => r.id).sort()).toEqual(bad.map((s) => s.id).sort());
    expect(body.rejected.find((r) => r.id === bad[0]!.id)!.error).toMatch(/entryMethod/);
    expect(body.rejected.find((r) => r.id === bad[1]!.id)!.error).toMatch(/cameraConfidence/);
  });

  it('when the user has watch patterns and their own weights, then the stored score is the engine’s score with them', async () => {
    const user = await registerUser(api.app, 'scan-weights');
    const hunt = await createHunt(api.app, user);
    await request(api.app).post('/api/watch').set(user.auth).send({ pattern: '0704????' }).expect(201);
    const weights = { ...DEFAULT_WEIGHTS, watchBonus: 9, keepThreshold: 8 };
    await request(api.app).post('/api/weights').set(user.auth).send({ name: 'Strict', weights, activate: true }).expect(201);
    const scan = scanOf(hunt.id, '07041776');

    await postBatch(api.app, user, [scan]);
    const listed = scanPage.parse((await request(api.app).get(`/api/hunts/${hunt.id}/scans`).set(user.auth)).body);

    const engine = read('07041776', { weights, watch: ['0704????'], denomination: 1 });
    if (!engine.ok) throw new Error('fixture does not read');
    expect(engine.score.points).toBeGreaterThanOrEqual(9);
    expect(listed.items[0]).toMatchObject({ points: engine.score.points, keep: engine.score.keep });
  });

  it('when some notes are bad, then only those are rejected, each with its reason, and the rest are stored', async () => {
    const hunt = await createHunt(api.app, owner);
    const good = scanOf(hunt.id, '24681357');
    const unreadable = scanOf(hunt.id, '1234');
    const badStrap = { ...scanOf(hunt.id, '24681358'), strap: 0 };
    const otherHunt = scanOf(missingId(), '24681359');

    const body = scanBatchResponse.parse((await postBatch(api.app, owner, [good, unreadable, badStrap, otherHunt])).body);

    expect(body.stored).toEqual([good.id]);
    const reasons = Object.fromEntries(body.rejected.map((r) => [r.id, r.code]));
    expect(reasons).toEqual({ [unreadable.id]: 'unreadable-serial', [badStrap.id]: 'invalid', [otherHunt.id]: 'hunt-not-found' });
    expect(body.rejected.find((r) => r.id === badStrap.id)!.error).toContain('strap');
  });

  it('when the hunt is closed, then notes logged after the close are rejected and notes logged before it are stored', async () => {
    const hunt = await createHunt(api.app, owner);
    const before = scanOf(hunt.id, '13572468', { scannedAt: new Date(Date.now() - 60_000).toISOString() });
    await request(api.app).post(`/api/hunts/${hunt.id}/close`).set(owner.auth).expect(200);
    const after = scanOf(hunt.id, '13572469', { scannedAt: new Date(Date.now() + 60_000).toISOString() });

    const body = scanBatchResponse.parse((await postBatch(api.app, owner, [before, after])).body);

    expect(body.stored).toEqual([before.id]);
    expect(body.rejected).toEqual([expect.objectContaining({ id: after.id, code: 'hunt-closed' })]);
  });

  it('when a crew member logs notes into the owner’s hunt, then they are stored under the crew member', async () => {
    const hunt = await createHunt(api.app, owner);
    const crew = await registerUser(api.app, 'scan-crew');
    await addCrew(api.app, owner, hunt.id, crew);
    const scan = scanOf(hunt.id, '86420975', { strap: 3 });

    const body = scanBatchResponse.parse((await postBatch(api.app, crew, [scan])).body);
    const listed = scanPage.parse((await request(api.app).get(`/api/hunts/${hunt.id}/scans`).set(owner.auth)).body);

    expect(body.stored).toEqual([scan.id]);
    expect(listed.items[0]!.loggedBy.id).toBe(crew.id);
  });

  it('when a stranger sends notes into someone else’s hunt, then every note is rejected as hunt-not-found', async () => {
    const hunt = await createHunt(api.app, owner);
    const scans = [scanOf(hunt.id, '11223344'), scanOf(hunt.id, '11223345')];

    const body = scanBatchResponse.parse((await postBatch(api.app, stranger, scans)).body);

    expect(body.stored).toEqual([]);
    expect(body.rejected.map((r) => r.code)).toEqual(['hunt-not-found', 'hunt-not-found']);
    expect(await storedCount(scans.map((s) => s.id))).toBe(0);
  });

  it('when the batch holds more than 1,000 scans, then it answers 400 naming scans', async () => {
    const hunt = await createHunt(api.app, owner);
    const scans = Array.from({ length: 1001 }, (_, i) => scanOf(hunt.id, ordinarySerial(i)));

    const response = await postBatch(api.app, owner, scans);

    expect(response.status).toBe(400);
    expect(response.body.error).toMatchObject({ code: 'invalid', fields: { scans: expect.stringContaining('1,000') } });
  });

  it('when a scan has no usable id, then it answers 400 naming that scan’s id field', async () => {
    const hunt = await createHunt(api.app, owner);

    const response = await postBatch(api.app, owner, [scanOf(hunt.id, '12345670'), { ...scanOf(hunt.id, '12345671'), id: 'not-a-uuid' }]);

    expect(response.status).toBe(400);
    expect(response.body.error.fields).toHaveProperty(['scans.1.id']);
  });

  it('when the body is not a batch at all, then it answers 400 with fields, not 500', async () => {
    const response = await request(api.app).post('/api/scans/batch').set(owner.auth).send({ scans: 'many' });

    expect(response.status).toBe(400);
    expect(response.body.error.fields).toHaveProperty('scans');
  });

  it('when no token is sent, then it answers 401', async () => {
    const response = await request(api.app).post('/api/scans/batch').send({ scans: [] });
    expect(response.status).toBe(401);
  });
});

describe('GET /api/hunts/:id/scans', () => {
  it('when a hunt has more notes than a page, then the cursor walks every note once, newest first', async () => {
    const hunt = await createHunt(api.app, owner);
    const scans = Array.from({ length: 25 }, (_, i) => scanOf(hunt.id, ordinarySerial(5000 + i), { strap: 1 + (i % 3) }));
    await postBatch(api.app, owner, scans);

    const seen: string[] = [];
    let cursor: string | null = null;
    let pages = 0;
    do {
      const url: string = `/api/hunts/${hunt.id}/scans?limit=10${cursor ? `&cursor=${encodeURIComponent(cursor)}` : ''}`;
      const pageBody = scanPage.parse((await request(api.app).get(url).set(owner.auth).expect(200)).body);
      seen.push(...pageBody.items.map((item) => item.id));
      cursor = pageBody.nextCursor;
      pages += 1;
    } while (cursor);

    expect(pages).toBe(3);
    expect(seen).toEqual(scans.map((s) => s.id).reverse());
  });

  it('when filtered by strap, then only that strap’s notes come back', async () => {
    const hunt = await createHunt(api.app, owner);
    await postBatch(api.app, owner, [scanOf(hunt.id, '20202020', { strap: 1 }), scanOf(hunt.id, '20202021', { strap: 2 })]);

    const body = scanPage.parse((await request(api.app).get(`/api/hunts/${hunt.id}/scans?strap=2`).set(owner.auth)).body);

    expect(body.items.map((item) => item.serial)).toEqual(['20202021']);
  });

  it('when the cursor or limit is malformed, then it answers 400 naming the field', async () => {
    const hunt = await createHunt(api.app, owner);

    const badCursor = await request(api.app).get(`/api/hunts/${hunt.id}/scans?cursor=garbage`).set(owner.auth);
    const badLimit = await request(api.app).get(`/api/hunts/${hunt.id}/scans?limit=0`).set(owner.auth);

    expect(badCursor.status).toBe(400);
    expect(badCursor.body.error.fields).toHaveProperty('cursor');
    expect(badLimit.status).toBe(400);
    expect(badLimit.body.error.fields).toHaveProperty('limit');
  });

  it('when another user asks for the hunt’s scans, then it answers 404', async () => {
    const hunt = await createHunt(api.app, owner);
    const response = await request(api.app).get(`/api/hunts/${hunt.id}/scans`).set(stranger.auth);
    expect(response.status).toBe(404);
  });

  it('when no token is sent, then it answers 401', async () => {
    const response = await request(api.app).get(`/api/hunts/${missingId()}/scans`);
    expect(response.status).toBe(401);
  });
});

describe('DELETE /api/scans/:id', () => {
  it('when the logger undoes an uploaded note, then it is gone and re-sending it stores nothing', async () => {
    const hunt = await createHunt(api.app, owner);
    const scan = scanOf(hunt.id, '40404040');
    await postBatch(api.app, owner, [scan]);

    const deleted = await request(api.app).delete(`/api/scans/${scan.id}`).set(owner.auth);
    const resent = scanBatchResponse.parse((await postBatch(api.app, owner, [scan])).body);

    expect(deleted.status).toBe(204);
    expect(resent).toEqual({ stored: [], duplicates: [scan.id], rejected: [] });
    expect(await storedCount([scan.id])).toBe(0);
  });

  it('when crew try to delete a note someone else logged, then it answers 403', async () => {
    const hunt = await createHunt(api.app, owner);
    const crew = await registerUser(api.app, 'scan-crew-delete');
    await addCrew(api.app, owner, hunt.id, crew);
    const scan = scanOf(hunt.id, '40404041');
    await postBatch(api.app, owner, [scan]);

    const response = await request(api.app).delete(`/api/scans/${scan.id}`).set(crew.auth);

    expect(response.status).toBe(403);
    expect(await storedCount([scan.id])).toBe(1);
  });

  it('when a stranger or a bad id is used, then it answers 404 or 400 and the note stays', async () => {
    const hunt = await createHunt(api.app, owner);
    const scan = scanOf(hunt.id, '40404042');
    await postBatch(api.app, owner, [scan]);

    const strangers = await request(api.app).delete(`/api/scans/${scan.id}`).set(stranger.auth);
    const malformed = await request(api.app).delete('/api/scans/not-an-id').set(owner.auth);
    const anonymous = await request(api.app).delete(`/api/scans/${scan.id}`);

    expect(strangers.status).toBe(404);
    expect(malformed.status).toBe(400);
    expect(malformed.body.error.fields).toHaveProperty('id');
    expect(anonymous.status).toBe(401);
    expect(await storedCount([scan.id])).toBe(1);
  });
});
