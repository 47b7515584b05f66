import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { strapRow, strapSheet } from '../../shared/contracts/straps';
import { addCrew, createHunt, openTestApi, ordinarySerial, postBatch, registerUser, scanOf, type TestApi, type TestUser } from '../support/api';

let api: TestApi;
let owner: TestUser;
let stranger: TestUser;

beforeAll(async () => {
  api = await openTestApi();
  [owner, stranger] = await Promise.all([registerUser(api.app, 'strap-owner'), registerUser(api.app, 'strap-stranger')]);
});
afterAll(async () => {
  await api.close();
});

describe('GET /api/hunts/:id/straps', () => {
  it('when notes were logged and swaps recorded, then each strap shows searched, pulled, swapped in and whether 100 go back', async () => {
    const hunt = await createHunt(api.app, owner, { plannedStraps: 3 });
    const strapOne = Array.from({ length: 100 }, (_, i) => scanOf(hunt.id, ordinarySerial(i), { strap: 1, pulled: i < 2 }));
    const strapTwo = Array.from({ length: 40 }, (_, i) => scanOf(hunt.id, ordinarySerial(200 + i), { strap: 2, pulled: i === 0 }));
    await postBatch(api.app, owner, [...strapOne, ...strapTwo]);
    await request(api.app).patch(`/api/hunts/${hunt.id}/straps/1`).set(owner.auth).send({ swappedIn: 2 }).expect(200);

    const response = await request(api.app).get(`/api/hunts/${hunt.id}/straps`).set(owner.auth);

    expect(response.status).toBe(200);
    const sheet = strapSheet.parse(response.body);
    expect(sheet.straps.map((s) => [s.number, s.searched, s.pulled, s.swappedIn, s.notesBack, s.complete, s.fullySearched])).toEqual([
      [1, 100, 2, 2, 100, true, true],
      [2, 40, 1, 0, 99, false, false],
      [3, 0, 0, 0, 100, true, false],
    ]);
    expect(sheet.totals).toEqual({ searched: 140, pulled: 3, swappedIn: 2, notesBack: 299, completeStraps: 2, straps: 3 });
  });

  it('when notes land on a strap past the planned count, then the sheet grows to include it', async () => {
    const hunt = await createHunt(api.app, owner, { plannedStraps: 1 });
    await postBatch(api.app, owner, [scanOf(hunt.id, '19283746', { strap: 4 })]);

    const sheet = strapSheet.parse((await request(api.app).get(`/api/hunts/${hunt.id}/straps`).set(owner.auth)).body);

    expect(sheet.straps.map((s) => s.number)).toEqual([1, 2, 3, 4]);
    expect(sheet.straps[3]!.searched).toBe(1);
  });

  it('when a stranger asks, then 404; a bad id 400; no token 401', async () => {
    const hunt = await createHunt(api.app, owner);
    expect((await request(api.app).get(`/api/hunts/${hunt.id}/straps`).set(stranger.auth)).status).toBe(404);
    expect((await request(api.app).get('/api/hunts/zzz/straps').set(owner.auth)).status).toBe(400);
    expect((await request(api.app).get(`/api/hunts/${hunt.id}/straps`)).status).toBe(401);
  });
});

describe('PATCH /api/hunts/:id/straps/:n', () => {
  it('when a strap came one short and one note was swapped in for the one pulled, then 99 go back and it is not complete', async () => {
    const hunt = await createHunt(api.app, owner);
    await postBatch(api.app, owner, [scanOf(hunt.id, '11111111', { strap: 2, pulled: true })]);

    const response = await request(api.app)
      .patch(`/api/hunts/${hunt.id}/straps/2`)
      .set(owner.auth)
      .send({ shortOver: -1, swappedIn: 1, note: 'teller recounted' });

    expect(response.status).toBe(200);
    expect(strapRow.parse(response.body)).toMatchObject({ number: 2, received: 99, pulled: 1, swappedIn: 1, notesBack: 99, complete: false, note: 'teller recounted' });
  });

  it('when only one field is sent, then the others keep their recorded values', async () => {
    const hunt = await createHunt(api.app, owner);
    await request(api.app).patch(`/api/hunts/${hunt.id}/straps/1`).set(owner.auth).send({ shortOver: 1, note: 'one over' }).expect(200);

    const response = await request(api.app).patch(`/api/hunts/${hunt.id}/straps/1`).set(owner.auth).send({ swappedIn: 0 });

    expect(strapRow.parse(response.body)).toMatchObject({ shortOver: 1, note: 'one over', notesBack: 101, complete: false });
  });

  it('when crew record swaps for a strap they sifted, then it is saved', async () => {
    const hunt = await createHunt(api.app, owner);
    const crew = await registerUser(api.app, 'strap-crew');
    await addCrew(api.app, owner, hunt.id, crew);

    const response = await request(api.app).patch(`/api/hunts/${hunt.id}/straps/3`).set(crew.auth).send({ swappedIn: 1 });

    expect(response.status).toBe(200);
    expect(strapRow.parse(response.body).swappedIn).toBe(1);
  });

  it('when values or the strap number are out of range, then it answers 400 naming them', async () => {
    const hunt = await createHunt(api.app, owner);

    const badBody = await request(api.app).patch(`/api/hunts/${hunt.id}/straps/1`).set(owner.auth).send({ swappedIn: -1, shortOver: 'x' });
    const badNumber = await request(api.app).patch(`/api/hunts/${hunt.id}/straps/0`).set(owner.auth).send({ swappedIn: 1 });
    const empty = await request(api.app).patch(`/api/hunts/${hunt.id}/straps/1`).set(owner.auth).send({});

    expect(badBody.status).toBe(400);
    expect(Object.keys(badBody.body.error.fields).sort()).toEqual(['shortOver', 'swappedIn']);
    expect(badNumber.status).toBe(400);
    expect(badNumber.body.error.fields).toHaveProperty('n');
    expect(empty.status).toBe(400);
  });

  it('when a stranger patches, then 404 and nothing is recorded; no token 401', async () => {
    const hunt = await createHunt(api.app, owner);

    expect((await request(api.app).patch(`/api/hunts/${hunt.id}/straps/1`).set(stranger.auth).send({ swappedIn: 5 })).status).toBe(404);
    expect((await request(api.app).patch(`/api/hunts/${hunt.id}/straps/1`).send({ swappedIn: 5 })).status).toBe(401);
    const sheet = strapSheet.parse((await request(api.app).get(`/api/hunts/${hunt.id}/straps`).set(owner.auth)).body);
    expect(sheet.straps[0]!.swappedIn).toBe(0);
  });
});
