import argon2 from 'argon2';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { authResponse, deviceSessionList, undoEmailResponse } from '../../shared/contracts/auth';
import { clientAddress, openTestApi, registerUser, type TestApi } from '../support/api';
import { MemoryMailer } from '../support/mail';

let api: TestApi;
const mailer = new MemoryMailer();

beforeAll(async () => {
  api = await openTestApi({ mailer });
});
afterAll(async () => {
  await api.close();
});

const signIn = async (email: string, password: string, from = clientAddress()) =>
  request(api.app).post('/api/auth/login').set('X-Forwarded-For', from).set('User-Agent', 'Mozilla/5.0 (Linux; Android 14) Chrome/130.0 Mobile Safari/537.36').send({ email, password });

describe('a stolen session cannot take the account', () => {
  it('when the e-mail is changed without the current password, then 400 naming it and the e-mail stays', async () => {
    const user = await registerUser(api.app, 'stolen');

    const response = await request(api.app).patch('/api/me').set(user.auth).send({ email: 'thief@elsewhere.test' });

    expect(response.status).toBe(400);
    expect(response.body.error.fields).toHaveProperty('currentPassword');
    expect((await request(api.app).get('/api/me').set(user.auth)).body.email).toBe(user.email);
  });

  it('when the e-mail is changed with the password, then other sessions end, the old address gets a 7-day undo link, and undo takes the account back', async () => {
    const user = await registerUser(api.app, 'mover');
    const other = authResponse.parse((await signIn(user.email, user.password)).body);
    const newEmail = `moved-${Date.now()}@strapsift.test`;

    const changed = await request(api.app).patch('/api/me').set(user.auth).send({ email: newEmail, currentPassword: user.password });

    expect(changed.status).toBe(200);
    expect(changed.body.email).toBe(newEmail);
    expect((await request(api.app).get('/api/me').set('Authorization', `Bearer ${other.token}`)).status).toBe(401);
    expect((await request(api.app).get('/api/me').set(user.auth)).status).toBe(200);
    const [notice] = mailer.to(user.email);
    expect(notice?.subject).toMatch(/e-mail was changed/);
    const token = /undo-email\?token=([A-Za-z0-9_-]{43})/.exec(notice!.text)![1]!;
    const [row] = await api.dataSource.query(`SELECT expires_at FROM email_changes WHERE user_id = $1`, [user.id]);
    const days = (row.expires_at.getTime() - Date.now()) / 86_400_000;
    expect(days).toBeGreaterThan(6.99);
    expect(days).toBeLessThanOrEqual(7);

    const undone = await request(api.app).post('/api/auth/undo-email-change').send({ token });

    expect(undone.status).toBe(200);
    const { email, resetToken } = undoEmailResponse.parse(undone.body);
    expect(email).toBe(user.email);
    expect((await request(api.app).get('/api/me').set(user.auth)).status).toBe(401);
    const reset = await request(api.app).post('/api/auth/reset').send({ token: resetToken, password: 'taken-back-at-last' });
    expect(reset.status).toBe(200);
    expect((await signIn(user.email, 'taken-back-at-last')).status).toBe(200);
    expect((await request(api.app).post('/api/auth/undo-email-change').send({ token })).status).toBe(400);
  });
});

describe('refresh tokens rotate, and a reused one ends the sign-in', () => {
  it('when a refresh token is used, then a new one comes back and the old one stops working', async () => {
    const user = await registerUser(api.app, 'rotate');
    const first = await request(api.app).post('/api/auth/refresh').send({ refreshToken: user.session.refreshToken });
    expect(first.status).toBe(200);
    const rotated = authResponse.parse(first.body);
    expect(rotated.refreshToken).not.toBe(user.session.refreshToken);
    expect((await request(api.app).post('/api/auth/refresh').send({ refreshToken: rotated.refreshToken })).status).toBe(200);
  });

  it('when an old refresh token is presented again (a copy), then the whole sign-in ends, the newest tokens too', async () => {
    const user = await registerUser(api.app, 'reuse');
    const rotated = authResponse.parse((await request(api.app).post('/api/auth/refresh').send({ refreshToken: user.session.refreshToken })).body);
    // Past the 30-second grace that lets two tabs refresh at once.
    await api.dataSource.query(`UPDATE auth_sessions SET rotated_at = now() - interval '1 minute' WHERE user_id = $1`, [user.id]);

    const replay = await request(api.app).post('/api/auth/refresh').send({ refreshToken: user.session.refreshToken });

    expect(replay.status).toBe(401);
    expect(replay.body.error.message).toMatch(/used twice/);
    expect((await request(api.app).post('/api/auth/refresh').send({ refreshToken: rotated.refreshToken })).status).toBe(401);
    expect((await request(api.app).get('/api/me').set('Authorization', `Bearer ${rotated.token}`)).status).toBe(401);
    const [row] = await api.dataSource.query(`SELECT end_reason FROM auth_sessions WHERE user_id = $1`, [user.id]);
    expect(row.end_reason).toBe('reuse');
  });

  it('when two tabs refresh with the same token at the same moment, then both get through; a third use of it ends the sign-in', async () => {
    const user = await registerUser(api.app, 'two-tabs');
    const [first, second] = await Promise.all([
      request(api.app).post('/api/auth/refresh').send({ refreshToken: user.session.refreshToken }),
      request(api.app).post('/api/auth/refresh').send({ refreshToken: user.session.refreshToken }),
    ]);
    expect([first.status, second.status]).toEqual([200, 200]);
    expect((await request(api.app).post('/api/auth/refresh').send({ refreshToken: user.session.refreshToken })).status).toBe(401);
  });

  it('when the device signs out, then its access and refresh tokens are dead for good', async () => {
    const user = await registerUser(api.app, 'logout');
    expect((await request(api.app).post('/api/auth/logout').set(user.auth)).status).toBe(204);
    expect((await request(api.app).get('/api/me').set(user.auth)).status).toBe(401);
    expect((await request(api.app).post('/api/auth/refresh').send({ refreshToken: user.session.refreshToken })).status).toBe(401);
  });

  it('when the owner lists devices and signs out everywhere, then every sign-in ends', async () => {
    const user = await registerUser(api.app, 'devices');
    const phone = authResponse.parse((await signIn(user.email, user.password)).body);

    const listed = deviceSessionList.parse((await request(api.app).get('/api/me/sessions').set(user.auth)).body);

    expect(listed.items).toHaveLength(2);
    expect(listed.items.filter((item) => item.current)).toHaveLength(1);
    expect(listed.items.map((item) => item.device)).toContain('Chrome on Android');
    expect((await request(api.app).post('/api/me/sessions/end-all').set(user.auth)).status).toBe(204);
    expect((await request(api.app).get('/api/me').set(user.auth)).status).toBe(401);
    expect((await request(api.app).get('/api/me').set('Authorization', `Bearer ${phone.token}`)).status).toBe(401);
  });
});

