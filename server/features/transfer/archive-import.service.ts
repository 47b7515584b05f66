import { randomUUID } from 'node:crypto';
import type { DataSource, EntityManager } from 'typeorm';
import {
  ARCHIVE_LIMITS,
  type ArchiveHunt,
  type ArchiveImportResult,
  type ArchiveKeeper,
  type ArchiveLimits,
  type ArchiveNote,
  type ArchiveProgressLine,
  type ArchiveWatchPattern,
  type ArchiveWeightTable,
} from '../../../shared/contracts/archive';
import { parseSerial, parseWatchPattern, watchText, type PatternId } from '../../../shared/engine';
import { checkStoredImage } from '../../lib/image';
import { logger } from '../../lib/logger';
import type { ObjectStore } from '../../lib/object-store';
import { maskOf } from '../../lib/patterns';
import { userPrefix } from '../photos/photos.service';
import { badArchive, type ProblemView } from './archive/archive-problem';
import { checkArchive, emptyCounts, type ArchiveCounts } from './archive/archive-check';
import { readArchive, type PhotoFile } from './archive/archive-reader';
import { derivedId, resolveHunts, resolveOwned, type ResolvedHunt } from './archive/id-resolution';

/** Records written per transaction: a failure part-way loses at most one part, and a rerun fills it in. */
const NOTE_PART = 1000;
const KEEPER_PART = 500;
const HUNT_PART = 100;

export type Progress = Extract<ArchiveProgressLine, { phase: string }>;

export interface RestoreOptions {
  preview: boolean;
  onProgress?: (progress: Progress) => void | Promise<void>;
}

const parsed = (serial: string) => {
  const result = parseSerial(serial);
  if (!result.ok) throw new Error(`checked serial no longer parses: ${serial}`);
  return result;
};

/**
 * Restores an archive into the signed-in account. The upload is read three times from disk: a check
 * (the whole archive against the contract; nothing is written unless it passes), the records from
 * strapsift.json, then the photos. Each part is one transaction; photo bytes go to the object store
 * before their row and are deleted again if the row fails. Every insert skips what is already there,
 * so running a restore twice adds nothing the second time.
 */
