import { Writable } from 'node:stream';
import jwt from 'jsonwebtoken';
import pino from 'pino';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { config } from '../../server/config';
import { redactedPaths } from '../../server/lib/logger';
import { addCrew, createHunt, openTestApi, registerAdmin, registerUser, type TestApi, type TestUser } from '../support/api';

describe('sessions, rate limits and secrets', () => {
  let api: TestApi;
  let owner: TestUser;
  let crew: TestUser;
  let admin: TestUser;

  beforeAll(async () => {
    api = await openTestApi();
    owner = await registerUser(api.app, 'secret-owner');
    crew = await registerUser(api.app, 'secret-crew');
    admin = await registerAdmin(api);
  });
  afterAll(async () => {
    await api.close();
  });

  it('when an access token has expired, then it is refused, and the refresh token buys a new one that works', async () => {
    const expired = jwt.sign({ ver: 0, typ: 'access' }, config().JWT_SECRET, { subject: owner.id, expiresIn: -1, algorithm: 'HS256', issuer: 'strapsift' });
    await request(api.app).get('/api/me').set('Authorization', `Bearer ${expired}`).expect(401);
    const refreshed = await request(api.app).post('/api/auth/refresh').send({ refreshToken: owner.session.refreshToken }).expect(200);
    await request(api.app).get('/api/me').set('Authorization', `Bearer ${refreshed.body.token}`).expect(200);
  });

  it('when a refresh token is used as an access token (or the other way round), then it is refused', async () => {
    await request(api.app).get('/api/me').set('Authorization', `Bearer ${owner.session.refreshToken}`).expect(401);
    await request(api.app).post('/api/auth/refresh').send({ refreshToken: owner.token }).expect(401);
  });

  it('when reset mails are asked for the same address again and again, then the sixth within the hour is refused with 429', async () => {
    const statuses: number[] = [];
    for (let attempt = 0; attempt < 6; attempt++) {
      statuses.push((await request(api.app).post('/api/auth/forgot').send({ email: owner.email })).status);
    }
    expect(statuses).toEqual([202, 202, 202, 202, 202, 429]);
  });

  it('when reset tokens are guessed over and over, then the client is slowed down with 429', async () => {
    const statuses: number[] = [];
    for (let attempt = 0; attempt < 22; attempt++) {
      statuses.push((await request(api.app).post('/api/auth/reset').send({ token: `guess-${attempt}-abcdefghijk`, password: 'new-password-123' })).status);
    }
    expect(statuses.slice(0, 20).every((status) => status === 400 || status === 401 || status === 404)).toBe(true);
    expect(statuses.slice(20)).toEqual([429, 429]);
  });

  it('when sign-in fails ten times for one address, then the eleventh try is refused with 429 even with the right password', async () => {
    const victim = await registerUser(api.app, 'throttled');
    for (let attempt = 0; attempt < 10; attempt++) {
      await request(api.app).post('/api/auth/login').send({ email: victim.email, password: 'wrong-password-1' }).expect(401);
    }
    await request(api.app).post('/api/auth/login').send({ email: victim.email, password: victim.password }).expect(429);
  });

  it('when any page of the API answers, then helmet headers are there and no CORS header invites another origin', async () => {
    const response = await request(api.app).get('/api/me').set(owner.auth).set('Origin', 'http://elsewhere.test');
    expect(response.headers).toMatchObject({
      'x-content-type-options': 'nosniff',
      'x-frame-options': 'SAMEORIGIN',
      'strict-transport-security': expect.stringContaining('max-age='),
      'referrer-policy': 'no-referrer',
    });
    expect(response.headers['access-control-allow-origin']).toBeUndefined();
    const preflight = await request(api.app)
      .options('/api/hunts')
      .set('Origin', 'http://elsewhere.test')
      .set('Access-Control-Request-Method', 'POST')
      .set('Access-Control-Request-Headers', 'authorization,content-type');
    expect(preflight.headers['access-control-allow-origin']).toBeUndefined();
    expect(preflight.headers['access-control-allow-headers']).toBeUndefined();
  });

  it('when users, crews and admins read the API, then no answer carries a password, a hash or a token version', async () => {
    const hunt = await createHunt(api.app, owner);
    await addCrew(api.app, owner, hunt.id, crew);
    const bodies = await Promise.all([
      request(api.app).get('/api/me').set(owner.auth),
      request(api.app).patch('/api/me').set(owner.auth).send({ displayName: 'Still secret' }),
      request(api.app).get(`/api/hunts/${hunt.id}/members`).set(crew.auth),
      request(api.app).get('/api/admin/users').set(admin.auth),
      request(api.app).post('/api/auth/login').send({ email: crew.email, password: crew.password }),
    ]);
    const [{ password_hash: hash }] = await api.dataSource.query('SELECT password_hash FROM users WHERE id = $1', [owner.id]);
    for (const response of bodies) {
      const text = JSON.stringify(response.body);
      expect(response.status).toBeLessThan(300);
      expect(text).not.toMatch(/passwordHash|password_hash|tokenVersion|token_version|\$argon2/);
      expect(text).not.toContain(hash);
      expect(text).not.toContain(owner.password);
      expect(text).not.toContain(crew.password);
    }
  });

  it('when a request carrying a token and a password is logged, then the log line shows neither', () => {
    const lines: string[] = [];
    const sink = new Writable({
      write(chunk, _encoding, done) {
        lines.push(String(chunk));
        done();
      },
    });
    const logger = pino({ redact: { paths: redactedPaths, censor: '[redacted]' } }, sink);
    logger.info({ req: { method: 'POST', url: '/api/auth/login', headers: { authorization: `Bearer ${owner.token}`, cookie: 'session=abc' } }, password: owner.password, token: owner.token }, 'request');
    logger.info({ body: { password: owner.password, token: owner.token } }, 'body');
    const text = lines.join('');
    expect(text).toContain('[redacted]');
    expect(text).not.toContain(owner.token);
    expect(text).not.toContain(owner.password);
  });
});
