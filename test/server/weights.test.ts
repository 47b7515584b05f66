import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEFAULT_WEIGHTS } from '../../shared/engine';
import { weightTableList, weightTableView } from '../../shared/contracts/weights';
import { missingId, openTestApi, registerUser, type TestApi, type TestUser } from '../support/api';

let api: TestApi;
let owner: TestUser;
let stranger: TestUser;

beforeAll(async () => {
  api = await openTestApi();
  [owner, stranger] = await Promise.all([registerUser(api.app, 'weights-owner'), registerUser(api.app, 'weights-stranger')]);
});
afterAll(async () => {
  await api.close();
});

const plain = () => JSON.parse(JSON.stringify(DEFAULT_WEIGHTS));

describe('GET /api/weights', () => {
  it('when a new account asks, then it has one active table holding the engine’s defaults', async () => {
    const user = await registerUser(api.app, 'weights-new');

    const body = weightTableList.parse((await request(api.app).get('/api/weights').set(user.auth).expect(200)).body);

    expect(body.items).toHaveLength(1);
    expect(body.items[0]).toMatchObject({ name: 'Standard', active: true, weights: plain() });
    expect(body.defaults).toEqual(plain());
  });

  it('when an account made before weight tables asks, then it gets a default table once, even when asked twice at once', async () => {
    const user = await registerUser(api.app, 'weights-legacy');
    await api.dataSource.query(`DELETE FROM weight_tables WHERE user_id = $1`, [user.id]);

    await Promise.all([request(api.app).get('/api/weights').set(user.auth), request(api.app).get('/api/weights').set(user.auth)]);

    const [row] = await api.dataSource.query(`SELECT count(*)::int AS n FROM weight_tables WHERE user_id = $1`, [user.id]);
    expect(row.n).toBe(1);
  });

  it('when no token is sent, then it answers 401', async () => {
    expect((await request(api.app).get('/api/weights')).status).toBe(401);
  });
});

describe('POST /api/weights and POST /api/weights/:id/activate', () => {
  it('when a second table is made and activated, then exactly one table is active', async () => {
    const user = await registerUser(api.app, 'weights-activate');
    const weights = { ...plain(), keepThreshold: 9, patterns: { ...plain().patterns, trinary: 0 } };

    const created = weightTableView.parse((await request(api.app).post('/api/weights').set(user.auth).send({ name: 'Picky', weights }).expect(201)).body);
    const activated = weightTableView.parse((await request(api.app).post(`/api/weights/${created.id}/activate`).set(user.auth).expect(200)).body);
    const list = weightTableList.parse((await request(api.app).get('/api/weights').set(user.auth)).body);

    expect(created.active).toBe(false);
    expect(activated).toMatchObject({ active: true, weights });
    expect(list.items.filter((t) => t.active).map((t) => t.name)).toEqual(['Picky']);
  });

  it('when two activations race, then still exactly one table is active', async () => {
    const user = await registerUser(api.app, 'weights-race');
    const a = weightTableView.parse((await request(api.app).post('/api/weights').set(user.auth).send({ name: 'A' }).expect(201)).body);
    const b = weightTableView.parse((await request(api.app).post('/api/weights').set(user.auth).send({ name: 'B' }).expect(201)).body);

    const answers = await Promise.all([
      request(api.app).post(`/api/weights/${a.id}/activate`).set(user.auth),
      request(api.app).post(`/api/weights/${b.id}/activate`).set(user.auth),
    ]);

    expect(answers.map((r) => r.status)).toEqual([200, 200]);
    const [row] = await api.dataSource.query(`SELECT count(*)::int AS n FROM weight_tables WHERE user_id = $1 AND active`, [user.id]);
    expect(row.n).toBe(1);
  });

  it('when the name is taken, then 409; when weights are malformed, 400 naming the weight', async () => {
    const taken = await request(api.app).post('/api/weights').set(owner.auth).send({ name: 'Standard' });
    const malformed = await request(api.app)
      .post('/api/weights')
      .set(owner.auth)
      .send({ name: 'Broken', weights: { ...plain(), lowLimit: 500, patterns: { ...plain().patterns, radar: 'lots' } } });

    expect(taken.status).toBe(409);
    expect(malformed.status).toBe(400);
    expect(Object.keys(malformed.body.error.fields).sort()).toEqual(['weights.lowLimit', 'weights.patterns.radar']);
  });

  it('when another user activates the table, then 404; a bad id 400; no token 401', async () => {
    const table = weightTableView.parse((await request(api.app).post('/api/weights').set(owner.auth).send({ name: 'Mine' }).expect(201)).body);
    expect((await request(api.app).post(`/api/weights/${table.id}/activate`).set(stranger.auth)).status).toBe(404);
    expect((await request(api.app).post('/api/weights/nope/activate').set(owner.auth)).status).toBe(400);
    expect((await request(api.app).post(`/api/weights/${table.id}/activate`)).status).toBe(401);
    expect((await request(api.app).post('/api/weights').send({ name: 'x' })).status).toBe(401);
  });
});

