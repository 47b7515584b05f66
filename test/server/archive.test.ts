import { execFile } from 'node:child_process';
import { createHash } from 'node:crypto';
import { writeFile, mkdtemp } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { strToU8, zipSync } from 'fflate';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { config } from '../../server/config';
import { ArchiveImportService } from '../../server/features/transfer/archive-import.service';
import { ArchiveProblem } from '../../server/features/transfer/archive/archive-problem';
import { createObjectStore, type ObjectStore } from '../../server/lib/object-store';
import { ARCHIVE_LIMITS, archiveImportResult, archiveSummary } from '../../shared/contracts/archive';
import { keeperDetail } from '../../shared/contracts/keepers';
import { downloadArchive, openArchive, rezip, uploadArchive, type OpenedArchive } from '../support/archive';
import { addCrew, createHunt, openTestApi, postBatch, registerUser, scanOf, type TestApi, type TestUser } from '../support/api';
import { drawJpeg, drawPng } from '../support/images';

const run = promisify(execFile);
let api: TestApi;
let store: ObjectStore;

beforeAll(async () => {
  api = await openTestApi();
  store = createObjectStore(config());
});
afterAll(async () => {
  await api.close();
});

/** A small account: a hunt with notes (one pulled, one from the camera), a kept note with two photos, a watch pattern. */
async function stockedAccount(label: string) {
  const user = await registerUser(api.app, label);
  const hunt = await createHunt(api.app, user, { title: `${label} week`, inSequence: true, series: '2017A' });
  const pulled = scanOf(hunt.id, 'MB 12121212 A', { pulled: true, starRunSize: 640000 });
  const camera = scanOf(hunt.id, '48205731', { strap: 2, entryMethod: 'camera', cameraConfidence: 0.875 });
  expect((await postBatch(api.app, user, [pulled, camera])).status).toBe(200);
  await request(api.app).patch(`/api/hunts/${hunt.id}/straps/1`).set(user.auth).send({ swappedIn: 1, shortOver: 0, note: 'teller counted twice' }).expect(200);
  const keeper = keeperDetail.parse(
    (await request(api.app).post('/api/keepers').set(user.auth).send({ scanId: pulled.id, grade: 64, estimatedValueCents: 2500, originalPaper: true })).body,
  );
  await request(api.app).post(`/api/keepers/${keeper.id}/photos`).set(user.auth).field('side', 'front').attach('photo', drawPng(400, 170, 3), 'f.png').expect(201);
  await request(api.app).post(`/api/keepers/${keeper.id}/photos`).set(user.auth).field('side', 'back').attach('photo', await drawJpeg(5), 'b.jpg').expect(201);
  await request(api.app).post('/api/watch').set(user.auth).send({ pattern: '0704????', label: 'Independence' }).expect(201);
  return { user, hunt, keeper, pulled, camera };
}

/** Everything an account holds, to prove a refused restore changed nothing. */
async function footprint(user: TestUser) {
  const [row] = await api.dataSource.query(
    `SELECT (SELECT count(*)::int FROM hunt_members WHERE user_id = $1) AS hunts, (SELECT count(*)::int FROM scans WHERE user_id = $1) AS notes,
            (SELECT count(*)::int FROM keepers WHERE user_id = $1) AS keepers, (SELECT count(*)::int FROM photos WHERE user_id = $1) AS photos,
            (SELECT count(*)::int FROM weight_tables WHERE user_id = $1) AS tables, (SELECT count(*)::int FROM watch_patterns WHERE user_id = $1) AS watch,
            (SELECT display_name FROM users WHERE id = $1) AS name`,
    [user.id],
  );
  return { ...row, objects: (await store.list(`users/${user.id}/`)).length };
}

