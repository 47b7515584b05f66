import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { huntDetail, huntList } from '../../shared/contracts/hunts';
import { addCrew, createHunt, missingId, openTestApi, postBatch, registerUser, scanOf, type TestApi, type TestUser } from '../support/api';

let api: TestApi;
let owner: TestUser;
let crew: TestUser;
let stranger: TestUser;

beforeAll(async () => {
  api = await openTestApi();
  [owner, crew, stranger] = await Promise.all([
    registerUser(api.app, 'hunt-owner'),
    registerUser(api.app, 'hunt-crew'),
    registerUser(api.app, 'hunt-stranger'),
  ]);
});
afterAll(async () => {
  await api.close();
});

describe('POST /api/hunts', () => {
  it('when a hunt is created, then it answers 201 with the hunt open, the caller its owner and no notes yet', async () => {
    const response = await request(api.app)
      .post('/api/hunts')
      .set(owner.auth)
      .send({ title: 'Saturday $2 bundle', source: 'Larkspur Valley Credit Union, Orchard Road', denomination: 2, plannedStraps: 10 });

    expect(response.status).toBe(201);
    const hunt = huntDetail.parse(response.body);
    expect(hunt).toMatchObject({
      title: 'Saturday $2 bundle',
      denomination: 2,
      plannedStraps: 10,
      status: 'open',
      role: 'owner',
      owner: { id: owner.id },
      memberCount: 1,
      notesSearched: 0,
      hits: 0,
      strapCount: 0,
      bestFind: null,
      closedAt: null,
    });
  });

  it('when fields are missing or wrong, then it answers 400 naming each field', async () => {
    const response = await request(api.app).post('/api/hunts').set(owner.auth).send({ title: '', denomination: 3, plannedStraps: 0 });

    expect(response.status).toBe(400);
    expect(Object.keys(response.body.error.fields).sort()).toEqual(['denomination', 'plannedStraps', 'title']);
  });

  it('when no source is given, then the hunt starts with an empty source, so a first hunt is one tap away', async () => {
    const response = await request(api.app).post('/api/hunts').set(owner.auth).send({ title: 'First hunt', denomination: 1, plannedStraps: 1 });

    expect(response.status).toBe(201);
    expect(response.body.source).toBe('');
  });

  it('when the source is longer than 120 characters, then it answers 400 naming the source', async () => {
    const response = await request(api.app).post('/api/hunts').set(owner.auth).send({ title: 'x', source: 'b'.repeat(121), denomination: 1, plannedStraps: 1 });

    expect(response.status).toBe(400);
    expect(Object.keys(response.body.error.fields)).toEqual(['source']);
  });

  it('when no token is sent, then it answers 401', async () => {
    const response = await request(api.app).post('/api/hunts').send({ title: 'x', source: 'y', denomination: 1, plannedStraps: 1 });
    expect(response.status).toBe(401);
  });
});

