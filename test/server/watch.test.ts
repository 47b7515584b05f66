import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseWatchPattern } from '../../shared/engine';
import { watchList, watchView } from '../../shared/contracts/watch';
import { missingId, openTestApi, registerUser, type TestApi, type TestUser } from '../support/api';

let api: TestApi;
let owner: TestUser;
let stranger: TestUser;

beforeAll(async () => {
  api = await openTestApi();
  [owner, stranger] = await Promise.all([registerUser(api.app, 'watch-owner'), registerUser(api.app, 'watch-stranger')]);
});
afterAll(async () => {
  await api.close();
});

describe('POST /api/watch', () => {
  it('when a mask, a range and a date are added, then each is stored in the engine’s canonical form', async () => {
    const inputs = [
      { pattern: '0704 ????', label: 'Independence Day' },
      { pattern: '1000-2000' },
      { pattern: 'date:1999-12-31:MMDDYYYY' },
    ];

    const created = [];
    for (const body of inputs) created.push(watchView.parse((await request(api.app).post('/api/watch').set(owner.auth).send(body).expect(201)).body));

    expect(created.map((w) => w.text)).toEqual(['0704????', '1000-2000', 'date:1999-12-31:MMDDYYYY']);
    const engine = parseWatchPattern('0704 ????');
    if (!engine.ok) throw new Error('fixture is not a watch pattern');
    expect(created[0]!.pattern).toEqual(engine.pattern);
    expect(created[0]!.label).toBe('Independence Day');
  });

  it('when the pattern is not one the engine accepts, then 400 with the engine’s reason on the pattern field', async () => {
    const response = await request(api.app).post('/api/watch').set(owner.auth).send({ pattern: '1999-02-29' });
    const engine = parseWatchPattern('1999-02-29');

    if (engine.ok) throw new Error('fixture should not be a watch pattern');
    expect(response.status).toBe(400);
    expect(response.body.error.fields.pattern).toBe(engine.error.message);
  });

  it('when the same pattern is added twice in different spellings, then the second answers 409', async () => {
    const user = await registerUser(api.app, 'watch-twice');
    await request(api.app).post('/api/watch').set(user.auth).send({ pattern: '12??1990' }).expect(201);
    expect((await request(api.app).post('/api/watch').set(user.auth).send({ pattern: '12?? 1990' })).status).toBe(409);
  });

  it('when the body is wrong, then 400 naming the field; no token 401', async () => {
    const response = await request(api.app).post('/api/watch').set(owner.auth).send({ pattern: 42 });
    expect(response.status).toBe(400);
    expect(response.body.error.fields).toHaveProperty('pattern');
    expect((await request(api.app).post('/api/watch').send({ pattern: '1000-2000' })).status).toBe(401);
  });
});

describe('GET /api/watch', () => {
  it('when listed, then the caller sees their patterns and the syntax help; another user sees none of them', async () => {
    const user = await registerUser(api.app, 'watch-list');
    await request(api.app).post('/api/watch').set(user.auth).send({ pattern: '5555????' }).expect(201);

    const mine = watchList.parse((await request(api.app).get('/api/watch').set(user.auth).expect(200)).body);
    const theirs = watchList.parse((await request(api.app).get('/api/watch').set(stranger.auth).expect(200)).body);

    expect(mine.items.map((w) => w.text)).toEqual(['5555????']);
    expect(mine.syntax).toContain('mask');
    expect(theirs.items.some((w) => w.text === '5555????')).toBe(false);
    expect((await request(api.app).get('/api/watch')).status).toBe(401);
  });
});

describe('DELETE /api/watch/:id', () => {
  it('when the owner deletes a pattern, then it is gone; another user 404; a bad id 400; no token 401', async () => {
    const user = await registerUser(api.app, 'watch-delete');
    const created = watchView.parse((await request(api.app).post('/api/watch').set(user.auth).send({ pattern: '8888????' }).expect(201)).body);

    expect((await request(api.app).delete(`/api/watch/${created.id}`).set(stranger.auth)).status).toBe(404);
    expect((await request(api.app).delete('/api/watch/x').set(user.auth)).status).toBe(400);
    expect((await request(api.app).delete(`/api/watch/${created.id}`)).status).toBe(401);
    expect((await request(api.app).delete(`/api/watch/${created.id}`).set(user.auth)).status).toBe(204);
    expect((await request(api.app).delete(`/api/watch/${created.id}`).set(user.auth)).status).toBe(404);
    expect((await request(api.app).delete(`/api/watch/${missingId()}`).set(user.auth)).status).toBe(404);
    expect(watchList.parse((await request(api.app).get('/api/watch').set(user.auth)).body).items).toEqual([]);
  });
});