describe('GET /api/export/archive', () => {
  let account: Awaited<ReturnType<typeof stockedAccount>>;
  let zip: Buffer;
  let archive: OpenedArchive;
  beforeAll(async () => {
    account = await stockedAccount('archive');
    zip = await downloadArchive(api.app, account.user.auth);
    archive = openArchive(zip);
  });

  it('when a user exports, then the zip holds a README, the original photos and a versioned strapsift.json with every record', async () => {
    expect(Object.keys(archive.files).sort()).toEqual([
      'README.txt',
      `photos/${account.keeper.id}-back.jpg`,
      `photos/${account.keeper.id}-front.png`,
      'strapsift.json',
    ]);
    const { json } = archive;
    expect(json).toMatchObject({ format: 'strapsift-archive', version: 1, account: { id: account.user.id, email: account.user.email } });
    expect(json.hunts).toEqual([
      expect.objectContaining({ id: account.hunt.id, role: 'owner', inSequence: true, series: '2017A', crew: [], straps: [{ number: 1, swappedIn: 1, shortOver: 0, note: 'teller counted twice' }] }),
    ]);
    expect(json.notes).toEqual([
      expect.objectContaining({ id: account.pulled.id, serial: 'MB 12121212 A', pulled: true, entryMethod: 'keypad', starRunSize: 640000, patterns: ['repeater', 'super-repeater', 'binary'] }),
      expect.objectContaining({ id: account.camera.id, strap: 2, entryMethod: 'camera', cameraConfidence: 0.875 }),
    ]);
    expect(json.keepers).toEqual([expect.objectContaining({ id: account.keeper.id, scanId: account.pulled.id, grade: 64, estimatedValueCents: 2500, originalPaper: true })]);
    expect(json.watchPatterns).toEqual([expect.objectContaining({ text: '0704????', label: 'Independence' })]);
    expect(json.weightTables).toEqual([expect.objectContaining({ name: 'Standard', active: true })]);
    expect(new TextDecoder().decode(archive.files['README.txt'])).toContain('strapsift.json');
  });

  it('when the photos are compared with what the photo route serves, then each is the same bytes with its SHA-256 listed', async () => {
    const listed = (await request(api.app).get(`/api/keepers/${account.keeper.id}/photos`).set(account.user.auth)).body.items as Array<{ side: string; url: string }>;
    for (const item of listed) {
      const served = await request(api.app).get(item.url).set(account.user.auth).buffer(true).parse((res, done) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('end', () => done(null, Buffer.concat(chunks)));
      });
      const record = archive.json.photos.find((photo) => photo.side === item.side)!;
      const inZip = archive.files[record.file as string]!;
      expect(Buffer.from(inZip).equals(served.body as Buffer)).toBe(true);
      expect(record.sha256).toBe(createHash('sha256').update(inZip).digest('hex'));
    }
  });

  it('when another zip reader opens it (Python’s zipfile, a general-purpose reference), then every entry passes its CRC check', async () => {
    const folder = await mkdtemp(join(tmpdir(), 'archive-test-'));
    const path = join(folder, 'a.zip');
    await writeFile(path, zip);
    const { stdout } = await run('python3', ['-c', 'import sys, zipfile; z = zipfile.ZipFile(sys.argv[1]); print(z.testzip() or "ok", len(z.namelist()))', path]);
    expect(stdout.trim()).toBe('ok 4');
  });

  it('when the summary is asked for, then it counts what the archive will hold', async () => {
    const summary = archiveSummary.parse((await request(api.app).get('/api/export/archive/summary').set(account.user.auth).expect(200)).body);
    expect(summary).toMatchObject({ hunts: 1, notes: 2, keepers: 1, photos: 2 });
    expect(summary.estimatedBytes).toBeGreaterThan(0);
  });

  it('when signed out, then the archive is refused', async () => {
    await request(api.app).get('/api/export/archive').expect(401);
  });
});

