import type { DataSource } from 'typeorm';
import { DEFAULT_WEIGHTS, parseWatchPattern, watchText } from '../../../shared/engine';
import type { WeightTable } from '../../../shared/engine';
import type { ScanInput } from '../../../shared/contracts/scans';
import type { WeightTableValues } from '../../../shared/contracts/weights';
import { hashPassword } from '../../features/auth/passwords';
import { InMemoryResetOutbox } from '../../features/auth/reset-mailer';
import { drawDemoNote } from './demo-photos';
import { storedReading } from '../../features/scans/scan-reading';
import { UserEntity, type UserRole } from '../../features/users/user.entity';
import { createServices } from '../../services';
import { DEMO_ADMIN, DEMO_COLLECTOR, DEMO_CREW } from './demo-accounts';
import { DEMO_HUNTS, DEMO_TYPED_KEEPERS, circulatedSerial, demoId, prng, sequentialSerial, type DemoHunt } from './demo-data';

async function ensureUser(dataSource: DataSource, account: { email: string; password: string; displayName: string }, role: UserRole): Promise<{ user: UserEntity; created: boolean }> {
  const users = dataSource.getRepository(UserEntity);
  const existing = await users.findOne({ where: { email: account.email } });
  if (existing) return { user: existing, created: false };
  const user = await users.save(
    users.create({ email: account.email, displayName: account.displayName, passwordHash: await hashPassword(account.password), role }),
  );
  return { user, created: true };
}

/** The collector's own table: radars count for more and trinaries for nothing. */
export const DEMO_WEIGHTS: WeightTable = {
  ...(JSON.parse(JSON.stringify(DEFAULT_WEIGHTS)) as WeightTable),
  patterns: { ...DEFAULT_WEIGHTS.patterns, radar: 6, trinary: 0 },
  keepThreshold: 5,
};

const DEMO_WATCH = [
  { pattern: 'date:1987-04-19', label: 'Wren’s birthday' },
  { pattern: '2026????', label: 'This year' },
];

const SECONDS_PER_NOTE = 4;

interface PlannedScan {
  scan: ScanInput;
  byCrew: boolean;
  find: boolean;
}

/** Every note of a demo hunt, in the order it was sifted; the same on every run. */
function planScans(hunt: DemoHunt): PlannedScan[] {
  const random = prng(hunt.seed);
  const planned: PlannedScan[] = [];
  const start = Date.parse(hunt.startedAt);
  const straps = hunt.searchedStraps + (hunt.partial ? 1 : 0);
  for (let strap = 1; strap <= straps; strap++) {
    const notes = strap <= hunt.searchedStraps ? 100 : hunt.partial!;
    for (let at = 0; at < notes; at++) {
      const index = (strap - 1) * 100 + at;
      const find = hunt.finds.find((f) => f.strap === strap && f.at === at);
      const serial = find
        ? find.serial
        : hunt.sequentialFrom !== undefined
          ? sequentialSerial(hunt.denomination, hunt.sequentialFrom + index)
          : circulatedSerial(random, hunt.denomination);
      planned.push({
        scan: {
          id: demoId(`${hunt.key}:scan:${index}`),
          huntId: demoId(hunt.key),
          strap,
          serial,
          star: serial.endsWith('*'),
          pulled: false,
          scannedAt: new Date(start + index * SECONDS_PER_NOTE * 1000).toISOString(),
        },
        byCrew: hunt.crewStraps?.includes(strap) ?? false,
        find: Boolean(find),
      });
    }
  }
  return planned;
}

/**
 * Fills the database with a lived-in demo: a fictional collector with hunts from a fictional credit
 * union, strap sheets, a few thousand scans, keepers, a weight table and watch patterns; a crew member;
 * an admin. Idempotent: rows have fixed ids or are looked up first and every insert skips what exists,
 * so a second run changes nothing (and never undoes what a user changed).
 */
