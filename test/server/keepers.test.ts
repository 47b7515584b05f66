import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEFAULT_WEIGHTS, read } from '../../shared/engine';
import { keeperDetail, keeperList } from '../../shared/contracts/keepers';
import { createHunt, missingId, openTestApi, postBatch, registerUser, scanOf, type TestApi, type TestUser } from '../support/api';

let api: TestApi;
let owner: TestUser;
let stranger: TestUser;

beforeAll(async () => {
  api = await openTestApi();
  [owner, stranger] = await Promise.all([registerUser(api.app, 'keeper-owner'), registerUser(api.app, 'keeper-stranger')]);
});
afterAll(async () => {
  await api.close();
});

async function typeIn(user: TestUser, body: Record<string, unknown>) {
  const response = await request(api.app).post('/api/keepers').set(user.auth).send(body);
  if (response.status !== 201) throw new Error(`keeper not created: ${response.status} ${JSON.stringify(response.body)}`);
  return keeperDetail.parse(response.body);
}

describe('POST /api/keepers', () => {
  it('when a serial is typed in with its details, then the keeper holds them and the engine’s reading with trade notes', async () => {
    const response = await request(api.app).post('/api/keepers').set(owner.auth).send({
      serial: 'MB 1212 1212 *',
      series: '2013',
      facility: 'FW',
      denomination: 1,
      grade: 64,
      estimatedValueCents: 4500,
      notes: 'crisp, from the third strap',
    });

    expect(response.status).toBe(201);
    const keeper = keeperDetail.parse(response.body);
    const engine = read('MB 1212 1212 *', { weights: DEFAULT_WEIGHTS, series: '2013', district: 'B', facility: 'FW', denomination: 1 });
    if (!engine.ok) throw new Error('fixture does not read');
    expect(keeper).toMatchObject({
      digits: '12121212',
      prefix: 'MB',
      star: true,
      district: 'B',
      series: '2013',
      grade: 64,
      estimatedValueCents: 4500,
      status: 'kept',
      patterns: engine.patterns,
      points: engine.score.points,
    });
    expect(keeper.reading.trade.map((note) => note.id)).toEqual(engine.trade.map((note) => note.id));
    expect(keeper.reading.trade.length).toBeGreaterThan(1);
    expect(keeper.reading.score).toEqual(engine.score);
  });

  it('when made from a logged note, then it copies serial, hunt and time; asking again returns the same keeper with 200', async () => {
    const hunt = await createHunt(api.app, owner, { denomination: 5 });
    const scan = scanOf(hunt.id, 'LG 3805 5083 D', { pulled: true });
    await postBatch(api.app, owner, [scan]);

    const first = await request(api.app).post('/api/keepers').set(owner.auth).send({ scanId: scan.id, grade: 58 });
    const again = await request(api.app).post('/api/keepers').set(owner.auth).send({ scanId: scan.id });

    expect(first.status).toBe(201);
    const keeper = keeperDetail.parse(first.body);
    expect(keeper).toMatchObject({ scanId: scan.id, huntId: hunt.id, digits: '38055083', district: 'G', denomination: 5, grade: 58, foundAt: scan.scannedAt });
    expect(keeper.patterns).toContain('radar');
    expect(again.status).toBe(200);
    expect(keeperDetail.parse(again.body).id).toBe(keeper.id);
  });

  it('when the serial is unreadable or fields are out of range, then it answers 400 naming each field', async () => {
    const response = await request(api.app)
      .post('/api/keepers')
      .set(owner.auth)
      .send({ serial: '12 34', grade: 71, estimatedValueCents: 12.5, status: 'lost', district: 'Z', series: 'old' });

    expect(response.status).toBe(400);
    expect(Object.keys(response.body.error.fields).sort()).toEqual(['district', 'estimatedValueCents', 'grade', 'series', 'status']);
    const unreadable = await request(api.app).post('/api/keepers').set(owner.auth).send({ serial: '12 34' });
    expect(unreadable.status).toBe(400);
    expect(unreadable.body.error.fields.serial).toMatch(/\w/);
    const neither = await request(api.app).post('/api/keepers').set(owner.auth).send({ grade: 20 });
    expect(neither.body.error.fields).toHaveProperty('serial');
  });

  it('when the scan belongs to a hunt the caller is not in, then it answers 404; no token 401', async () => {
    const hunt = await createHunt(api.app, owner);
    const scan = scanOf(hunt.id, '27182818');
    await postBatch(api.app, owner, [scan]);

    expect((await request(api.app).post('/api/keepers').set(stranger.auth).send({ scanId: scan.id })).status).toBe(404);
    expect((await request(api.app).post('/api/keepers').send({ serial: '27182818' })).status).toBe(401);
  });
});

