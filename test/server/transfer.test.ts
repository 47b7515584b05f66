import Papa from 'papaparse';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { keeperDetail, keeperList } from '../../shared/contracts/keepers';
import { IMPORT_CHUNK_ROWS, importRowsResponse, type ImportRow, type ImportRowsResponse } from '../../shared/contracts/transfer';
import { checkLog, guessMapping, readLogCsv } from '../../shared/transfer/import-log';
import { createHunt, missingId, openTestApi, ordinarySerial, postBatch, registerUser, scanOf, type TestApi, type TestUser } from '../support/api';

let api: TestApi;

beforeAll(async () => {
  api = await openTestApi();
});
afterAll(async () => {
  await api.close();
});

function download(path: string, user: TestUser) {
  return request(api.app)
    .get(path)
    .set(user.auth)
    .buffer(true)
    .parse((res, done) => {
      let text = '';
      res.setEncoding('utf8');
      res.on('data', (chunk: string) => (text += chunk));
      res.on('end', () => done(null, text));
    });
}

const csvRows = (text: string) => Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true }).data;

/** The client's import: papaparse, the guessed mapping, the per-row check, then parts of 500 rows. */
async function importCsv(user: TestUser, huntId: string, text: string) {
  const file = readLogCsv(text);
  const checked = checkLog(file.rows, guessMapping(file.headers));
  const rows = checked.filter((row) => row.ok).map((row) => row.row as ImportRow);
  const total: ImportRowsResponse = { stored: 0, duplicates: 0, keepers: 0, rejected: [] };
  for (let i = 0; i < rows.length; i += IMPORT_CHUNK_ROWS) {
    const response = await request(api.app).post('/api/import/rows').set(user.auth).send({ huntId, rows: rows.slice(i, i + IMPORT_CHUNK_ROWS) });
    if (response.status !== 200) throw new Error(`import failed: ${response.status} ${JSON.stringify(response.body)}`);
    const part = importRowsResponse.parse(response.body);
    total.stored += part.stored;
    total.duplicates += part.duplicates;
    total.keepers += part.keepers;
    total.rejected.push(...part.rejected);
  }
  return { checked, total };
}

describe('GET /api/export', () => {
  it('when a user exports, then hunts, scans and keepers come as CSV files and all of it as one JSON file', async () => {
    const user = await registerUser(api.app, 'export');
    const hunt = await createHunt(api.app, user, { title: 'Export week' });
    await postBatch(api.app, user, [scanOf(hunt.id, 'MB 12121212 A', { pulled: true }), scanOf(hunt.id, '48205731', { strap: 2 })]);
    const keeper = keeperDetail.parse(
      (await request(api.app).post('/api/keepers').set(user.auth).send({ serial: '77777777', notes: '=HYPERLINK("x")', estimatedValueCents: 1200 }).expect(201)).body,
    );

    const hunts = await download('/api/export/hunts.csv', user);
    const scans = await download('/api/export/scans.csv', user);
    const keepers = await download('/api/export/keepers.csv', user);
    const json = await download('/api/export/json', user);

    expect(hunts.status).toBe(200);
    expect(hunts.headers['content-type']).toBe('text/csv; charset=utf-8');
    expect(hunts.headers['content-disposition']).toMatch(/^attachment; filename="strapsift-hunts-\d{4}-\d{2}-\d{2}\.csv"$/);
    // The people who save the file read "notes", not the API's "scans".
    expect(scans.headers['content-disposition']).toMatch(/^attachment; filename="strapsift-notes-\d{4}-\d{2}-\d{2}\.csv"$/);
    expect(csvRows(hunts.body as string)).toEqual([expect.objectContaining({ id: hunt.id, title: 'Export week', role: 'owner', notes_you_logged: '2' })]);
    const scanRows = csvRows(scans.body as string);
    expect(scanRows.map((row) => [row.serial, row.strap, row.pulled, row.patterns])).toEqual([
      ['MB 12121212 A', '1', 'true', 'repeater super-repeater binary'],
      ['48205731', '2', 'false', ''],
    ]);
    const keeperRows = csvRows(keepers.body as string);
    expect(keeperRows).toHaveLength(1);
    // A cell a spreadsheet would run as a formula is escaped with a leading quote mark.
    expect(keeperRows[0]).toMatchObject({ id: keeper.id, note: `'=HYPERLINK("x")`, estimated_value_cents: '1200' });
    expect(json.headers['content-type']).toBe('application/json; charset=utf-8');
    const all = JSON.parse(json.body as string);
    expect(all).toMatchObject({ format: 'strapsift-export', version: 1, account: { email: user.email } });
    expect(all.hunts).toHaveLength(1);
    expect(all.scans.map((s: { serial: string }) => s.serial)).toEqual(['MB 12121212 A', '48205731']);
    expect(all.keepers[0]).toMatchObject({ id: keeper.id, note: '=HYPERLINK("x")' });
    expect(all.weightTables).toHaveLength(1);
  });

  it('when a user has thousands of notes, then the export streams every one, in order, across pages', async () => {
    const user = await registerUser(api.app, 'export-large');
    const hunt = await createHunt(api.app, user);
    const total = 4500;
    for (let i = 0; i < total; i += 1000) {
      const batch = Array.from({ length: Math.min(1000, total - i) }, (_, j) => scanOf(hunt.id, ordinarySerial(i + j), { strap: Math.floor((i + j) / 100) + 1 }));
      expect((await postBatch(api.app, user, batch)).body.stored).toHaveLength(batch.length);
    }

    const scans = csvRows((await download('/api/export/scans.csv', user)).body as string);
    const json = JSON.parse((await download('/api/export/json', user)).body as string);

    expect(scans).toHaveLength(total);
    expect(new Set(scans.map((row) => row.id)).size).toBe(total);
    expect(scans.map((row) => row.date)).toEqual([...scans.map((row) => row.date)].sort());
    expect(json.scans).toHaveLength(total);
  });

  it('when the kind is unknown or nobody signed in, then 400 and 401; another user’s rows never appear', async () => {
    const user = await registerUser(api.app, 'export-other');
    const other = await registerUser(api.app, 'export-someone');
    const hunt = await createHunt(api.app, other);
    await postBatch(api.app, other, [scanOf(hunt.id, '11223344')]);

    expect((await request(api.app).get('/api/export/photos.csv').set(user.auth)).status).toBe(400);
    expect((await request(api.app).get('/api/export/json')).status).toBe(401);
    expect(csvRows((await download('/api/export/scans.csv', user)).body as string)).toEqual([]);
    expect((await download('/api/export/hunts.csv', user)).body).toBe('id,title,source,denomination,planned_straps,status,role,started_at,closed_at,notes_you_logged\r\n');
  });
});

