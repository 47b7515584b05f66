import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { classify, parseSerial, read } from '../../shared/engine';
import type { PatternId } from '../../shared/engine';
import { adminUserPage } from '../../shared/contracts/admin';
import { authResponse } from '../../shared/contracts/auth';
import { huntList } from '../../shared/contracts/hunts';
import { keeperList } from '../../shared/contracts/keepers';
import { strapSheet } from '../../shared/contracts/straps';
import { DEMO_ADMIN, DEMO_COLLECTOR, DEMO_CREW } from '../../server/db/seed/demo-accounts';
import { DEMO_HUNTS, demoId } from '../../server/db/seed/demo-data';
import { seedDemo } from '../../server/db/seed/demo-seed';
import { config } from '../../server/config';
import { createObjectStore } from '../../server/lib/object-store';
import sharp from 'sharp';
import { openScratchApi, type TestApi } from '../support/api';

let api: TestApi;

// A database of its own: the seed's second run is judged by every row of every table, which other
// test files change while this one runs.
beforeAll(async () => {
  api = await openScratchApi('demo_seed');
});
afterAll(async () => {
  await api.close();
});

async function tableCounts(): Promise<Record<string, number>> {
  const tables: Array<{ table_name: string }> = await api.dataSource.query(
    "SELECT table_name FROM information_schema.tables WHERE table_schema = 'public' ORDER BY table_name",
  );
  const counts: Record<string, number> = {};
  for (const { table_name } of tables) counts[table_name] = (await api.dataSource.query(`SELECT count(*)::int AS n FROM "${table_name}"`))[0].n;
  return counts;
}

async function signIn(account: { email: string; password: string }) {
  const response = await request(api.app).post('/api/auth/login').send(account);
  return { Authorization: `Bearer ${authResponse.parse(response.body).token}` };
}