export async function seedDemo(dataSource: DataSource): Promise<{ created: string[] }> {
  const created: string[] = [];
  const collector = await ensureUser(dataSource, DEMO_COLLECTOR, 'collector');
  if (collector.created) created.push(`collector ${DEMO_COLLECTOR.email}`);
  const admin = await ensureUser(dataSource, DEMO_ADMIN, 'admin');
  if (admin.created) created.push(`admin ${DEMO_ADMIN.email}`);
  const crew = await ensureUser(dataSource, DEMO_CREW, 'collector');
  if (crew.created) created.push(`crew ${DEMO_CREW.email}`);

  const services = createServices(dataSource, { resetMailer: new InMemoryResetOutbox() });
  const me = collector.user.id;
  for (const user of [me, crew.user.id, admin.user.id]) await services.weights.ensureDefault(user);

  const tables: Array<{ id: string }> = await dataSource.query(`SELECT id FROM weight_tables WHERE user_id = $1 AND name = $2`, [me, 'Weekend sifting']);
  if (tables.length === 0) {
    await services.weights.create(me, { name: 'Weekend sifting', weights: DEMO_WEIGHTS as WeightTableValues, activate: true });
    created.push('weight table');
  }
  for (const watch of DEMO_WATCH) {
    const parsed = parseWatchPattern(watch.pattern);
    if (!parsed.ok) throw new Error(`demo watch pattern ${watch.pattern}: ${parsed.error.message}`);
    const inserted: unknown[] = await dataSource.query(
      `INSERT INTO watch_patterns (user_id, text, label, pattern)
       SELECT $1::uuid, $2::varchar, $3::varchar, $4::jsonb WHERE NOT EXISTS (SELECT 1 FROM watch_patterns WHERE user_id = $1 AND text = $2)
       RETURNING id`,
      [me, watchText(parsed.pattern), watch.label, JSON.stringify(parsed.pattern)],
    );
    if (inserted.length) created.push(`watch ${watch.pattern}`);
  }

  let scansStored = 0;
  for (const hunt of DEMO_HUNTS) {
    const huntId = demoId(hunt.key);
    const plan = planScans(hunt);
    const lastScan = plan[plan.length - 1]!.scan.scannedAt;
    const inserted: unknown[] = await dataSource.query(
      `INSERT INTO hunts (id, owner_id, title, source, denomination, planned_straps, in_sequence, status, started_at)
       VALUES ($1, $2, $3, $4, $5, $6, $7, 'open', $8) ON CONFLICT (id) DO NOTHING RETURNING id`,
      [huntId, me, hunt.title, hunt.source, hunt.denomination, hunt.plannedStraps, hunt.sequentialFrom !== undefined, hunt.startedAt],
    );
    if (inserted.length) created.push(`hunt "${hunt.title}"`);
    await dataSource.query(`INSERT INTO hunt_members (hunt_id, user_id, role, joined_at) VALUES ($1, $2, 'owner', $3) ON CONFLICT DO NOTHING`, [
      huntId,
      me,
      hunt.startedAt,
    ]);
    if (hunt.crewStraps?.length) {
      await dataSource.query(`INSERT INTO hunt_members (hunt_id, user_id, role, joined_at) VALUES ($1, $2, 'crew', $3) ON CONFLICT DO NOTHING`, [
        huntId,
        crew.user.id,
        hunt.startedAt,
      ]);
    }
    if (!inserted.length) continue;

    // The hunter pulls what their own table says to keep, and the finds they meant to keep anyway.
    const mine = plan.filter((p) => !p.byCrew).map((p) => p.scan);
    const theirs = plan.filter((p) => p.byCrew).map((p) => p.scan);
    const contextMine = await services.weights.readingContext(me);
    const contextCrew = await services.weights.readingContext(crew.user.id);
    for (const item of plan) {
      const result = storedReading(item.scan.serial, item.byCrew ? contextCrew : contextMine, { star: item.scan.star });
      item.scan.pulled = item.find || (result.ok && result.reading.keep);
    }
    for (const [user, scans] of [
      [me, mine],
      [crew.user.id, theirs],
    ] as const) {
      for (let i = 0; i < scans.length; i += 1000) {
        const answer = await services.scans.storeBatch(user, scans.slice(i, i + 1000));
        if (answer.rejected.length) throw new Error(`demo scans rejected: ${JSON.stringify(answer.rejected.slice(0, 3))}`);
        scansStored += answer.stored.length;
      }
    }

    const pulledByStrap = new Map<number, number>();
    for (const item of plan) if (item.scan.pulled) pulledByStrap.set(item.scan.strap, (pulledByStrap.get(item.scan.strap) ?? 0) + 1);
    const strapNumbers = new Set([...pulledByStrap.keys(), ...hunt.straps.map((s) => s.strap)]);
    for (const number of strapNumbers) {
      const entry = hunt.straps.find((s) => s.strap === number);
      const swapped = hunt.unswapped?.includes(number) ? 0 : (pulledByStrap.get(number) ?? 0);
      await dataSource.query(
        `INSERT INTO straps (hunt_id, number, swapped_in, short_over, note) VALUES ($1, $2, $3, $4, $5) ON CONFLICT DO NOTHING`,
        [huntId, number, swapped, entry?.shortOver ?? 0, entry?.note ?? null],
      );
    }

    for (const find of hunt.finds) {
      if (!find.keeper) continue;
      const item = plan.find((p) => p.scan.strap === find.strap && p.scan.serial === find.serial)!;
      await services.keepers.create(me, { scanId: item.scan.id, ...find.keeper });
    }

    if (hunt.closed) {
      const closedAt = new Date(Date.parse(lastScan) + 20 * 60 * 1000);
      await dataSource.query(`UPDATE hunts SET status = 'closed', closed_at = $2 WHERE id = $1`, [huntId, closedAt]);
    }
  }
  if (scansStored) created.push(`${scansStored} scans`);

  for (const keeper of DEMO_TYPED_KEEPERS) {
    const digits = keeper.serial.replace(/\D/g, '');
    const exists: unknown[] = await dataSource.query(`SELECT 1 FROM keepers WHERE user_id = $1 AND digits = $2`, [me, digits]);
    if (exists.length) continue;
    await services.keepers.create(me, keeper);
    created.push(`keeper ${keeper.serial}`);
  }

  // Photos for the three best keepers, drawn here; they go to the object store like any upload.
  const best: Array<{ id: string; digits: string }> = await dataSource.query(
    `SELECT k.id, k.digits FROM keepers k WHERE k.user_id = $1 ORDER BY k.points DESC, k.digits LIMIT 3`,
    [me],
  );
  try {
    for (const keeper of best) {
      const sides: Array<{ side: 'front' | 'back' }> = await dataSource.query(`SELECT side FROM photos WHERE keeper_id = $1`, [keeper.id]);
      for (const side of ['front', 'back'] as const) {
        if (sides.some((row) => row.side === side)) continue;
        await services.photos.upload(me, keeper.id, side, drawDemoNote(keeper.digits, side));
        created.push(`${side} photo of ${keeper.digits}`);
      }
    }
  } catch (error) {
    // Without the object store (scripts/fakes.ts) the rest of the demo still stands; photos come next run.
    console.error(`demo photos skipped: the object store did not answer (${(error as Error).message})`);
  }
  return { created };
}