describe('PUT /api/weights/:id', () => {
  it('when the owner replaces a table, then the name and weights are the new ones', async () => {
    const table = weightTableView.parse((await request(api.app).post('/api/weights').set(owner.auth).send({ name: 'Draft' }).expect(201)).body);
    const weights = { ...plain(), starBonus: 3 };

    const response = await request(api.app).put(`/api/weights/${table.id}`).set(owner.auth).send({ name: 'Final', weights });

    expect(response.status).toBe(200);
    expect(weightTableView.parse(response.body)).toMatchObject({ name: 'Final', weights });
  });

  it('when the body is partial, then 400; another user 404; a missing id 404; no token 401', async () => {
    const table = weightTableView.parse((await request(api.app).post('/api/weights').set(owner.auth).send({ name: 'Kept' }).expect(201)).body);

    const partial = await request(api.app).put(`/api/weights/${table.id}`).set(owner.auth).send({ name: 'Only a name' });
    expect(partial.status).toBe(400);
    expect(partial.body.error.fields).toHaveProperty('weights');
    expect((await request(api.app).put(`/api/weights/${table.id}`).set(stranger.auth).send({ name: 'x', weights: plain() })).status).toBe(404);
    expect((await request(api.app).put(`/api/weights/${missingId()}`).set(owner.auth).send({ name: 'x', weights: plain() })).status).toBe(404);
    expect((await request(api.app).put(`/api/weights/${table.id}`).send({ name: 'x', weights: plain() })).status).toBe(401);
  });
});

describe('DELETE /api/weights/:id', () => {
  it('when an inactive table is deleted, then it is gone; the active one cannot be deleted (409)', async () => {
    const user = await registerUser(api.app, 'weights-delete');
    const extra = weightTableView.parse((await request(api.app).post('/api/weights').set(user.auth).send({ name: 'Spare' }).expect(201)).body);
    const active = weightTableList.parse((await request(api.app).get('/api/weights').set(user.auth)).body).items.find((t) => t.active)!;

    expect((await request(api.app).delete(`/api/weights/${extra.id}`).set(user.auth)).status).toBe(204);
    expect((await request(api.app).delete(`/api/weights/${active.id}`).set(user.auth)).status).toBe(409);
    expect((await request(api.app).delete(`/api/weights/${active.id}`).set(stranger.auth)).status).toBe(404);
    expect((await request(api.app).delete(`/api/weights/${active.id}`)).status).toBe(401);
  });
});

describe('tables saved before super radar, true binary and the small-star-run bonus', () => {
  it('when a stored table lacks them, then it is shown and scored with their defaults and keeps every weight the user set', async () => {
    const user = await registerUser(api.app, 'weights-older');
    await request(api.app).get('/api/weights').set(user.auth).expect(200);
    const older = plain();
    delete older.patterns['super-radar'];
    delete older.patterns['true-binary'];
    delete older.smallStarRunBonus;
    older.patterns.radar = 9;
    await api.dataSource.query(`UPDATE weight_tables SET weights = $2::jsonb WHERE user_id = $1`, [user.id, JSON.stringify(older)]);

    const body = weightTableList.parse((await request(api.app).get('/api/weights').set(user.auth).expect(200)).body);
    expect(body.items[0]!.weights.patterns.radar).toBe(9);
    expect(body.items[0]!.weights.patterns['super-radar']).toBe(DEFAULT_WEIGHTS.patterns['super-radar']);
    expect(body.items[0]!.weights.smallStarRunBonus).toBe(DEFAULT_WEIGHTS.smallStarRunBonus);

    // A client that does not know the new weights yet may still save a table without them.
    const saved = await request(api.app).post('/api/weights').set(user.auth).send({ name: 'From an older client', weights: older });
    expect(saved.status).toBe(201);
    expect(weightTableView.parse(saved.body).weights.patterns['true-binary']).toBe(DEFAULT_WEIGHTS.patterns['true-binary']);
  });
});
