import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { authResponse, forgotResponse, publicUser } from '../../shared/contracts/auth';
import { hashResetToken } from '../../server/features/auth/password-reset.service';
import { openTestApi, registerUser, type TestApi } from '../support/api';

let api: TestApi;

beforeAll(async () => {
  api = await openTestApi();
});
afterAll(async () => {
  await api.close();
});

describe('POST /api/auth/register and /api/auth/login', () => {
  it('when an account is created and signed in, then both answer with a token that opens /api/me', async () => {
    const email = `register-${Date.now()}@strapsift.test`;

    const created = await request(api.app).post('/api/auth/register').send({ email, password: 'long-enough-1', displayName: 'Juniper Vale' });
    const login = await request(api.app).post('/api/auth/login').send({ email, password: 'long-enough-1' });

    expect(created.status).toBe(201);
    expect(login.status).toBe(200);
    const session = authResponse.parse(login.body);
    const me = await request(api.app).get('/api/me').set('Authorization', `Bearer ${session.token}`);
    expect(publicUser.parse(me.body)).toMatchObject({ email, displayName: 'Juniper Vale', role: 'collector' });
  });

  it('when the password is short or the e-mail taken, then 400 naming the password, then 409', async () => {
    const user = await registerUser(api.app, 'register-taken');
    const short = await request(api.app).post('/api/auth/register').send({ email: 'short@strapsift.test', password: 'short', displayName: 'S' });
    const taken = await request(api.app).post('/api/auth/register').send({ email: user.email, password: 'long-enough-1', displayName: 'T' });

    expect(short.status).toBe(400);
    expect(short.body.error.fields).toHaveProperty('password');
    expect(taken.status).toBe(409);
  });

  it('when the password is wrong ten times, then the eleventh try is refused with 429 even with the right password', async () => {
    const user = await registerUser(api.app, 'throttle');
    for (let i = 0; i < 10; i++) {
      expect((await request(api.app).post('/api/auth/login').send({ email: user.email, password: `wrong-${i}-password` })).status).toBe(401);
    }
    expect((await request(api.app).post('/api/auth/login').send({ email: user.email, password: user.password })).status).toBe(429);
  });
});

describe('POST /api/auth/forgot', () => {
  it('when the e-mail has an account, then 202 and the outbox holds a link whose token is stored only as its SHA-256', async () => {
    const user = await registerUser(api.app, 'forgot');

    const response = await request(api.app).post('/api/auth/forgot').send({ email: user.email });
    await api.settled();

    expect(response.status).toBe(202);
    forgotResponse.parse(response.body);
    const message = api.outbox.latestFor(user.email);
    expect(message?.link).toContain(`/reset-password?token=${message?.token}`);
    const rows = await api.dataSource.query(`SELECT token_hash, expires_at FROM password_reset_tokens WHERE user_id = $1`, [user.id]);
    expect(rows).toHaveLength(1);
    expect(rows[0].token_hash).toBe(hashResetToken(message!.token));
    expect(rows[0].token_hash).not.toContain(message!.token);
    const minutes = (rows[0].expires_at.getTime() - Date.now()) / 60_000;
    expect(minutes).toBeGreaterThan(58);
    expect(minutes).toBeLessThanOrEqual(60);
  });

  it('when no account has the e-mail, then the answer is the same 202 and nothing is sent', async () => {
    const before = api.outbox.sent.length;
    const known = await request(api.app).post('/api/auth/forgot').send({ email: (await registerUser(api.app, 'forgot-known')).email });
    const unknown = await request(api.app).post('/api/auth/forgot').send({ email: 'nobody-at-all@strapsift.test' });
    await api.settled();

    expect(unknown.status).toBe(202);
    expect(unknown.body).toEqual(known.body);
    expect(api.outbox.sent.length).toBe(before + 1);
  });

  it('when the e-mail is malformed, then 400 naming it', async () => {
    const response = await request(api.app).post('/api/auth/forgot').send({ email: 'not-mail' });
    expect(response.status).toBe(400);
    expect(response.body.error.fields).toHaveProperty('email');
  });

  it('when the e-mail is 400 characters long, then 400 naming it, and again (the per-account counter takes a key of any length)', async () => {
    // Found by the bad-input fuzzer: the counter's key (its name, then the address) outgrew the table's 255-character key column.
    const email = `${'x'.repeat(388)}@strapsift.test`;
    for (const _ of [1, 2]) {
      const response = await request(api.app).post('/api/auth/forgot').send({ email });
      expect(response.status).toBe(400);
      expect(response.body.error.fields).toHaveProperty('email');
    }
  });
});

describe('POST /api/auth/reset', () => {
  it('when a fresh token is used, then the new password works, the old one and old sessions do not, and the token cannot be used twice', async () => {
    const user = await registerUser(api.app, 'reset');
    await request(api.app).post('/api/auth/forgot').send({ email: user.email }).expect(202);
    await api.settled();
    const token = api.outbox.latestFor(user.email)!.token;

    const reset = await request(api.app).post('/api/auth/reset').send({ token, password: 'a-brand-new-one-2' });
    const again = await request(api.app).post('/api/auth/reset').send({ token, password: 'and-another-one-3' });

    expect(reset.status).toBe(200);
    authResponse.parse(reset.body);
    expect(again.status).toBe(400);
    expect(again.body.error.fields).toHaveProperty('token');
    expect((await request(api.app).post('/api/auth/login').send({ email: user.email, password: 'a-brand-new-one-2' })).status).toBe(200);
    expect((await request(api.app).post('/api/auth/login').send({ email: user.email, password: user.password })).status).toBe(401);
    expect((await request(api.app).get('/api/me').set(user.auth)).status).toBe(401);
  });

  it('when two resets race with one token, then exactly one succeeds', async () => {
    const user = await registerUser(api.app, 'reset-race');
    await request(api.app).post('/api/auth/forgot').send({ email: user.email }).expect(202);
    await api.settled();
    const token = api.outbox.latestFor(user.email)!.token;

    const answers = await Promise.all([
      request(api.app).post('/api/auth/reset').send({ token, password: 'racing-password-1' }),
      request(api.app).post('/api/auth/reset').send({ token, password: 'racing-password-2' }),
    ]);

    expect(answers.map((r) => r.status).sort()).toEqual([200, 400]);
  });

  it('when the token has expired, then 400 and the password is unchanged', async () => {
    const user = await registerUser(api.app, 'reset-expired');
    await request(api.app).post('/api/auth/forgot').send({ email: user.email }).expect(202);
    await api.settled();
    const token = api.outbox.latestFor(user.email)!.token;
    await api.dataSource.query(`UPDATE password_reset_tokens SET expires_at = now() - interval '1 second' WHERE user_id = $1`, [user.id]);

    const response = await request(api.app).post('/api/auth/reset').send({ token, password: 'too-late-password' });

    expect(response.status).toBe(400);
    expect((await request(api.app).post('/api/auth/login').send({ email: user.email, password: user.password })).status).toBe(200);
  });

  it('when the token was never issued or the password is short, then 400 naming the field', async () => {
    const made = await request(api.app).post('/api/auth/reset').send({ token: 'x'.repeat(43), password: 'long-enough-1' });
    const short = await request(api.app).post('/api/auth/reset').send({ token: 'x'.repeat(43), password: 'short' });

    expect(made.status).toBe(400);
    expect(made.body.error.fields).toHaveProperty('token');
    expect(short.status).toBe(400);
    expect(short.body.error.fields).toHaveProperty('password');
  });
});
