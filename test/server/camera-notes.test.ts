import Papa from 'papaparse';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { IMPORT_CHUNK_ROWS, importRowsResponse, type ImportRow } from '../../shared/contracts/transfer';
import { checkLog, guessMapping, readLogCsv } from '../../shared/transfer/import-log';
import { createHunt, openTestApi, postBatch, registerUser, scanOf, type TestApi, type TestUser } from '../support/api';

let api: TestApi;
let user: TestUser;

beforeAll(async () => {
  api = await openTestApi();
  user = await registerUser(api.app, 'camera-notes');
});
afterAll(async () => {
  await api.close();
});

// supertest collects text/csv bodies as text.
const download = async (path: string, who: TestUser): Promise<string> => (await request(api.app).get(path).set(who.auth).expect(200)).text;

const csvRows = (text: string) => Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true }).data;

describe('notes entered by camera', () => {
  it('when a hunt has typed and camera notes, then its tally counts each way', async () => {
    const hunt = await createHunt(api.app, user);
    await postBatch(api.app, user, [
      scanOf(hunt.id, 'MB 12345678 C', { entryMethod: 'camera', cameraConfidence: 0.93 }),
      scanOf(hunt.id, 'MB 12345679 C', { entryMethod: 'camera', cameraConfidence: 0.71 }),
      scanOf(hunt.id, '48205731'),
    ]);
    const tally = await request(api.app).get(`/api/hunts/${hunt.id}/tally`).set(user.auth).expect(200);
    expect(tally.body.notes).toBe(3);
    expect(tally.body.entered).toEqual({ keypad: 1, camera: 2 });
  });

  it('when scans are exported and the file imported into another account, then entry method and confidence come back', async () => {
    const hunt = await createHunt(api.app, user, { title: 'Camera export' });
    await postBatch(api.app, user, [
      scanOf(hunt.id, 'GB 92083492 F', { entryMethod: 'camera', cameraConfidence: 0.875 }),
      scanOf(hunt.id, '31415926', { strap: 2 }),
    ]);
    const exported = csvRows(await download('/api/export/scans.csv', user)).filter((row) => row.hunt === 'Camera export');
    expect(exported.map((row) => [row.digits, row.entry_method, row.camera_confidence]).sort()).toEqual([
      ['31415926', 'keypad', ''],
      ['92083492', 'camera', '0.875'],
    ]);

    const other = await registerUser(api.app, 'camera-import');
    const target = await createHunt(api.app, other);
    const text = Papa.unparse(exported);
    const file = readLogCsv(text);
    const checked = checkLog(file.rows, guessMapping(file.headers));
    expect(checked.every((row) => row.ok)).toBe(true);
    const rows = checked.map((row) => row.row as ImportRow);
    const response = await request(api.app).post('/api/import/rows').set(other.auth).send({ huntId: target.id, rows: rows.slice(0, IMPORT_CHUNK_ROWS) }).expect(200);
    expect(importRowsResponse.parse(response.body).stored).toBe(2);
    const again = csvRows(await download('/api/export/scans.csv', other));
    expect(again.map((row) => [row.digits, row.entry_method, row.camera_confidence]).sort()).toEqual([
      ['31415926', 'keypad', ''],
      ['92083492', 'camera', '0.875'],
    ]);
  });

  it('when an imported row has a confidence that is not 0–1 or an unknown method, then the row says why', () => {
    const checked = checkLog(
      [
        ['12345678', 'camera', '1.5'],
        ['12345679', 'scanner', ''],
      ],
      guessMapping(['serial', 'entry_method', 'camera_confidence']),
    );
    expect(checked[0]!.problems).toEqual(['camera confidence: “1.5” is not a number from 0 to 1']);
    expect(checked[1]!.problems).toEqual(['entry method: “scanner” is not keypad or camera']);
  });
});