describe('GET /api/keepers', () => {
  it('when searched and sorted, then matching keepers come back in order and the cursor walks them all', async () => {
    const user = await registerUser(api.app, 'keeper-list');
    await typeIn(user, { serial: '11223344', estimatedValueCents: 300, grade: 20, foundAt: '2026-10-01T10:00:00.000Z' });
    await typeIn(user, { serial: '99995555', estimatedValueCents: 9000, grade: 63, foundAt: '2026-10-02T10:00:00.000Z' });
    await typeIn(user, { serial: '38055083', foundAt: '2026-10-03T10:00:00.000Z', notes: 'radar from the blue strap' });
    await typeIn(user, { serial: '12121212', estimatedValueCents: 2500, status: 'traded', foundAt: '2026-10-04T10:00:00.000Z' });

    const get = async (query: string) => keeperList.parse((await request(api.app).get(`/api/keepers?${query}`).set(user.auth).expect(200)).body);
    const newest = await get('');
    const byValue = await get('sort=value');
    const byGrade = await get('sort=grade');
    const bySerial = await get('sort=serial');
    const search = await get('query=blue');
    const digits = await get('query=5555');
    const traded = await get('status=traded');

    expect(newest.items.map((k) => k.digits)).toEqual(['12121212', '38055083', '99995555', '11223344']);
    expect(byValue.items.map((k) => k.estimatedValueCents)).toEqual([9000, 2500, 300, null]);
    expect(byGrade.items.map((k) => k.grade)).toEqual([63, 20, null, null]);
    expect(bySerial.items.map((k) => k.digits)).toEqual(['11223344', '12121212', '38055083', '99995555']);
    expect(search.items.map((k) => k.digits)).toEqual(['38055083']);
    expect(digits.items.map((k) => k.digits)).toEqual(['99995555']);
    expect(traded.items.map((k) => k.digits)).toEqual(['12121212']);

    for (const sort of ['newest', 'oldest', 'points', 'value', 'grade', 'serial']) {
      const seen: string[] = [];
      let cursor: string | null = null;
      do {
        const pageBody: ReturnType<typeof keeperList.parse> = await get(`sort=${sort}&limit=1${cursor ? `&cursor=${cursor}` : ''}`);
        seen.push(...pageBody.items.map((k) => k.id));
        cursor = pageBody.nextCursor;
      } while (cursor);
      expect(seen, sort).toEqual((await get(`sort=${sort}`)).items.map((k) => k.id));
    }
  });

  it('when another user lists keepers, then they see none of the owner’s', async () => {
    await typeIn(owner, { serial: '31415926' });
    const body = keeperList.parse((await request(api.app).get('/api/keepers').set(stranger.auth)).body);
    expect(body.items.some((k) => k.digits === '31415926')).toBe(false);
  });

  it('when the query is bad, then 400 naming the field; no token 401', async () => {
    const response = await request(api.app).get('/api/keepers?sort=price&cursor=%%%').set(owner.auth);
    expect(response.status).toBe(400);
    expect(response.body.error.fields).toHaveProperty('sort');
    expect((await request(api.app).get('/api/keepers')).status).toBe(401);
  });
});

