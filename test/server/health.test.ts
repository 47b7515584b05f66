import request from 'supertest';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { healthResponse } from '../../shared/contracts/common';
import { createApp } from '../../server/app';
import { createDataSource } from '../../server/db/data-source';
import { openTestDataSource } from '../support/database';

describe('GET /api/health', () => {
  let dataSource: DataSource;
  beforeAll(async () => {
    dataSource = await openTestDataSource();
  });
  afterAll(async () => {
    await dataSource.destroy();
  });

  it('when the database answers, then it reports ok with the database up and the app version', async () => {
    const response = await request(createApp({ dataSource })).get('/api/health');
    expect(response.status).toBe(200);
    const body = healthResponse.parse(response.body);
    expect(body).toMatchObject({ ok: true, db: 'up' });
    expect(body.version).toMatch(/^\d+\.\d+\.\d+/);
  });

  it('when the database is unreachable, then it answers 503 with the database down', async () => {
    const closed = createDataSource('postgres://postgres@127.0.0.1:9/nowhere');
    const response = await request(createApp({ dataSource: closed })).get('/api/health');
    expect(response.status).toBe(503);
    expect(response.body).toMatchObject({ ok: false, db: 'down' });
  });
});

describe('unknown and malformed API requests', () => {
  let dataSource: DataSource;
  beforeAll(async () => {
    dataSource = await openTestDataSource();
  });
  afterAll(async () => {
    await dataSource.destroy();
  });

  it('when an /api path does not exist, then it answers 404 in the JSON error shape', async () => {
    const response = await request(createApp({ dataSource })).get('/api/no-such-thing');
    expect(response.status).toBe(404);
    expect(response.body.error).toMatchObject({ code: 'not_found' });
    expect(response.body.error.message).toContain('/api/no-such-thing');
  });

  it('when a body is not valid JSON, then it answers 400 bad_request, not 500', async () => {
    const response = await request(createApp({ dataSource }))
      .post('/api/health')
      .set('Content-Type', 'application/json')
      .send('{"serial": 1234');
    expect(response.status).toBe(400);
    expect(response.body.error.code).toBe('bad_request');
  });

  it('when any response is sent, then helmet security headers are present', async () => {
    const response = await request(createApp({ dataSource })).get('/api/health');
    expect(response.headers['x-content-type-options']).toBe('nosniff');
    expect(response.headers['content-security-policy']).toContain("default-src 'self'");
    expect(response.headers['x-powered-by']).toBeUndefined();
  });
});
