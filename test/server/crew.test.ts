import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { memberList, memberView } from '../../shared/contracts/crew';
import { addCrew, createHunt, missingId, openTestApi, postBatch, registerUser, scanOf, type TestApi, type TestUser } from '../support/api';

let api: TestApi;
let owner: TestUser;
let crew: TestUser;
let other: TestUser;
let stranger: TestUser;

beforeAll(async () => {
  api = await openTestApi();
  [owner, crew, other, stranger] = await Promise.all(
    ['crew-owner', 'crew-member', 'crew-other', 'crew-stranger'].map((label) => registerUser(api.app, label)),
  );
});
afterAll(async () => {
  await api.close();
});

describe('GET /api/hunts/:id/members', () => {
  it('when the owner and crew ask, then both see the owner first and each member’s notes logged', async () => {
    const hunt = await createHunt(api.app, owner);
    await addCrew(api.app, owner, hunt.id, crew);
    await postBatch(api.app, crew, [scanOf(hunt.id, '70707070'), scanOf(hunt.id, '70707071')]);

    const owners = memberList.parse((await request(api.app).get(`/api/hunts/${hunt.id}/members`).set(owner.auth).expect(200)).body);
    const crews = memberList.parse((await request(api.app).get(`/api/hunts/${hunt.id}/members`).set(crew.auth).expect(200)).body);

    expect(owners.items.map((m) => [m.userId, m.role, m.notesLogged])).toEqual([
      [owner.id, 'owner', 0],
      [crew.id, 'crew', 2],
    ]);
    expect(crews).toEqual(owners);
  });

  it('when a stranger asks, then 404; a bad id 400; no token 401', async () => {
    const hunt = await createHunt(api.app, owner);
    expect((await request(api.app).get(`/api/hunts/${hunt.id}/members`).set(stranger.auth)).status).toBe(404);
    expect((await request(api.app).get('/api/hunts/x/members').set(owner.auth)).status).toBe(400);
    expect((await request(api.app).get(`/api/hunts/${hunt.id}/members`)).status).toBe(401);
  });
});

describe('POST /api/hunts/:id/members', () => {
  it('when the owner adds an account by e-mail, then it joins as crew and can read the hunt', async () => {
    const hunt = await createHunt(api.app, owner);

    const response = await request(api.app).post(`/api/hunts/${hunt.id}/members`).set(owner.auth).send({ email: crew.email.toUpperCase() });

    expect(response.status).toBe(201);
    expect(memberView.parse(response.body)).toMatchObject({ userId: crew.id, role: 'crew' });
    expect((await request(api.app).get(`/api/hunts/${hunt.id}`).set(crew.auth)).status).toBe(200);
  });

  it('when the account is already in the hunt, then 409; when no account has the e-mail, 404', async () => {
    const hunt = await createHunt(api.app, owner);
    await addCrew(api.app, owner, hunt.id, crew);

    const again = await request(api.app).post(`/api/hunts/${hunt.id}/members`).set(owner.auth).send({ email: crew.email });
    const nobody = await request(api.app).post(`/api/hunts/${hunt.id}/members`).set(owner.auth).send({ email: 'nobody-here@strapsift.test' });

    expect(again.status).toBe(409);
    expect(nobody.status).toBe(404);
  });

  it('when crew try to add someone, then 403; a stranger 404; a bad e-mail 400; no token 401', async () => {
    const hunt = await createHunt(api.app, owner);
    await addCrew(api.app, owner, hunt.id, crew);

    expect((await request(api.app).post(`/api/hunts/${hunt.id}/members`).set(crew.auth).send({ email: other.email })).status).toBe(403);
    expect((await request(api.app).post(`/api/hunts/${hunt.id}/members`).set(stranger.auth).send({ email: other.email })).status).toBe(404);
    const bad = await request(api.app).post(`/api/hunts/${hunt.id}/members`).set(owner.auth).send({ email: 'not an e-mail' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty('email');
    expect((await request(api.app).post(`/api/hunts/${hunt.id}/members`).send({ email: other.email })).status).toBe(401);
  });
});

describe('DELETE /api/hunts/:id/members/:userId', () => {
  it('when the owner removes a crew member, then they lose the hunt but the notes they logged stay', async () => {
    const hunt = await createHunt(api.app, owner);
    await addCrew(api.app, owner, hunt.id, crew);
    await postBatch(api.app, crew, [scanOf(hunt.id, '60606060')]);

    const response = await request(api.app).delete(`/api/hunts/${hunt.id}/members/${crew.id}`).set(owner.auth);

    expect(response.status).toBe(204);
    expect((await request(api.app).get(`/api/hunts/${hunt.id}`).set(crew.auth)).status).toBe(404);
    const [row] = await api.dataSource.query(`SELECT count(*)::int AS n FROM scans WHERE hunt_id = $1`, [hunt.id]);
    expect(row.n).toBe(1);
  });

  it('when a crew member removes themselves, then they leave the hunt', async () => {
    const hunt = await createHunt(api.app, owner);
    await addCrew(api.app, owner, hunt.id, crew);

    expect((await request(api.app).delete(`/api/hunts/${hunt.id}/members/${crew.id}`).set(crew.auth)).status).toBe(204);
    expect((await request(api.app).get(`/api/hunts/${hunt.id}`).set(crew.auth)).status).toBe(404);
  });

  it('when crew try to remove another member, then 403; the owner cannot be removed (403); a stranger 404; bad ids 400; no token 401', async () => {
    const hunt = await createHunt(api.app, owner);
    await addCrew(api.app, owner, hunt.id, crew);
    await addCrew(api.app, owner, hunt.id, other);

    expect((await request(api.app).delete(`/api/hunts/${hunt.id}/members/${other.id}`).set(crew.auth)).status).toBe(403);
    expect((await request(api.app).delete(`/api/hunts/${hunt.id}/members/${owner.id}`).set(owner.auth)).status).toBe(403);
    expect((await request(api.app).delete(`/api/hunts/${hunt.id}/members/${crew.id}`).set(stranger.auth)).status).toBe(404);
    expect((await request(api.app).delete(`/api/hunts/${hunt.id}/members/${missingId()}`).set(owner.auth)).status).toBe(404);
    const bad = await request(api.app).delete(`/api/hunts/${hunt.id}/members/someone`).set(owner.auth);
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty('userId');
    expect((await request(api.app).delete(`/api/hunts/${hunt.id}/members/${crew.id}`)).status).toBe(401);
    const members = memberList.parse((await request(api.app).get(`/api/hunts/${hunt.id}/members`).set(owner.auth)).body);
    expect(members.items).toHaveLength(3);
  });
});