describe('password rules', () => {
  it.each([
    ['a common password (zxcvbn-ts common list)', 'password123'],
    ['the e-mail itself', 'SAME'],
    ['the display name', 'Juniper Vale Hunter'],
  ])('when the password is %s, then 400 naming the password', async (_label, password) => {
    const email = `rules-${Date.now()}-${Math.random().toString(36).slice(2, 6)}@strapsift.test`;
    const response = await request(api.app)
      .post('/api/auth/register')
      .set('X-Forwarded-For', clientAddress())
      .send({ email, password: password === 'SAME' ? email : password, displayName: 'Juniper Vale Hunter' });
    expect(response.status).toBe(400);
    expect(response.body.error.fields).toHaveProperty('password');
  });

  it('when an account still has an old 64 MiB hash, then a good sign-in upgrades it to 19 MiB, t=2, p=1', async () => {
    const user = await registerUser(api.app, 'rehash');
    await api.dataSource.query(`UPDATE users SET password_hash = $2 WHERE id = $1`, [user.id, await argon2.hash(user.password, { type: argon2.argon2id })]);

    expect((await signIn(user.email, user.password)).status).toBe(200);

    const [{ password_hash: hash }] = await api.dataSource.query(`SELECT password_hash FROM users WHERE id = $1`, [user.id]);
    expect(hash).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$/);
  });
});

describe('per-client limits', () => {
  it('when one client sprays registrations, then the 21st within the hour meets 429 with Retry-After', async () => {
    const from = clientAddress();
    const statuses: number[] = [];
    let retryAfter: string | undefined;
    for (let i = 0; i < 21; i++) {
      const response = await request(api.app)
        .post('/api/auth/register')
        .set('X-Forwarded-For', from)
        .send({ email: `spray-${i}-${Date.now()}@strapsift.test`, password: 'sprayed-but-long', displayName: 'Spray' });
      statuses.push(response.status);
      retryAfter = response.headers['retry-after'];
    }
    expect(statuses.slice(0, 20).every((status) => status === 201)).toBe(true);
    expect(statuses[20]).toBe(429);
    expect(Number(retryAfter)).toBeGreaterThan(0);
  });

  it('when a stranger fails ten sign-ins for an account, then the stranger meets 429 and the owner elsewhere still signs in', async () => {
    const user = await registerUser(api.app, 'pair');
    const stranger = clientAddress();
    for (let i = 0; i < 10; i++) expect((await signIn(user.email, `wrong-guess-${i}`, stranger)).status).toBe(401);

    const blocked = await signIn(user.email, user.password, stranger);
    const owner = await signIn(user.email, user.password, clientAddress());

    expect(blocked.status).toBe(429);
    expect(Number(blocked.headers['retry-after'])).toBeGreaterThan(0);
    expect(owner.status).toBe(200);
  });

  it('when X-Forwarded-For comes from a client and no proxy is configured, then it is ignored and the limit holds', async () => {
    const strict = await openTestApi({ trustedProxies: [] });
    try {
      const statuses: number[] = [];
      for (let i = 0; i < 31; i++) {
        statuses.push((await request(strict.app).post('/api/auth/forgot').set('X-Forwarded-For', clientAddress()).send({ email: `nobody-${i}@strapsift.test` })).status);
      }
      expect(statuses.slice(0, 30).every((status) => status === 202)).toBe(true);
      expect(statuses[30]).toBe(429);
    } finally {
      await strict.close();
    }
  });
});

describe('POST /api/auth/forgot answers before the mail goes', () => {
  it('when the mailer is slow, then the answer still comes at once and the mail follows', async () => {
    const user = await registerUser(api.app, 'slow-mail');
    let delivered = 0;
    const slow = await openTestApi({
      resetMailer: {
        sendReset: async () => {
          await new Promise((done) => setTimeout(done, 1500));
          delivered += 1;
        },
      },
    });
    try {
      const started = performance.now();
      const response = await request(slow.app).post('/api/auth/forgot').send({ email: user.email });
      const took = performance.now() - started;

      expect(response.status).toBe(202);
      expect(took).toBeLessThan(1000);
      expect(delivered).toBe(0);
      await slow.settled();
      expect(delivered).toBe(1);
    } finally {
      await slow.close();
    }
  });
});