export class ArchiveImportService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly store: ObjectStore,
    private readonly limits: ArchiveLimits = ARCHIVE_LIMITS,
  ) {}

  /** Checks the archive and answers what a restore would add; throws the 400 when it is not fit to restore. */
  async check(userId: string, path: string): Promise<ArchiveImportResult> {
    const { result } = await checkArchive(this.dataSource, userId, path, this.limits);
    return { preview: true, ...result };
  }

  async restore(userId: string, path: string, options: RestoreOptions): Promise<ArchiveImportResult> {
    const checked = await this.check(userId, path);
    if (options.preview) return checked;
    return this.apply(userId, path, checked, options.onProgress);
  }

  /** Writes an archive `check` passed; refuses one with problems. */
  async apply(userId: string, path: string, checked: ArchiveImportResult, onProgress?: RestoreOptions['onProgress']): Promise<ArchiveImportResult> {
    if (checked.problems.length) throw badArchive(checked.problems);
    const counts = emptyCounts();
    for (const key of Object.keys(counts) as Array<keyof ArchiveCounts>) counts[key].inArchive = checked.counts[key].inArchive;
    const progress = onProgress ?? (() => undefined);
    await this.applyRecords(userId, path, counts, progress);
    if (checked.counts.photos.add > 0) await this.applyPhotos(userId, path, counts, progress);
    for (const kind of Object.values(counts)) kind.present = kind.inArchive - kind.add;
    return { ...checked, preview: false, counts };
  }

  private async applyRecords(userId: string, path: string, counts: ArchiveCounts, progress: (p: Progress) => void | Promise<void>): Promise<void> {
    const hunts = new Map<string, ResolvedHunt>();
    let tables: ArchiveWeightTable[] = [];
    let watch: ArchiveWatchPattern[] = [];
    const problems: ProblemView[] = [];
    /** Records gathered into parts of `size`; each part is written in one transaction, then reported. */
    const parts = <T>(size: number, phase: 'hunts' | 'notes' | 'keepers', insert: (manager: EntityManager, part: T[]) => Promise<number>) => {
      let part: T[] = [];
      let done = 0;
      const flush = async () => {
        if (part.length === 0) return;
        const taken = part;
        part = [];
        counts[phase].add += await this.dataSource.transaction((manager) => insert(manager, taken));
        done += taken.length;
        await progress({ phase, done, total: counts[phase].inArchive });
      };
      return {
        flush,
        add: async (item: T) => {
          part.push(item);
          if (part.length >= size) await flush();
        },
      };
    };
    const huntParts = parts<ArchiveHunt>(HUNT_PART, 'hunts', (manager, part) => this.insertHunts(manager, userId, part, hunts));
    const noteParts = parts<ArchiveNote>(NOTE_PART, 'notes', (manager, part) => this.insertNotes(manager, userId, part, hunts));
    const keeperParts = parts<ArchiveKeeper>(KEEPER_PART, 'keepers', (manager, part) => this.insertKeepers(manager, userId, part, hunts));

    await readArchive(
      path,
      this.limits,
      {
        account: async (account) => {
          await this.dataSource.query(`UPDATE users SET display_name = $2, updated_at = now() WHERE id = $1 AND display_name <> $2`, [
            userId,
            account.displayName,
          ]);
        },
        weightTable: (table) => void tables.push(table),
        watchPattern: (pattern) => void watch.push(pattern),
        hunt: huntParts.add,
        note: noteParts.add,
        keeper: keeperParts.add,
        sectionEnd: async (section) => {
          if (section === 'weightTables') {
            const part = tables;
            tables = [];
            counts.weightTables.add += await this.dataSource.transaction((manager) => this.insertWeightTables(manager, userId, part));
            await progress({ phase: 'settings', done: part.length, total: part.length });
          } else if (section === 'watchPatterns') {
            const part = watch;
            watch = [];
            counts.watchPatterns.add += await this.dataSource.transaction((manager) => this.insertWatch(manager, userId, part));
          } else if (section === 'hunts') await huntParts.flush();
          else if (section === 'notes') await noteParts.flush();
          else if (section === 'keepers') await keeperParts.flush();
        },
      },
      problems,
    );
    // The check passed, so a problem now means the file changed under us; what was written stays valid.
    if (problems.length) throw badArchive(problems);
  }

  private async insertWeightTables(manager: EntityManager, userId: string, tables: ArchiveWeightTable[]): Promise<number> {
    let added = 0;
    for (const table of tables) {
      const rows: unknown[] = await manager.query(
        `INSERT INTO weight_tables (user_id, name, active, weights) VALUES ($1, $2, false, $3::jsonb) ON CONFLICT DO NOTHING RETURNING id`,
        [userId, table.name, JSON.stringify(table.weights)],
      );
      added += rows.length;
    }
    // The archive's active table becomes active again: two steps, because only one may be active at a time.
    const active = tables.find((table) => table.active);
    if (active) {
      await manager.query(`UPDATE weight_tables SET active = false WHERE user_id = $1 AND active AND name <> $2`, [userId, active.name]);
      await manager.query(`UPDATE weight_tables SET active = true WHERE user_id = $1 AND name = $2 AND NOT active`, [userId, active.name]);
    }
    return added;
  }

  private async insertWatch(manager: EntityManager, userId: string, patterns: ArchiveWatchPattern[]): Promise<number> {
    let added = 0;
    for (const item of patterns) {
      const result = parseWatchPattern(item.text);
      if (!result.ok) continue;
      const rows: unknown[] = await manager.query(
        `INSERT INTO watch_patterns (user_id, text, label, pattern, created_at) VALUES ($1, $2, $3, $4::jsonb, $5) ON CONFLICT DO NOTHING RETURNING id`,
        [userId, watchText(result.pattern), item.label, JSON.stringify(result.pattern), item.createdAt],
      );
      added += rows.length;
    }
    return added;
  }

  private async insertHunts(manager: EntityManager, userId: string, part: ArchiveHunt[], hunts: Map<string, ResolvedHunt>): Promise<number> {
    const resolved = await resolveHunts(manager, userId, part);
    let added = 0;
    for (const hunt of part) {
      const target = resolved.get(hunt.id)!;
      hunts.set(hunt.id, target);
      if (target.present) continue;
      await manager.query(
        `INSERT INTO hunts (id, owner_id, title, source, denomination, planned_straps, status, started_at, closed_at, in_sequence, series)
         VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10, $11)`,
        [target.id, userId, hunt.title, hunt.source, hunt.denomination, hunt.plannedStraps, hunt.status, hunt.startedAt, hunt.closedAt, hunt.inSequence, hunt.series],
      );
      await manager.query(`INSERT INTO hunt_members (hunt_id, user_id, role, joined_at) VALUES ($1, $2, 'owner', $3)`, [target.id, userId, hunt.startedAt]);
      if (hunt.straps.length) {
        await manager.query(
          `INSERT INTO straps (hunt_id, number, swapped_in, short_over, note)
           SELECT $1, t.number, t.swapped_in, t.short_over, t.note FROM unnest($2::int[], $3::int[], $4::int[], $5::varchar[]) AS t(number, swapped_in, short_over, note)
           ON CONFLICT DO NOTHING`,
          [target.id, hunt.straps.map((s) => s.number), hunt.straps.map((s) => s.swappedIn), hunt.straps.map((s) => s.shortOver), hunt.straps.map((s) => s.note)],
        );
      }
      added += 1;
    }
    return added;
  }

  private async insertNotes(manager: EntityManager, userId: string, notes: ArchiveNote[], hunts: Map<string, ResolvedHunt>): Promise<number> {
    const resolved = await resolveOwned(manager, 'scans', userId, notes.map((note) => note.id));
    const fresh = notes.filter((note) => !resolved.get(note.id)!.present && hunts.has(note.huntId));
    if (fresh.length === 0) return 0;
    const serials = fresh.map((note) => parsed(note.serial));
    const column = <T>(pick: (note: ArchiveNote, i: number) => T) => fresh.map(pick);
    const rows: unknown[] = await manager.query(
      `INSERT INTO scans (id, hunt_id, user_id, strap, serial, digits, value, prefix, suffix, star, district, pulled, pattern_mask, points, keep,
                          scanned_at, entry_method, camera_confidence, star_run_size)
       SELECT t.id, t.hunt_id, $1::uuid, t.strap, t.serial, t.digits, t.value, t.prefix, t.suffix, t.star, t.district, t.pulled, t.pattern_mask,
              t.points, t.keep, t.scanned_at, t.entry_method, t.camera_confidence, t.star_run_size
         FROM unnest($2::uuid[], $3::uuid[], $4::int[], $5::varchar[], $6::varchar[], $7::int[], $8::varchar[], $9::varchar[], $10::bool[],
                     $11::varchar[], $12::bool[], $13::int[], $14::float8[], $15::bool[], $16::timestamptz[], $17::varchar[], $18::real[], $19::int[])
           AS t(id, hunt_id, strap, serial, digits, value, prefix, suffix, star, district, pulled, pattern_mask, points, keep, scanned_at,
                entry_method, camera_confidence, star_run_size)
        -- As with uploads: no note logged after the close goes into someone else's closed hunt.
        WHERE NOT EXISTS (SELECT 1 FROM hunts h WHERE h.id = t.hunt_id AND h.owner_id <> $1 AND h.status = 'closed' AND h.closed_at < t.scanned_at)
       ON CONFLICT (id) DO NOTHING
       RETURNING id`,
      [
        userId,
        column((note) => resolved.get(note.id)!.id),
        column((note) => hunts.get(note.huntId)!.id),
        column((note) => note.strap),
        column((note) => note.serial),
        column((_, i) => serials[i]!.digits),
        column((_, i) => serials[i]!.value),
        column((_, i) => serials[i]!.prefix),
        column((_, i) => serials[i]!.suffix),
        column((note) => note.star),
        column((_, i) => serials[i]!.district),
        column((note) => note.pulled),
        column((note) => maskOf(note.patterns as PatternId[])),
        column((note) => note.points),
        column((note) => note.keep),
        column((note) => note.scannedAt),
        column((note) => note.entryMethod),
        column((note) => note.cameraConfidence),
        column((note) => note.starRunSize),
      ],
    );
    return rows.length;
  }

  private async insertKeepers(manager: EntityManager, userId: string, keepers: ArchiveKeeper[], hunts: Map<string, ResolvedHunt>): Promise<number> {
    const resolved = await resolveOwned(manager, 'keepers', userId, keepers.map((keeper) => keeper.id));
    const fresh = keepers.filter((keeper) => !resolved.get(keeper.id)!.present);
    if (fresh.length === 0) return 0;
    // A keeper points at its note wherever that note landed in this account (its own id or the derived one).
    const scanIds = fresh.flatMap((keeper) => (keeper.scanId ? [keeper.scanId, derivedId(userId, keeper.scanId)] : []));
    const mine = new Set(
      ((await manager.query(`SELECT id FROM scans WHERE user_id = $1 AND id = ANY($2::uuid[])`, [userId, scanIds])) as Array<{ id: string }>).map((row) => row.id),
    );
    const scanOf = (keeper: ArchiveKeeper) =>
      !keeper.scanId ? null : mine.has(keeper.scanId) ? keeper.scanId : mine.has(derivedId(userId, keeper.scanId)) ? derivedId(userId, keeper.scanId) : null;
    const serials = fresh.map((keeper) => parsed(keeper.serial));
    const column = <T>(pick: (keeper: ArchiveKeeper, i: number) => T) => fresh.map(pick);
    const rows: unknown[] = await manager.query(
      `INSERT INTO keepers (id, user_id, scan_id, hunt_id, serial, digits, prefix, suffix, star, series, district, facility, denomination, grade,
                            estimated_value_cents, status, notes, original_paper, star_run_size, pattern_mask, points, found_at, created_at, updated_at)
       SELECT t.id, $1::uuid, t.scan_id, t.hunt_id, t.serial, t.digits, t.prefix, t.suffix, t.star, t.series, t.district, t.facility, t.denomination,
              t.grade, t.estimated_value_cents, t.status, t.notes, t.original_paper, t.star_run_size, t.pattern_mask, t.points, t.found_at,
              t.created_at, t.updated_at
         FROM unnest($2::uuid[], $3::uuid[], $4::uuid[], $5::varchar[], $6::varchar[], $7::varchar[], $8::varchar[], $9::bool[], $10::varchar[],
                     $11::varchar[], $12::varchar[], $13::int[], $14::smallint[], $15::int[], $16::varchar[], $17::text[], $18::bool[], $19::int[],
                     $20::int[], $21::float8[], $22::timestamptz[], $23::timestamptz[], $24::timestamptz[])
           AS t(id, scan_id, hunt_id, serial, digits, prefix, suffix, star, series, district, facility, denomination, grade, estimated_value_cents,
                status, notes, original_paper, star_run_size, pattern_mask, points, found_at, created_at, updated_at)
       ON CONFLICT DO NOTHING
       RETURNING id`,
      [
        userId,
        column((keeper) => resolved.get(keeper.id)!.id),
        column(scanOf),
        column((keeper) => (keeper.huntId ? (hunts.get(keeper.huntId)?.id ?? null) : null)),
        column((keeper) => keeper.serial),
        column((_, i) => serials[i]!.digits),
        column((_, i) => serials[i]!.prefix),
        column((_, i) => serials[i]!.suffix),
        column((keeper) => keeper.star),
        column((keeper) => keeper.series),
        column((keeper) => keeper.district),
        column((keeper) => keeper.facility),
        column((keeper) => keeper.denomination),
        column((keeper) => keeper.grade),
        column((keeper) => keeper.estimatedValueCents),
        column((keeper) => keeper.status),
        column((keeper) => keeper.notes),
        column((keeper) => keeper.originalPaper),
        column((keeper) => keeper.starRunSize),
        column((keeper) => maskOf(keeper.patterns as PatternId[])),
        column((keeper) => keeper.points),
        column((keeper) => keeper.foundAt),
        column((keeper) => keeper.createdAt),
        column((keeper) => keeper.updatedAt),
      ],
    );
    return rows.length;
  }

  private async applyPhotos(userId: string, path: string, counts: ArchiveCounts, progress: (p: Progress) => void | Promise<void>): Promise<void> {
    let done = 0;
    const problems: ProblemView[] = [];
    await readArchive(
      path,
      this.limits,
      {
        photoFile: async (file) => {
          if (await this.insertPhoto(userId, file)) counts.photos.add += 1;
          done += 1;
          await progress({ phase: 'photos', done, total: counts.photos.inArchive });
        },
      },
      problems,
    );
  }

  /**
   * One photo: bytes and thumbnail into the object store under the importer's prefix, then the row in its
   * own transaction; if the row cannot be written the objects are deleted again.
   */
  private async insertPhoto(userId: string, file: PhotoFile): Promise<boolean> {
    const keeper = (await resolveOwned(this.dataSource.manager, 'keepers', userId, [file.keeperId])).get(file.keeperId)!;
    if (!keeper.present) return false;
    const taken: unknown[] = await this.dataSource.query(`SELECT 1 FROM photos WHERE keeper_id = $1 AND side = $2`, [keeper.id, file.side]);
    if (taken.length) return false;
    const image = await checkStoredImage(file.bytes);
    if (!image) throw badArchive([{ where: file.name, message: 'is not an image that can be read' }]);
    const id = randomUUID();
    const folder = `${userPrefix(userId)}keepers/${keeper.id}/`;
    const objectKey = `${folder}${id}.${file.extension}`;
    const thumbKey = `${folder}${id}-thumb.jpg`;
    try {
      await this.store.put(objectKey, file.bytes, image.contentType);
      await this.store.put(thumbKey, image.thumb, 'image/jpeg');
      const rows: unknown[] = await this.dataSource.transaction((manager) =>
        manager.query(
          `INSERT INTO photos (id, keeper_id, user_id, side, content_type, byte_size, width, height, object_key, thumb_key)
           VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10) ON CONFLICT DO NOTHING RETURNING id`,
          [id, keeper.id, userId, file.side, image.contentType, file.bytes.length, image.width, image.height, objectKey, thumbKey],
        ),
      );
      if (rows.length === 0) {
        await this.store.delete([objectKey, thumbKey]);
        return false;
      }
      return true;
    } catch (error) {
      await this.store.delete([objectKey, thumbKey]).catch((cleanup: unknown) => logger.warn({ err: cleanup, objectKey }, 'restored photo objects left behind'));
      throw error;
    }
  }
}