describe('GET /api/hunts', () => {
  it('when the caller has hunts with notes, then each list item carries notes searched, hits, best find and strap count', async () => {
    const user = await registerUser(api.app, 'hunt-list');
    const hunt = await createHunt(api.app, user, { title: 'Figures hunt' });
    await postBatch(api.app, user, [
      scanOf(hunt.id, '12121212', { strap: 1 }),
      scanOf(hunt.id, '48213377', { strap: 1 }),
      scanOf(hunt.id, '38055083', { strap: 2, pulled: true }),
      scanOf(hunt.id, '57130264', { strap: 2 }),
    ]);

    const body = huntList.parse((await request(api.app).get('/api/hunts').set(user.auth)).body);

    expect(body.items).toHaveLength(1);
    expect(body.items[0]).toMatchObject({
      id: hunt.id,
      notesSearched: 4,
      // 12121212 (repeater, super repeater, binary), 48213377 (no pattern: 6 distinct digits), 38055083 (radar)
      hits: 2,
      pulled: 1,
      strapCount: 2,
      bestFind: { serial: '12121212', patterns: ['repeater', 'super-repeater', 'binary'], points: 17 },
    });
  });

  it('when there are more hunts than a page, then the cursor pages through them newest first, and status filters', async () => {
    const user = await registerUser(api.app, 'hunt-pages');
    const created = [];
    for (let i = 0; i < 5; i++) {
      created.push(await createHunt(api.app, user, { title: `Hunt ${i}`, startedAt: new Date(Date.UTC(2026, 9, 1 + i)).toISOString() }));
    }
    await request(api.app).post(`/api/hunts/${created[0]!.id}/close`).set(user.auth).expect(200);

    const first = huntList.parse((await request(api.app).get('/api/hunts?limit=2').set(user.auth)).body);
    const second = huntList.parse((await request(api.app).get(`/api/hunts?limit=2&cursor=${first.nextCursor}`).set(user.auth)).body);
    const third = huntList.parse((await request(api.app).get(`/api/hunts?limit=2&cursor=${second.nextCursor}`).set(user.auth)).body);
    const closed = huntList.parse((await request(api.app).get('/api/hunts?status=closed').set(user.auth)).body);

    expect([...first.items, ...second.items, ...third.items].map((h) => h.title)).toEqual(['Hunt 4', 'Hunt 3', 'Hunt 2', 'Hunt 1', 'Hunt 0']);
    expect(third.nextCursor).toBeNull();
    expect(closed.items.map((h) => h.title)).toEqual(['Hunt 0']);
  });

  it('when a crew member lists hunts, then the shared hunt appears with role crew; a stranger does not see it', async () => {
    const hunt = await createHunt(api.app, owner, { title: 'Shared box' });
    await addCrew(api.app, owner, hunt.id, crew);

    const crews = huntList.parse((await request(api.app).get('/api/hunts').set(crew.auth)).body);
    const strangers = huntList.parse((await request(api.app).get('/api/hunts').set(stranger.auth)).body);

    expect(crews.items.find((h) => h.id === hunt.id)).toMatchObject({ role: 'crew', memberCount: 2 });
    expect(strangers.items.find((h) => h.id === hunt.id)).toBeUndefined();
  });

  it('when the query is bad, then it answers 400 naming the field', async () => {
    const response = await request(api.app).get('/api/hunts?status=lost&limit=9999').set(owner.auth);
    expect(response.status).toBe(400);
    expect(Object.keys(response.body.error.fields).sort()).toEqual(['limit', 'status']);
  });

  it('when no token is sent, then it answers 401', async () => {
    expect((await request(api.app).get('/api/hunts')).status).toBe(401);
  });
});

describe('GET /api/hunts/:id', () => {
  it('when the owner or crew ask, then they get the hunt with their own role; a stranger gets 404', async () => {
    const hunt = await createHunt(api.app, owner);
    await addCrew(api.app, owner, hunt.id, crew);

    const owners = await request(api.app).get(`/api/hunts/${hunt.id}`).set(owner.auth);
    const crews = await request(api.app).get(`/api/hunts/${hunt.id}`).set(crew.auth);
    const strangers = await request(api.app).get(`/api/hunts/${hunt.id}`).set(stranger.auth);

    expect(huntDetail.parse(owners.body)).toMatchObject({ role: 'owner', status: 'open' });
    expect(huntDetail.parse(crews.body)).toMatchObject({ role: 'crew', status: 'open' });
    expect(strangers.status).toBe(404);
    expect(strangers.body.error.code).toBe('not_found');
  });

  it('when the id is not a uuid, then it answers 400; when it does not exist, 404; without a token, 401', async () => {
    expect((await request(api.app).get('/api/hunts/abc').set(owner.auth)).status).toBe(400);
    expect((await request(api.app).get(`/api/hunts/${missingId()}`).set(owner.auth)).status).toBe(404);
    expect((await request(api.app).get(`/api/hunts/${missingId()}`)).status).toBe(401);
  });
});