describe('GET, PATCH and DELETE /api/keepers/:id', () => {
  it('when the owner reads, edits and deletes a keeper, then each step shows the change', async () => {
    const keeper = await typeIn(owner, { serial: '44448888' });

    const read1 = keeperDetail.parse((await request(api.app).get(`/api/keepers/${keeper.id}`).set(owner.auth).expect(200)).body);
    const patched = keeperDetail.parse(
      (await request(api.app).patch(`/api/keepers/${keeper.id}`).set(owner.auth).send({ status: 'sold', estimatedValueCents: 1250, grade: null, series: '2017A' }).expect(200))
        .body,
    );
    const deleted = await request(api.app).delete(`/api/keepers/${keeper.id}`).set(owner.auth);

    expect(read1.reading.digits).toBe('44448888');
    expect(patched).toMatchObject({ status: 'sold', estimatedValueCents: 1250, grade: null, series: '2017A' });
    expect(deleted.status).toBe(204);
    expect((await request(api.app).get(`/api/keepers/${keeper.id}`).set(owner.auth)).status).toBe(404);
  });

  it('when the serial is corrected, then patterns and points are read again', async () => {
    const keeper = await typeIn(owner, { serial: '48213377' });
    const patched = keeperDetail.parse((await request(api.app).patch(`/api/keepers/${keeper.id}`).set(owner.auth).send({ serial: '48211284' }).expect(200)).body);
    expect(keeper.patterns).toEqual([]);
    expect(patched.patterns).toEqual(['radar']);
  });

  it('when another user touches the keeper, then every verb answers 404 and the keeper is unchanged', async () => {
    const keeper = await typeIn(owner, { serial: '26262626', grade: 40 });

    expect((await request(api.app).get(`/api/keepers/${keeper.id}`).set(stranger.auth)).status).toBe(404);
    expect((await request(api.app).patch(`/api/keepers/${keeper.id}`).set(stranger.auth).send({ grade: 1 })).status).toBe(404);
    expect((await request(api.app).delete(`/api/keepers/${keeper.id}`).set(stranger.auth)).status).toBe(404);
    expect(keeperDetail.parse((await request(api.app).get(`/api/keepers/${keeper.id}`).set(owner.auth)).body).grade).toBe(40);
  });

  it('when input is bad, then 400 naming the field; unknown ids 404; no token 401', async () => {
    const keeper = await typeIn(owner, { serial: '26262627' });

    const bad = await request(api.app).patch(`/api/keepers/${keeper.id}`).set(owner.auth).send({ grade: 0, facility: 'NY' });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['facility', 'grade']);
    expect((await request(api.app).patch(`/api/keepers/${keeper.id}`).set(owner.auth).send({ serial: 'abc' })).status).toBe(400);
    expect((await request(api.app).get('/api/keepers/42').set(owner.auth)).status).toBe(400);
    expect((await request(api.app).get(`/api/keepers/${missingId()}`).set(owner.auth)).status).toBe(404);
    expect((await request(api.app).get(`/api/keepers/${keeper.id}`)).status).toBe(401);
    expect((await request(api.app).delete(`/api/keepers/${keeper.id}`)).status).toBe(401);
  });

  it('when the hunt a keeper came from is deleted, then the keeper stays in the collection', async () => {
    const hunt = await createHunt(api.app, owner);
    const scan = scanOf(hunt.id, '80088008');
    await postBatch(api.app, owner, [scan]);
    const keeper = keeperDetail.parse((await request(api.app).post('/api/keepers').set(owner.auth).send({ scanId: scan.id }).expect(201)).body);

    await request(api.app).delete(`/api/hunts/${hunt.id}`).set(owner.auth).expect(204);

    const after = keeperDetail.parse((await request(api.app).get(`/api/keepers/${keeper.id}`).set(owner.auth).expect(200)).body);
    expect(after).toMatchObject({ digits: '80088008', huntId: null, scanId: null });
  });
});

describe('keepers: original paper and star runs (TRADE.md: our own yes/no; run sizes the hunter looked up)', () => {
  it('when a star keeper records a small run, then the small-run bonus is in its points; a large run or none earns no bonus', async () => {
    const small = await typeIn(owner, { serial: 'B 2345 6791 *', denomination: 1, starRunSize: 320_000, originalPaper: true });
    const large = await typeIn(owner, { serial: 'B 2345 6792 *', denomination: 1, starRunSize: 3_200_000, originalPaper: false });
    const none = await typeIn(owner, { serial: 'B 2345 6793 *', denomination: 1 });
    expect([small.originalPaper, large.originalPaper, none.originalPaper]).toEqual([true, false, null]);
    expect(small.starRunSize).toBe(320_000);
    expect(small.points - large.points).toBe(DEFAULT_WEIGHTS.smallStarRunBonus);
    expect(large.points).toBe(none.points);
    expect(none.reading.score.suggestion).toContain('look up its run size');

    const patched = keeperDetail.parse(
      (await request(api.app).patch(`/api/keepers/${none.id}`).set(owner.auth).send({ starRunSize: 640_000 }).expect(200)).body,
    );
    expect(patched.points).toBe(none.points + DEFAULT_WEIGHTS.smallStarRunBonus);
  });

  it('when a $1 keeper is typed in with two prefix letters, then its reading warns that $1 notes carry one (BEP serial numbers)', async () => {
    const keeper = await typeIn(owner, { serial: 'MB 2345 6794 A', denomination: 1, series: '2017' });
    expect(keeper.reading.trade.find((n) => n.id === 'serial-format')?.text).toContain('$1 notes carry one prefix letter: the district.');
  });
});