describe('the demo seed', () => {
  it('when run twice, then the second run reports nothing and changes no row in any table', async () => {
    const first = await seedDemo(api.dataSource);
    const afterFirst = await tableCounts();

    const second = await seedDemo(api.dataSource);

    expect(first.created.length).toBeGreaterThan(5);
    expect(second.created).toEqual([]);
    expect(await tableCounts()).toEqual(afterFirst);
  });

  it('when seeded, then the three best keepers have drawn front and back photos in the object store', async () => {
    await seedDemo(api.dataSource);
    const [demo] = await api.dataSource.query('SELECT id FROM users WHERE email = $1', [DEMO_COLLECTOR.email]);
    const rows: Array<{ keeper_id: string; object_key: string }> = await api.dataSource.query(
      'SELECT keeper_id, object_key FROM photos WHERE user_id = $1 ORDER BY keeper_id, side',
      [demo.id],
    );

    expect(rows).toHaveLength(6);
    expect(new Set(rows.map((row) => row.keeper_id)).size).toBe(3);
    const object = await createObjectStore(config()).get(rows[0]!.object_key);
    expect(object?.contentType).toBe('image/png');
    expect((await sharp(object!.body).metadata()).width).toBe(940);
  });

  it('when the collector signs in, then they find several hunts from the credit union with a few thousand notes, open and closed', async () => {
    await seedDemo(api.dataSource);
    const auth = await signIn(DEMO_COLLECTOR);

    const hunts = huntList.parse((await request(api.app).get('/api/hunts').set(auth)).body).items;

    expect(hunts.length).toBe(DEMO_HUNTS.length);
    expect(hunts.every((h) => h.source.startsWith('Larkspur Valley Credit Union'))).toBe(true);
    expect(hunts.reduce((sum, h) => sum + h.notesSearched, 0)).toBeGreaterThan(2000);
    expect(new Set(hunts.map((h) => h.status))).toEqual(new Set(['open', 'closed']));
    expect(hunts.find((h) => h.memberCount > 1)).toBeDefined();
    const sheet = strapSheet.parse((await request(api.app).get(`/api/hunts/${hunts[0]!.id}/straps`).set(auth)).body);
    expect(sheet.straps.some((s) => s.searched > 0)).toBe(true);
  });

  it('when the invented finds are read by the engine, then each has the pattern it was chosen for', () => {
    const intended: Record<string, PatternId[]> = {
      B27311372E: ['radar'],
      '61199119': ['trinary'],
      '33030303': ['binary'],
      L46464646A: ['repeater', 'super-repeater', 'binary'],
      '00000417': ['low'],
      '61600919': ['rotator'],
      '55555155': ['binary'],
      '82288228': ['radar', 'repeater', 'binary'],
      F40177104B: ['radar'],
      'ME40829163*': [],
    };
    const finds = DEMO_HUNTS.flatMap((h) => h.finds.map((f) => f.serial));
    expect(finds.sort()).toEqual(Object.keys(intended).sort());
    for (const [serial, patterns] of Object.entries(intended)) {
      const parsed = parseSerial(serial);
      if (!parsed.ok) throw new Error(`${serial} does not parse`);
      expect(classify(parsed.digits), serial).toEqual(patterns);
    }
    expect(parseSerial('ME40829163*')).toMatchObject({ ok: true, star: true });
  });

  it('when every demo note is read with its hunt’s face value, then none breaks the serial format or passes the run end (TRADE.md; BEP serial numbers)', async () => {
    await seedDemo(api.dataSource);
    const rows: Array<{ serial: string; denomination: number }> = await api.dataSource.query(
      `SELECT s.serial, h.denomination FROM scans s JOIN hunts h ON h.id = s.hunt_id WHERE h.id = ANY($1)`,
      [DEMO_HUNTS.map((h) => demoId(h.key))],
    );
    expect(rows.length).toBeGreaterThan(1000);
    const wrong = new Set(['serial-format', 'series-letter-mismatch', 'run-end', 'suffix-letter', 'star-position']);
    const problems = rows.flatMap((row) => {
      const r = read(row.serial, { denomination: row.denomination });
      return r.ok ? r.trade.filter((n) => wrong.has(n.id)).map((n) => `${row.serial}: ${n.text}`) : [`${row.serial}: unreadable`];
    });
    expect(problems).toEqual([]);
    const keepers: Array<{ serial: string; denomination: number | null; series: string | null }> = await api.dataSource.query(
      `SELECT k.serial, k.denomination, k.series FROM keepers k JOIN users u ON u.id = k.user_id WHERE u.email = $1`,
      [DEMO_COLLECTOR.email],
    );
    expect(keepers.length).toBeGreaterThan(3);
    for (const k of keepers) {
      const r = read(k.serial, { denomination: k.denomination ?? undefined, series: k.series ?? undefined });
      expect(r.ok && r.trade.filter((n) => wrong.has(n.id)).map((n) => n.text), k.serial).toEqual([]);
    }
    const inSequence: Array<{ in_sequence: boolean }> = await api.dataSource.query(`SELECT in_sequence FROM hunts WHERE id = $1`, [
      demoId('hunt:october-twos'),
    ]);
    expect(inSequence[0]!.in_sequence).toBe(true);
  });

  it('when the collector opens keepers, then grades, values and every status appear', async () => {
    await seedDemo(api.dataSource);
    const auth = await signIn(DEMO_COLLECTOR);

    const keepers = keeperList.parse((await request(api.app).get('/api/keepers?limit=100').set(auth)).body).items;

    expect(new Set(keepers.map((k) => k.status))).toEqual(new Set(['kept', 'traded', 'sold', 'spent']));
    expect(keepers.every((k) => k.grade !== null && k.estimatedValueCents !== null)).toBe(true);
    expect(keepers.some((k) => k.huntId === null)).toBe(true);
  });

  it('when the admin opens the console, then the collector and the crew member are listed with their notes', async () => {
    await seedDemo(api.dataSource);
    const auth = await signIn(DEMO_ADMIN);

    const search = async (email: string) =>
      adminUserPage.parse((await request(api.app).get(`/api/admin/users?query=${encodeURIComponent(email)}`).set(auth)).body).items;

    expect((await search(DEMO_COLLECTOR.email)).find((u) => u.email === DEMO_COLLECTOR.email)!.scans).toBeGreaterThan(1000);
    expect((await search(DEMO_CREW.email)).find((u) => u.email === DEMO_CREW.email)!.scans).toBeGreaterThan(0);
  });
});