describe('PATCH /api/hunts/:id', () => {
  it('when the owner changes the title and planned straps, then the hunt shows them', async () => {
    const hunt = await createHunt(api.app, owner);

    const response = await request(api.app).patch(`/api/hunts/${hunt.id}`).set(owner.auth).send({ title: 'Renamed', plannedStraps: 7 });

    expect(response.status).toBe(200);
    expect(huntDetail.parse(response.body)).toMatchObject({ title: 'Renamed', plannedStraps: 7 });
  });

  it('when crew try to edit, then it answers 403; a stranger 404; bad input 400; no token 401', async () => {
    const hunt = await createHunt(api.app, owner);
    await addCrew(api.app, owner, hunt.id, crew);

    const crews = await request(api.app).patch(`/api/hunts/${hunt.id}`).set(crew.auth).send({ title: 'Mine now' });
    const strangers = await request(api.app).patch(`/api/hunts/${hunt.id}`).set(stranger.auth).send({ title: 'Mine now' });
    const bad = await request(api.app).patch(`/api/hunts/${hunt.id}`).set(owner.auth).send({ denomination: 7, colour: 'green' });
    const empty = await request(api.app).patch(`/api/hunts/${hunt.id}`).set(owner.auth).send({});
    const anonymous = await request(api.app).patch(`/api/hunts/${hunt.id}`).send({ title: 'x' });

    expect(crews.status).toBe(403);
    expect(strangers.status).toBe(404);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty('denomination');
    expect(empty.status).toBe(400);
    expect(anonymous.status).toBe(401);
    expect(huntDetail.parse((await request(api.app).get(`/api/hunts/${hunt.id}`).set(owner.auth)).body).title).toBe(hunt.title);
  });
});

describe('POST /api/hunts/:id/close', () => {
  it('when the owner closes a hunt, then it is closed with a time, and closing again keeps that time', async () => {
    const hunt = await createHunt(api.app, owner);

    const first = huntDetail.parse((await request(api.app).post(`/api/hunts/${hunt.id}/close`).set(owner.auth).expect(200)).body);
    const again = huntDetail.parse((await request(api.app).post(`/api/hunts/${hunt.id}/close`).set(owner.auth).expect(200)).body);

    expect(first.status).toBe('closed');
    expect(first.closedAt).not.toBeNull();
    expect(again.closedAt).toBe(first.closedAt);
  });

  it('when crew try to close, then 403; a stranger 404; a bad id 400; no token 401', async () => {
    const hunt = await createHunt(api.app, owner);
    await addCrew(api.app, owner, hunt.id, crew);

    expect((await request(api.app).post(`/api/hunts/${hunt.id}/close`).set(crew.auth)).status).toBe(403);
    expect((await request(api.app).post(`/api/hunts/${hunt.id}/close`).set(stranger.auth)).status).toBe(404);
    expect((await request(api.app).post('/api/hunts/nope/close').set(owner.auth)).status).toBe(400);
    expect((await request(api.app).post(`/api/hunts/${hunt.id}/close`)).status).toBe(401);
    expect(huntDetail.parse((await request(api.app).get(`/api/hunts/${hunt.id}`).set(owner.auth)).body).status).toBe('open');
  });
});

describe('DELETE /api/hunts/:id', () => {
  it('when the owner deletes a hunt, then it and its scans, straps and members are gone', async () => {
    const hunt = await createHunt(api.app, owner);
    await addCrew(api.app, owner, hunt.id, crew);
    await postBatch(api.app, owner, [scanOf(hunt.id, '31313131')]);
    await request(api.app).patch(`/api/hunts/${hunt.id}/straps/1`).set(owner.auth).send({ swappedIn: 1 }).expect(200);

    const response = await request(api.app).delete(`/api/hunts/${hunt.id}`).set(owner.auth);

    expect(response.status).toBe(204);
    expect((await request(api.app).get(`/api/hunts/${hunt.id}`).set(owner.auth)).status).toBe(404);
    for (const table of ['scans', 'straps', 'hunt_members']) {
      const [row] = await api.dataSource.query(`SELECT count(*)::int AS n FROM ${table} WHERE hunt_id = $1`, [hunt.id]);
      expect(row.n, table).toBe(0);
    }
  });

  it('when crew try to delete, then 403; a stranger 404; a bad id 400; no token 401; the hunt stays', async () => {
    const hunt = await createHunt(api.app, owner);
    await addCrew(api.app, owner, hunt.id, crew);

    expect((await request(api.app).delete(`/api/hunts/${hunt.id}`).set(crew.auth)).status).toBe(403);
    expect((await request(api.app).delete(`/api/hunts/${hunt.id}`).set(stranger.auth)).status).toBe(404);
    expect((await request(api.app).delete('/api/hunts/1').set(owner.auth)).status).toBe(400);
    expect((await request(api.app).delete(`/api/hunts/${hunt.id}`)).status).toBe(401);
    expect((await request(api.app).get(`/api/hunts/${hunt.id}`).set(owner.auth)).status).toBe(200);
  });
});
