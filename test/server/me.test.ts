import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { authResponse, publicUser } from '../../shared/contracts/auth';
import { openTestApi, registerUser, type TestApi } from '../support/api';

let api: TestApi;

beforeAll(async () => {
  api = await openTestApi();
});
afterAll(async () => {
  await api.close();
});

describe('GET and PATCH /api/me', () => {
  it('when the user renames themselves, then /api/me shows the new name and never the password hash', async () => {
    const user = await registerUser(api.app, 'me-rename');

    const patched = await request(api.app).patch('/api/me').set(user.auth).send({ displayName: 'Marigold Reyes' });
    const me = await request(api.app).get('/api/me').set(user.auth);

    expect(patched.status).toBe(200);
    expect(publicUser.parse(me.body).displayName).toBe('Marigold Reyes');
    expect(JSON.stringify(me.body)).not.toMatch(/argon2|hash/i);
  });

  it('when the password changes, then every other sign-in ends, this device stays, and the new password signs in', async () => {
    const user = await registerUser(api.app, 'me-password');
    const elsewhere = authResponse.parse((await request(api.app).post('/api/auth/login').send({ email: user.email, password: user.password })).body);

    const changed = await request(api.app).patch('/api/me').set(user.auth).send({ currentPassword: user.password, newPassword: 'changed-password-9' });

    expect(changed.status).toBe(200);
    expect((await request(api.app).get('/api/me').set('Authorization', `Bearer ${elsewhere.token}`)).status).toBe(401);
    expect((await request(api.app).post('/api/auth/refresh').send({ refreshToken: elsewhere.refreshToken })).status).toBe(401);
    expect((await request(api.app).get('/api/me').set(user.auth)).status).toBe(200);
    expect((await request(api.app).post('/api/auth/login').send({ email: user.email, password: 'changed-password-9' })).status).toBe(200);
  });

  it('when fields are bad or the current password is wrong, then 400 naming the field; no token 401', async () => {
    const user = await registerUser(api.app, 'me-bad');

    const bad = await request(api.app).patch('/api/me').set(user.auth).send({ email: 'nope', role: 'admin' });
    const wrong = await request(api.app).patch('/api/me').set(user.auth).send({ currentPassword: 'not-it-at-all', newPassword: 'changed-password-9' });

    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty('email');
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields).toHaveProperty('currentPassword');
    expect((await request(api.app).get('/api/me')).status).toBe(401);
    expect((await request(api.app).patch('/api/me').send({ displayName: 'x' })).status).toBe(401);
  });
});

describe('POST /api/auth/refresh', () => {
  it('when a refresh token is sent, then a new session comes back; an access token in its place is refused', async () => {
    const user = await registerUser(api.app, 'refresh');

    const refreshed = await request(api.app).post('/api/auth/refresh').send({ refreshToken: user.session.refreshToken });
    const wrongKind = await request(api.app).post('/api/auth/refresh').send({ refreshToken: user.token });
    const missing = await request(api.app).post('/api/auth/refresh').send({});

    expect(refreshed.status).toBe(200);
    expect(authResponse.parse(refreshed.body).user.id).toBe(user.id);
    expect(wrongKind.status).toBe(401);
    expect(missing.status).toBe(400);
    expect(missing.body.error.fields).toHaveProperty('refreshToken');
  });
});