describe('POST /api/import/rows', () => {
  it('when an export is imported into another account and imported again, then the notes match and the second import adds none', async () => {
    const from = await registerUser(api.app, 'import-from');
    const to = await registerUser(api.app, 'import-to');
    const source = await createHunt(api.app, from);
    await postBatch(api.app, from, [
      scanOf(source.id, 'MB 12121212 A', { pulled: true }),
      scanOf(source.id, '48205731', { strap: 2 }),
      scanOf(source.id, 'L 00000777 ★', { strap: 2, pulled: true }),
      ...Array.from({ length: 620 }, (_, i) => scanOf(source.id, ordinarySerial(i), { strap: 3 + Math.floor(i / 100) })),
    ]);
    const exported = (await download('/api/export/scans.csv', from)).body as string;
    const target = await createHunt(api.app, to, { title: 'Imported log' });

    const first = await importCsv(to, target.id, exported);
    const second = await importCsv(to, target.id, exported);

    expect(first.checked.every((row) => row.ok)).toBe(true);
    expect(first.total).toEqual({ stored: 623, duplicates: 0, keepers: 2, rejected: [] });
    expect(second.total).toEqual({ stored: 0, duplicates: 623, keepers: 0, rejected: [] });
    const shape = (text: string) =>
      csvRows(text)
        .map((row) => [row.serial, row.strap, row.star, row.pulled, row.date, row.patterns].join('|'))
        .sort();
    expect(shape((await download('/api/export/scans.csv', to)).body as string)).toEqual(shape(exported));
    const keepers = keeperList.parse((await request(api.app).get('/api/keepers').set(to.auth)).body);
    expect(keepers.items.map((k) => k.digits).sort()).toEqual(['00000777', '12121212']);

    // Into the exporting account itself: every note is already there at the same time.
    const own = await createHunt(api.app, from);
    expect((await importCsv(from, own.id, exported)).total).toMatchObject({ stored: 0, duplicates: 623 });
  });

  it('when an old log has bad rows, then the preview says why for each, and the good rows import with their series and notes', async () => {
    const user = await registerUser(api.app, 'import-log');
    const hunt = await createHunt(api.app, user);
    const log = [
      'Serial Number;Date;Series;Star;Pulled;Notes',
      'MB 12121212 A;11/02/2026;2017A;no;yes;found in strap 3',
      '1234567;2026-11-02;;;;',
      '88888888;2026-13-02;;;;',
      '77777777;2026-11-02;1999Z1;;;',
      '45454545;;;maybe;;',
      '24682468;2026-11-03;;;no;',
      '24682468;2026-11-03;;;no;',
    ].join('\n');

    const file = readLogCsv(log);
    const mapping = guessMapping(file.headers);
    const checked = checkLog(file.rows, mapping);

    expect(mapping).toMatchObject({ serial: 0, date: 1, series: 2, star: 3, pulled: 4, note: 5, strap: null, district: null });
    expect(checked.map((row) => [row.line, row.ok])).toEqual([
      [2, true],
      [3, false],
      [4, false],
      [5, false],
      [6, false],
      [7, true],
      [8, true],
    ]);
    expect(checked[1]!.problems[0]).toMatch(/^serial: /);
    expect(checked[2]!.problems).toEqual(['date: “2026-13-02” is not a date (write 2026-11-02 or 11/02/2026)']);
    expect(checked[3]!.problems).toEqual(['series: “1999Z1” is not a series like 2013 or 1988A']);
    expect(checked[4]!.problems).toEqual(['star: “maybe” is not yes or no']);
    expect(checked[6]!.row?.occurrence).toBe(1);

    const { total } = await importCsv(user, hunt.id, log);
    expect(total).toEqual({ stored: 3, duplicates: 0, keepers: 1, rejected: [] });
    const keeper = keeperList.parse((await request(api.app).get('/api/keepers').set(user.auth)).body).items[0]!;
    expect(keeper).toMatchObject({ digits: '12121212', series: '2017A', notes: 'found in strap 3', foundAt: '2026-11-02T12:00:00.000Z', huntId: hunt.id });
    expect((await importCsv(user, hunt.id, log)).total).toEqual({ stored: 0, duplicates: 3, keepers: 0, rejected: [] });
  });

  it('when rows reach the server unchecked, then each bad row is rejected with its line and reason and the rest are stored', async () => {
    const user = await registerUser(api.app, 'import-raw');
    const hunt = await createHunt(api.app, user);
    await request(api.app).post(`/api/hunts/${hunt.id}/close`).set(user.auth).expect(200);

    const response = await request(api.app)
      .post('/api/import/rows')
      .set(user.auth)
      .send({
        huntId: hunt.id,
        rows: [
          { line: 2, serial: '1234', occurrence: 0 },
          { line: 3, serial: '13579135', date: '2020-01-01T12:00:00.000Z' },
          { line: 4, serial: '24680246', date: '2099-01-01T12:00:00.000Z' },
        ],
      });

    expect(response.status).toBe(200);
    expect(importRowsResponse.parse(response.body)).toEqual({
      stored: 1,
      duplicates: 0,
      keepers: 0,
      rejected: [
        { line: 2, reason: expect.stringMatching(/^serial: /) },
        { line: 4, reason: 'The hunt was closed before this note was logged' },
      ],
    });
  });

  it('when the body is malformed, too big, or names someone else’s hunt, then 400, 400 and 404', async () => {
    const user = await registerUser(api.app, 'import-bad');
    const other = await registerUser(api.app, 'import-bad-other');
    const theirs = await createHunt(api.app, other);
    const row = { line: 2, serial: '13579135' };

    const noRows = await request(api.app).post('/api/import/rows').set(user.auth).send({ huntId: theirs.id, rows: [] });
    const tooMany = await request(api.app)
      .post('/api/import/rows')
      .set(user.auth)
      .send({ huntId: theirs.id, rows: Array.from({ length: IMPORT_CHUNK_ROWS + 1 }, (_, i) => ({ ...row, line: i + 2 })) });
    const extra = await request(api.app).post('/api/import/rows').set(user.auth).send({ huntId: theirs.id, rows: [{ ...row, points: 99 }] });
    const badDate = await request(api.app).post('/api/import/rows').set(user.auth).send({ huntId: theirs.id, rows: [{ ...row, date: 'yesterday' }] });
    const notMine = await request(api.app).post('/api/import/rows').set(user.auth).send({ huntId: theirs.id, rows: [row] });
    const missing = await request(api.app).post('/api/import/rows').set(user.auth).send({ huntId: missingId(), rows: [row] });

    expect(noRows.status).toBe(400);
    expect(noRows.body.error.fields).toHaveProperty('rows');
    expect(tooMany.status).toBe(400);
    expect(extra.status).toBe(400);
    expect(badDate.status).toBe(400);
    expect(badDate.body.error.fields).toHaveProperty(['rows.0.date']);
    expect(notMine.status).toBe(404);
    expect(missing.status).toBe(404);
    expect((await request(api.app).post('/api/import/rows').send({ huntId: theirs.id, rows: [row] })).status).toBe(401);
  });
});
