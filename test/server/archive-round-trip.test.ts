import type { Express } from 'express';
import request from 'supertest';
import type { DataSource } from 'typeorm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app';
import { InMemoryResetOutbox } from '../../server/features/auth/reset-mailer';
import { DEMO_COLLECTOR } from '../../server/db/seed/demo-accounts';
import { seedDemo } from '../../server/db/seed/demo-seed';
import { archiveImportResult } from '../../shared/contracts/archive';
import { authResponse } from '../../shared/contracts/auth';
import { downloadArchive, openArchive, uploadArchive, type ArchiveJson } from '../support/archive';
import { openTestDataSource } from '../support/database';
import { dropDatabase, freshDatabase } from '../support/scratch-database';

let url: string;
let dataSource: DataSource;
let app: Express;

// Its own database: this test deletes the demo collector, which other test files rely on.
beforeAll(async () => {
  url = await freshDatabase('archive_round_trip');
  dataSource = await openTestDataSource(url);
  await dataSource.runMigrations();
  await seedDemo(dataSource);
  app = createApp({ dataSource, resetMailer: new InMemoryResetOutbox() });
});
afterAll(async () => {
  await dataSource?.destroy();
  if (url) await dropDatabase(url);
});

async function signIn(password: string): Promise<Record<string, string>> {
  const response = await request(app).post('/api/auth/login').send({ email: DEMO_COLLECTOR.email, password });
  return { Authorization: `Bearer ${authResponse.parse(response.body).token}` };
}

/**
 * An archive with what may differ between two exports of the same log taken away: the account's id and
 * when that account was created, the time of export, and the ids of hunts that had to be copied because someone else owns the original here.
 * Crew lists are compared apart: the others in a hunt are other people's accounts and are never restored.
 */
function comparable(json: ArchiveJson, huntIds: Map<string, string>) {
  const hunt = (id: unknown) => (typeof id === 'string' ? (huntIds.get(id) ?? id) : id);
  return {
    ...json,
    account: { ...json.account, id: 'account', createdAt: 'account created' },
    exportedAt: 'export time',
    hunts: json.hunts.map((h) => ({ ...h, id: hunt(h.id), crew: 'compared apart' })),
    notes: json.notes.map((n) => ({ ...n, huntId: hunt(n.huntId) })),
    keepers: json.keepers.map((k) => ({ ...k, huntId: hunt(k.huntId) })),
  };
}

describe('archive round trip of the demo collector', () => {
  it('when the account is exported, deleted, created again and restored, then a second export holds the same log', async () => {
    const zip = await downloadArchive(app, await signIn(DEMO_COLLECTOR.password));
    const first = openArchive(zip);
    expect(first.json.notes.length).toBeGreaterThan(1000);
    expect(first.json.photos.length).toBeGreaterThan(0);
    const shared = first.json.hunts.filter((hunt) => (hunt.crew as unknown[]).length > 0);
    expect(shared.length).toBeGreaterThan(0);

    await request(app).delete('/api/me').set(await signIn(DEMO_COLLECTOR.password)).expect(204);
    const password = 'a-new-start-2026';
    const created = await request(app).post('/api/auth/register').send({ email: DEMO_COLLECTOR.email, password, displayName: 'Someone new' }).expect(201);
    const auth = { Authorization: `Bearer ${authResponse.parse(created.body).token}` };

    const restored = archiveImportResult.parse((await uploadArchive(app, auth, zip).expect(200)).body);
    expect(restored.problems).toEqual([]);
    expect(restored.counts.notes).toEqual({ inArchive: first.json.notes.length, add: first.json.notes.length, present: 0 });
    expect(restored.counts.photos.add).toBe(first.json.photos.length);
    // The shared hunt went to the crew member with the old account, so it comes back as a copy of one's own.
    expect(restored.adoptedHunts.map((hunt) => hunt.reason)).toEqual(shared.map(() => 'owned-here'));

    const second = openArchive(await downloadArchive(app, auth));
    const huntIds = new Map<string, string>();
    first.json.hunts.forEach((hunt, i) => huntIds.set(second.json.hunts[i]!.id as string, hunt.id as string));
    expect(comparable(second.json, huntIds)).toEqual(comparable(first.json, new Map()));
    for (const hunt of second.json.hunts) expect(hunt.crew).toEqual([]);
    // Every photo, byte for byte.
    expect(Object.keys(second.files).sort()).toEqual(Object.keys(first.files).sort());
    for (const name of Object.keys(first.files)) expect(Buffer.from(second.files[name]!).equals(Buffer.from(first.files[name]!))).toBe(name !== 'strapsift.json');

    const again = archiveImportResult.parse((await uploadArchive(app, auth, zip).expect(200)).body);
    for (const kind of Object.values(again.counts)) expect(kind.add).toBe(0);
  });
});