describe('POST /api/import/archive', () => {
  it('when another account previews and restores, then it gets everything once, as its own, and a second restore adds nothing', async () => {
    const source = await stockedAccount('origin');
    const zip = await downloadArchive(api.app, source.user.auth);
    const importer = await registerUser(api.app, 'importer');

    const preview = archiveImportResult.parse((await uploadArchive(api.app, importer.auth, zip, '?preview=1').expect(200)).body);
    expect(preview.preview).toBe(true);
    expect(preview.problems).toEqual([]);
    expect(preview.counts.notes).toEqual({ inArchive: 2, add: 2, present: 0 });
    expect(preview.counts.photos).toEqual({ inArchive: 2, add: 2, present: 0 });
    // The origin still owns its hunt here, so the importer gets a copy of its own.
    expect(preview.adoptedHunts).toEqual([{ title: 'origin week', reason: 'owned-here' }]);
    expect(await footprint(importer)).toMatchObject({ hunts: 0, notes: 0, keepers: 0, photos: 0, watch: 0 });

    const restored = archiveImportResult.parse((await uploadArchive(api.app, importer.auth, zip).expect(200)).body);
    expect(restored.counts).toMatchObject({
      hunts: { add: 1 },
      notes: { add: 2 },
      keepers: { add: 1 },
      photos: { add: 2 },
      watchPatterns: { add: 1 },
      weightTables: { add: 0, present: 1 },
    });
    const mine = await footprint(importer);
    expect(mine).toMatchObject({ hunts: 1, notes: 2, keepers: 1, photos: 2, watch: 1, objects: 4 });
    const [hunt] = await api.dataSource.query(`SELECT h.owner_id, m.role FROM hunts h JOIN hunt_members m ON m.hunt_id = h.id WHERE m.user_id = $1`, [importer.id]);
    expect(hunt).toEqual({ owner_id: importer.id, role: 'owner' });

    const again = archiveImportResult.parse((await uploadArchive(api.app, importer.auth, zip).expect(200)).body);
    for (const kind of Object.values(again.counts)) expect(kind.add).toBe(0);
    expect(await footprint(importer)).toEqual(mine);
    // The origin's own records are untouched.
    expect(await footprint(source.user)).toMatchObject({ hunts: 1, notes: 2, keepers: 1, photos: 2 });
  });

  it('when a crew member restores after the owner deleted the hunt, then the hunt comes back as theirs and the answer says so', async () => {
    const owner = await registerUser(api.app, 'owner');
    const crew = await registerUser(api.app, 'crewmate');
    const hunt = await createHunt(api.app, owner, { title: 'Shared brick' });
    await addCrew(api.app, owner, hunt.id, crew);
    const notes = [scanOf(hunt.id, '30000003'), scanOf(hunt.id, '30000004')];
    expect((await postBatch(api.app, crew, notes)).status).toBe(200);
    const zip = await downloadArchive(api.app, crew.auth);
    expect(openArchive(zip).json.hunts).toEqual([expect.objectContaining({ role: 'crew', crew: [{ displayName: 'Test owner', role: 'owner' }] })]);
    await request(api.app).delete(`/api/hunts/${hunt.id}`).set(owner.auth).expect(204);

    const restored = archiveImportResult.parse((await uploadArchive(api.app, crew.auth, zip).expect(200)).body);
    expect(restored.adoptedHunts).toEqual([{ title: 'Shared brick', reason: 'crew' }]);
    const rows = await api.dataSource.query(`SELECT id, owner_id FROM hunts WHERE id = $1`, [hunt.id]);
    expect(rows).toEqual([{ id: hunt.id, owner_id: crew.id }]);
    // Notes keep their client ids.
    const ids = (await api.dataSource.query(`SELECT id FROM scans WHERE user_id = $1 ORDER BY scanned_at`, [crew.id])).map((r: { id: string }) => r.id);
    expect(ids).toEqual(notes.map((note) => note.id));
  });

  it('when the upload asks for progress, then each part is a JSON line and the last one is the result', async () => {
    const source = await stockedAccount('progress');
    const zip = await downloadArchive(api.app, source.user.auth);
    const importer = await registerUser(api.app, 'progress-importer');
    const response = await uploadArchive(api.app, importer.auth, zip).set('Accept', 'application/x-ndjson').expect(200);
    const lines = (response.text as string).trim().split('\n').map((line) => JSON.parse(line));
    expect(lines.map((line) => line.phase ?? 'result')).toEqual(['settings', 'hunts', 'notes', 'keepers', 'photos', 'photos', 'result']);
    expect(lines.at(-1).result.counts.notes.add).toBe(2);
  });
});

