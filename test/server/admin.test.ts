import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { adminStats, adminUser, adminUserPage } from '../../shared/contracts/admin';
import { createHunt, missingId, openScratchApi, postBatch, registerAdmin, registerUser, scanOf, type TestApi, type TestUser } from '../support/api';

let api: TestApi;
let admin: TestUser;
let collector: TestUser;

// A database of its own: the console lists every account and counts every row, so other test files'
// accounts (made and deleted while this file runs) would move the pages and the totals under it.
beforeAll(async () => {
  api = await openScratchApi('admin_console');
  admin = await registerAdmin(api);
  collector = await registerUser(api.app, 'console-collector');
});
afterAll(async () => {
  await api.close();
});

describe('GET /api/admin/users', () => {
  it('when an admin searches, then matching accounts come back with their hunt, scan and keeper counts', async () => {
    const hunt = await createHunt(api.app, collector);
    await postBatch(api.app, collector, [scanOf(hunt.id, '90909090'), scanOf(hunt.id, '90909091')]);

    const response = await request(api.app).get(`/api/admin/users?query=${encodeURIComponent(collector.email.slice(0, 26))}`).set(admin.auth);

    expect(response.status).toBe(200);
    const body = adminUserPage.parse(response.body);
    expect(body.items.find((u) => u.id === collector.id)).toMatchObject({ email: collector.email, hunts: 1, scans: 2, keepers: 0, disabled: false });
  });

  it('when there are more accounts than a page, then the cursor walks them in e-mail order', async () => {
    await Promise.all([registerUser(api.app, 'console-page'), registerUser(api.app, 'console-page')]);
    const all = adminUserPage.parse((await request(api.app).get('/api/admin/users?limit=200').set(admin.auth)).body).items.map((u) => u.email);

    const walked: string[] = [];
    let cursor: string | null = null;
    do {
      const pageBody: ReturnType<typeof adminUserPage.parse> = adminUserPage.parse(
        (await request(api.app).get(`/api/admin/users?limit=2${cursor ? `&cursor=${cursor}` : ''}`).set(admin.auth)).body,
      );
      walked.push(...pageBody.items.map((u) => u.email));
      cursor = pageBody.nextCursor;
    } while (cursor);

    expect(walked).toEqual(all);
    expect(all).toEqual([...all].sort());
  });

  it('when a collector asks, then 403; bad query 400; no token 401', async () => {
    expect((await request(api.app).get('/api/admin/users').set(collector.auth)).status).toBe(403);
    expect((await request(api.app).get('/api/admin/users?limit=-1').set(admin.auth)).status).toBe(400);
    expect((await request(api.app).get('/api/admin/users')).status).toBe(401);
  });
});

describe('PATCH /api/admin/users/:id', () => {
  it('when an admin disables an account, then its token stops working at once and it cannot sign in; enabling lets it sign in again', async () => {
    const user = await registerUser(api.app, 'console-disable');
    expect((await request(api.app).get('/api/me').set(user.auth)).status).toBe(200);

    const disabled = await request(api.app).patch(`/api/admin/users/${user.id}`).set(admin.auth).send({ disabled: true });

    expect(disabled.status).toBe(200);
    expect(adminUser.parse(disabled.body).disabled).toBe(true);
    expect((await request(api.app).get('/api/me').set(user.auth)).status).toBe(401);
    expect((await request(api.app).get('/api/hunts').set(user.auth)).status).toBe(401);
    expect((await request(api.app).post('/api/auth/refresh').send({ refreshToken: user.session.refreshToken })).status).toBe(401);
    expect((await request(api.app).post('/api/auth/login').send({ email: user.email, password: user.password })).status).toBe(403);

    await request(api.app).patch(`/api/admin/users/${user.id}`).set(admin.auth).send({ disabled: false }).expect(200);
    expect((await request(api.app).post('/api/auth/login').send({ email: user.email, password: user.password })).status).toBe(200);
    expect((await request(api.app).get('/api/me').set(user.auth)).status).toBe(401);
  });

  it('when an admin tries to disable themselves, then 409 and they stay signed in', async () => {
    expect((await request(api.app).patch(`/api/admin/users/${admin.id}`).set(admin.auth).send({ disabled: true })).status).toBe(409);
    expect((await request(api.app).get('/api/me').set(admin.auth)).status).toBe(200);
  });

  it('when a collector tries, then 403; a bad body 400; an unknown id 404; no token 401', async () => {
    expect((await request(api.app).patch(`/api/admin/users/${admin.id}`).set(collector.auth).send({ disabled: true })).status).toBe(403);
    const bad = await request(api.app).patch(`/api/admin/users/${collector.id}`).set(admin.auth).send({ disabled: 'yes' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty('disabled');
    expect((await request(api.app).patch(`/api/admin/users/${missingId()}`).set(admin.auth).send({ disabled: true })).status).toBe(404);
    expect((await request(api.app).patch(`/api/admin/users/${collector.id}`).send({ disabled: true })).status).toBe(401);
  });
});

describe('GET /api/admin/stats', () => {
  it('when an admin asks, then the totals match the database', async () => {
    const response = await request(api.app).get('/api/admin/stats').set(admin.auth);

    expect(response.status).toBe(200);
    const stats = adminStats.parse(response.body);
    const [row] = await api.dataSource.query(
      `SELECT (SELECT count(*)::int FROM users) AS users, (SELECT count(*)::int FROM scans) AS scans, (SELECT count(*)::int FROM hunts) AS hunts`,
    );
    expect(stats).toMatchObject({ users: row.users, scans: row.scans, hunts: row.hunts });
    expect(stats.admins).toBeGreaterThanOrEqual(1);
  });

  it('when a collector asks, then 403; no token 401', async () => {
    expect((await request(api.app).get('/api/admin/stats').set(collector.auth)).status).toBe(403);
    expect((await request(api.app).get('/api/admin/stats')).status).toBe(401);
  });
});
