import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { drawPng } from '../support/images';
import { addCrew, createHunt, openTestApi, postBatch, registerUser, scanOf, type TestApi, type TestUser } from '../support/api';

let api: TestApi;

beforeAll(async () => {
  api = await openTestApi();
});
afterAll(async () => {
  await api.close();
});

/** How to find one user's rows in each table; a table missing here fails the test below. */
const OWNERSHIP: Record<string, string> = {
  users: 'SELECT count(*)::int AS n FROM users WHERE id = $1',
  hunts: 'SELECT count(*)::int AS n FROM hunts WHERE owner_id = $1',
  hunt_members: 'SELECT count(*)::int AS n FROM hunt_members WHERE user_id = $1',
  straps: 'SELECT count(*)::int AS n FROM straps s JOIN hunts h ON h.id = s.hunt_id WHERE h.owner_id = $1',
  scans: 'SELECT count(*)::int AS n FROM scans WHERE user_id = $1',
  scan_tombstones: 'SELECT count(*)::int AS n FROM scan_tombstones WHERE user_id = $1',
  keepers: 'SELECT count(*)::int AS n FROM keepers WHERE user_id = $1',
  weight_tables: 'SELECT count(*)::int AS n FROM weight_tables WHERE user_id = $1',
  watch_patterns: 'SELECT count(*)::int AS n FROM watch_patterns WHERE user_id = $1',
  password_reset_tokens: 'SELECT count(*)::int AS n FROM password_reset_tokens WHERE user_id = $1',
  photos: 'SELECT count(*)::int AS n FROM photos WHERE user_id = $1',
  share_links: 'SELECT count(*)::int AS n FROM share_links WHERE user_id = $1',
  crew_invites: 'SELECT count(*)::int AS n FROM crew_invites WHERE invited_by = $1',
  auth_sessions: 'SELECT count(*)::int AS n FROM auth_sessions WHERE user_id = $1',
  email_changes: 'SELECT count(*)::int AS n FROM email_changes WHERE user_id = $1',
};

async function rowsOf(userId: string): Promise<Record<string, number>> {
  const counts: Record<string, number> = {};
  for (const [table, sql] of Object.entries(OWNERSHIP)) counts[table] = (await api.dataSource.query(sql, [userId]))[0].n;
  return counts;
}

/**
 * Gives a user a row in every table: hunts, crew membership elsewhere, straps, scans, a tombstone, keepers,
 * a photo, a share link, a crew invitation, weights, watch, reset token.
 */
async function fillAccount(user: TestUser, partner: TestUser): Promise<void> {
  const hunt = await createHunt(api.app, user);
  const partnersHunt = await createHunt(api.app, partner, { title: `${partner.email}'s box` });
  await addCrew(api.app, partner, partnersHunt.id, user);
  const undone = scanOf(hunt.id, '11110000');
  await postBatch(api.app, user, [scanOf(hunt.id, '12121212', { pulled: true }), undone, scanOf(partnersHunt.id, '38055083', { strap: 2 })]);
  await request(api.app).delete(`/api/scans/${undone.id}`).set(user.auth).expect(204);
  await request(api.app).patch(`/api/hunts/${hunt.id}/straps/1`).set(user.auth).send({ swappedIn: 1 }).expect(200);
  const keeper = await request(api.app).post('/api/keepers').set(user.auth).send({ serial: '77777777', grade: 45 }).expect(201);
  await request(api.app).post(`/api/keepers/${keeper.body.id}/photos`).set(user.auth).field('side', 'front').attach('photo', drawPng(), 'front.png').expect(201);
  await request(api.app).post(`/api/keepers/${keeper.body.id}/share`).set(user.auth).expect(201);
  await request(api.app).post(`/api/hunts/${hunt.id}/invites`).set(user.auth).send({ email: `invitee-${user.id}@strapsift.test` }).expect(201);
  await request(api.app).post('/api/weights').set(user.auth).send({ name: 'Second table' }).expect(201);
  await request(api.app).post('/api/watch').set(user.auth).send({ pattern: '1000-2000' }).expect(201);
  const moved = `moved-${user.id}@strapsift.test`;
  await request(api.app).patch('/api/me').set(user.auth).send({ email: moved, currentPassword: user.password }).expect(200);
  await request(api.app).post('/api/auth/forgot').send({ email: moved }).expect(202);
  await api.settled();
}

describe('DELETE /api/me', () => {
  it('when an account is deleted, then every row it owns in every table is gone and the other account keeps all of its rows', async () => {
    const leaving = await registerUser(api.app, 'leaving');
    const staying = await registerUser(api.app, 'staying');
    await fillAccount(leaving, staying);
    await fillAccount(staying, leaving);
    const tables: Array<{ table_name: string }> = await api.dataSource.query(
      // rate_limits holds counters per client address and namespace, not rows anyone owns.
      "SELECT table_name FROM information_schema.tables WHERE table_schema = 'public' AND table_name NOT IN ('migrations', 'rate_limits')",
    );
    expect(tables.map((t) => t.table_name).sort()).toEqual(Object.keys(OWNERSHIP).sort());
    const leavingBefore = await rowsOf(leaving.id);
    const stayingBefore = await rowsOf(staying.id);
    expect(Object.entries(leavingBefore).filter(([, n]) => n === 0)).toEqual([]);

    const response = await request(api.app).delete('/api/me').set(leaving.auth);

    expect(response.status).toBe(204);
    expect(Object.values(await rowsOf(leaving.id)).every((n) => n === 0)).toBe(true);
    // The hunt the leaver shared with the other account is handed to it, so its notes there survive.
    expect(await rowsOf(staying.id)).toEqual({ ...stayingBefore, hunts: stayingBefore.hunts! + 1 });
    expect((await request(api.app).get('/api/me').set(leaving.auth)).status).toBe(401);
  });

  it('when an owner with crew deletes their account, then the shared hunt passes to the crew with the crew’s notes', async () => {
    const owner = await registerUser(api.app, 'leaving-owner');
    const crew = await registerUser(api.app, 'heir');
    const hunt = await createHunt(api.app, owner);
    await addCrew(api.app, owner, hunt.id, crew);
    await postBatch(api.app, crew, [scanOf(hunt.id, '23232323')]);
    await postBatch(api.app, owner, [scanOf(hunt.id, '23232324')]);

    await request(api.app).delete('/api/me').set(owner.auth).expect(204);

    const after = await request(api.app).get(`/api/hunts/${hunt.id}`).set(crew.auth);
    expect(after.status).toBe(200);
    expect(after.body).toMatchObject({ role: 'owner', owner: { id: crew.id }, notesSearched: 1, memberCount: 1 });
  });

  it('when no token is sent, then it answers 401 and deletes nothing', async () => {
    // Judged on accounts of this test: other test files make and delete accounts at the same time.
    const bystander = await registerUser(api.app, 'bystander');
    const partner = await registerUser(api.app, 'bystander-partner');
    await fillAccount(bystander, partner);
    const before = await rowsOf(bystander.id);

    expect((await request(api.app).delete('/api/me')).status).toBe(401);

    expect(await rowsOf(bystander.id)).toEqual(before);
    expect(before.users).toBe(1);
  });
});