describe('POST /api/import/archive with a bad or tampered archive', () => {
  let archive: OpenedArchive;
  let importer: TestUser;
  let keeperId: string;
  beforeAll(async () => {
    const source = await stockedAccount('tamper');
    keeperId = source.keeper.id;
    archive = openArchive(await downloadArchive(api.app, source.user.auth));
    importer = await registerUser(api.app, 'victim');
  });

  const refused = async (zip: Uint8Array, expected: RegExp) => {
    const before = await footprint(importer);
    for (const query of ['?preview=1', '']) {
      const response = await uploadArchive(api.app, importer.auth, zip, query);
      if (query && response.status === 200) {
        // A preview of an archive with bad records answers the counts and lists the problems.
        const preview = archiveImportResult.parse(response.body);
        expect(preview.problems.map((p) => `${p.where}: ${p.message}`).join('\n')).toMatch(expected);
        continue;
      }
      expect(response.status).toBe(400);
      expect(response.body.error.code).toBe('bad_archive');
      expect(`${response.body.error.message}\n${Object.entries(response.body.error.fields ?? {}).map(([k, v]) => `${k}: ${v}`).join('\n')}`).toMatch(expected);
    }
    expect(await footprint(importer)).toEqual(before);
  };

  it('when the version is one this server does not know, then 400 and nothing changes', async () => {
    await refused(rezip(archive, { json: { ...archive.json, version: 2 } }), /version.*must be 1/);
  });

  it('when an entry name climbs out of its folder (path traversal), then 400 and nothing changes', async () => {
    await refused(rezip(archive, { files: { '../../etc/cron.d/evil': strToU8('* * * * * root true') } }), /points outside the archive/);
    await refused(rezip(archive, { files: { 'photos/../../x.png': drawPng() } }), /points outside the archive/);
  });

  it('when a record fails the contract, then 400 names it and nothing changes', async () => {
    const notes = archive.json.notes.map((note, i) => (i === 1 ? { ...note, strap: 0 } : note));
    await refused(rezip(archive, { json: { ...archive.json, notes } }), /notes\[1\]\.strap/);
    // A member named like one of Object.prototype's is an unknown member, not a crash.
    await refused(rezip(archive, { json: { ...archive.json, toString: [1] } }), /"toString", which is not part of a version 1 archive/);
    const keepers = archive.json.keepers.map((keeper) => ({ ...keeper, patterns: ['solid'] }));
    await refused(rezip(archive, { json: { ...archive.json, keepers } }), /is not a solid/);
  });

  it('when a photo is not an image (its checksum made to match), then 400 and nothing changes', async () => {
    const fake = strToU8('#!/bin/sh\necho not a photo\n');
    const photos = archive.json.photos.map((photo) =>
      photo.side === 'front' ? { ...photo, sha256: createHash('sha256').update(fake).digest('hex'), byteSize: fake.length } : photo,
    );
    await refused(rezip(archive, { json: { ...archive.json, photos }, files: { [`photos/${keeperId}-front.png`]: fake } }), /is not a JPEG, PNG or WebP image/);
  });

  it('when a photo was changed after export, then its checksum gives it away', async () => {
    await refused(rezip(archive, { files: { [`photos/${keeperId}-front.png`]: drawPng(400, 170, 9) } }), /does not match its SHA-256/);
  });

  it('when an entry inflates past its limit (a zip bomb), then 400 while it inflates and nothing changes', async () => {
    // 12 MB of zeros deflate to about 12 KB: the reader stops at the photo limit, not at the claimed size.
    const bomb = zipSync({ ...archive.files, [`photos/${keeperId}-front.png`]: new Uint8Array(12 * 1024 * 1024) }, { level: 9 });
    expect(bomb.length).toBeLessThan(200_000);
    await refused(bomb, /larger than 10485760 bytes once decompressed/);
  });

  it('when the file is not a zip, or cut short, then 400 and nothing changes', async () => {
    await refused(strToU8(JSON.stringify(archive.json)), /not a (readable )?zip/);
    const whole = rezip(archive);
    await refused(whole.subarray(0, Math.floor(whole.length / 2)), /cut short|not a readable zip|ends part-way/);
  });

  it('when an archive holds too many files or too many bytes in all, then the reader stops (limits counted while reading)', async () => {
    const folder = await mkdtemp(join(tmpdir(), 'archive-limits-'));
    const path = join(folder, 'a.zip');
    await writeFile(path, rezip(archive));
    const tight = new ArchiveImportService(api.dataSource, store, { ...ARCHIVE_LIMITS, entries: 3 });
    await expect(tight.check(importer.id, path)).rejects.toThrow(new ArchiveProblem('archive', 'holds more than 3 files'));
    const small = new ArchiveImportService(api.dataSource, store, { ...ARCHIVE_LIMITS, totalBytes: 4096 });
    await expect(tight.check(importer.id, path)).rejects.toBeInstanceOf(ArchiveProblem);
    await expect(small.check(importer.id, path)).rejects.toThrow(/more than 4096 bytes once decompressed/);
  });

  it('when the object store fails part-way through a photo, then the restore stops and leaves no stray objects', async () => {
    const folder = await mkdtemp(join(tmpdir(), 'archive-store-'));
    const path = join(folder, 'a.zip');
    await writeFile(path, rezip(archive));
    const user = await registerUser(api.app, 'store-fails');
    const failing: ObjectStore = {
      ...store,
      put: async (key, body, type) => {
        if (key.endsWith('-thumb.jpg')) throw new Error('object store is down');
        await store.put(key, body, type);
      },
      get: (key) => store.get(key),
      delete: (keys) => store.delete(keys),
      list: (prefix) => store.list(prefix),
      deletePrefix: (prefix) => store.deletePrefix(prefix),
    };
    const service = new ArchiveImportService(api.dataSource, failing);
    await expect(service.restore(user.id, path, { preview: false })).rejects.toThrow('object store is down');
    expect(await store.list(`users/${user.id}/`)).toEqual([]);
    expect((await footprint(user)).photos).toBe(0);
  });
});
