import { createHash } from 'node:crypto';
import type { DataSource } from 'typeorm';
import {
  PHOTO_EXTENSION,
  type ArchiveImportResult,
  type ArchiveKeeper,
  type ArchiveKindCounts,
  type ArchiveLimits,
  type ArchiveNote,
  type ArchivePhoto,
} from '../../../../shared/contracts/archive';
import { classify, parseSerial, parseWatchPattern, watchText } from '../../../../shared/engine';
import { checkStoredImage } from '../../../lib/image';
import { MAX_PROBLEMS, type ProblemView } from './archive-problem';
import { readArchive, type PhotoFile } from './archive-reader';
import { resolveHunts, resolveOwned } from './id-resolution';

/** Records resolved against the database per query while checking. */
const BATCH = 1000;

export type ArchiveCounts = ArchiveImportResult['counts'];
const zero = (): ArchiveKindCounts => ({ inArchive: 0, add: 0, present: 0 });
export const emptyCounts = (): ArchiveCounts => ({
  hunts: zero(),
  notes: zero(),
  keepers: zero(),
  photos: zero(),
  weightTables: zero(),
  watchPatterns: zero(),
});

/**
 * The problem with a note's or keeper's serial and claimed patterns, if any. Patterns are kept as they
 * were read when the note was logged (they depend on the weights then), but each must be one the serial
 * really has: the widest low limit (99,999) bounds what any table could have called "low".
 */
export function serialProblem(serial: string, patterns: readonly string[]): string | null {
  const parsed = parseSerial(serial);
  if (!parsed.ok) return `serial: ${parsed.error.message}`;
  const has = new Set<string>(classify(parsed.value, { lowLimit: 99999 }));
  const wrong = patterns.find((id) => !has.has(id));
  return wrong ? `patterns: ${serial} is not a ${wrong}` : null;
}

export interface CheckOutcome {
  result: Omit<ArchiveImportResult, 'preview'>;
}

/**
 * The first pass over an uploaded archive, which writes nothing: every record against the contract,
 * every reference inside the archive, every photo decoded and compared with its checksum, and what a
 * restore would add to this account. A restore goes on only when this finds no problem.
 */
export async function checkArchive(dataSource: DataSource, userId: string, path: string, limits: ArchiveLimits): Promise<CheckOutcome> {
  const problems: ProblemView[] = [];
  const report = (where: string, message: string) => {
    if (problems.length < MAX_PROBLEMS) problems.push({ where, message });
  };
  const counts = emptyCounts();
  const manager = dataSource.manager;
  let exportedAt = new Date(0).toISOString();
  let exportedBy = '';
  let displayName = '';
  const hunts: Array<{ id: string; role: 'owner' | 'crew'; title: string }> = [];
  const huntIds = new Set<string>();
  const keeperIds = new Set<string>();
  const weightNames: string[] = [];
  const watchTexts: string[] = [];
  const photoRecords = new Map<string, ArchivePhoto>();
  const photoFiles = new Map<string, { sha256: string; contentType: string; keeperId: string; side: string }>();
  let notes: string[] = [];
  let keepers: string[] = [];

  const resolveBatch = async (table: 'scans' | 'keepers', ids: string[], kind: ArchiveKindCounts) => {
    if (ids.length === 0) return;
    for (const resolved of (await resolveOwned(manager, table, userId, ids)).values()) {
      if (resolved.present) kind.present += 1;
    }
  };

  await readArchive(
    path,
    limits,
    {
      account(account, at) {
        exportedAt = at;
        exportedBy = account.email;
        displayName = account.displayName;
      },
      weightTable(table) {
        counts.weightTables.inArchive += 1;
        weightNames.push(table.name);
      },
      watchPattern(pattern) {
        counts.watchPatterns.inArchive += 1;
        const parsed = parseWatchPattern(pattern.text);
        if (!parsed.ok) report(`watchPatterns "${pattern.text}"`, parsed.error.message);
        else watchTexts.push(watchText(parsed.pattern));
      },
      hunt(hunt, where) {
        if (huntIds.has(hunt.id)) return report(`${where}.id`, 'appears twice');
        huntIds.add(hunt.id);
        counts.hunts.inArchive += 1;
        hunts.push({ id: hunt.id, role: hunt.role, title: hunt.title });
      },
      async note(note: ArchiveNote, where) {
        counts.notes.inArchive += 1;
        if (!huntIds.has(note.huntId)) report(`${where}.huntId`, 'is not one of the archive’s hunts');
        const problem = serialProblem(note.serial, note.patterns);
        if (problem) report(where, problem);
        notes.push(note.id);
        if (notes.length >= BATCH) {
          await resolveBatch('scans', notes, counts.notes);
          notes = [];
        }
      },
      async keeper(keeper: ArchiveKeeper, where) {
        counts.keepers.inArchive += 1;
        if (keeperIds.has(keeper.id)) report(`${where}.id`, 'appears twice');
        keeperIds.add(keeper.id);
        const problem = serialProblem(keeper.serial, keeper.patterns);
        if (problem) report(where, problem);
        keepers.push(keeper.id);
        if (keepers.length >= BATCH) {
          await resolveBatch('keepers', keepers, counts.keepers);
          keepers = [];
        }
      },
      photo(photo, where) {
        counts.photos.inArchive += 1;
        if (!keeperIds.has(photo.keeperId)) report(`${where}.keeperId`, 'is not one of the archive’s keepers');
        if (photo.file !== `photos/${photo.keeperId}-${photo.side}.${PHOTO_EXTENSION[photo.contentType]}`) {
          report(`${where}.file`, 'does not match its keeper, side and type');
        }
        photoRecords.set(photo.file, photo);
      },
      async photoFile(file: PhotoFile) {
        const checked = await checkStoredImage(file.bytes);
        if (!checked) return report(file.name, 'is not a JPEG, PNG or WebP image that can be read');
        photoFiles.set(file.name, {
          sha256: createHash('sha256').update(file.bytes).digest('hex'),
          contentType: checked.contentType,
          keeperId: file.keeperId,
          side: file.side,
        });
      },
      async sectionEnd(section) {
        if (section === 'notes') await resolveBatch('scans', notes.splice(0), counts.notes);
        if (section === 'keepers') await resolveBatch('keepers', keepers.splice(0), counts.keepers);
      },
    },
    problems,
  );

  for (const [file, record] of photoRecords) {
    const found = photoFiles.get(file);
    if (!found) report(file, 'is listed in strapsift.json but missing from the archive');
    else if (found.sha256 !== record.sha256) report(file, 'does not match its SHA-256 in strapsift.json (changed or damaged)');
    else if (found.contentType !== record.contentType) report(file, `is a ${found.contentType}, not the ${record.contentType} strapsift.json says`);
  }
  for (const file of photoFiles.keys()) if (!photoRecords.has(file)) report(file, 'is not listed in strapsift.json');

  const resolvedHunts = await resolveHunts(manager, userId, hunts);
  const adoptedHunts: ArchiveImportResult['adoptedHunts'] = [];
  for (const hunt of hunts) {
    const resolved = resolvedHunts.get(hunt.id)!;
    if (resolved.present) counts.hunts.present += 1;
    else if (resolved.adopted) adoptedHunts.push({ title: hunt.title, reason: resolved.adopted });
  }
  counts.photos.present = await presentPhotos(dataSource, userId, [...photoRecords.values()]);
  const [existing] = (await manager.query(
    `SELECT (SELECT count(*)::int FROM weight_tables WHERE user_id = $1 AND name = ANY($2::varchar[])) AS tables,
            (SELECT count(*)::int FROM watch_patterns WHERE user_id = $1 AND text = ANY($3::varchar[])) AS watch,
            (SELECT display_name FROM users WHERE id = $1) AS display_name`,
    [userId, weightNames, watchTexts],
  )) as Array<{ tables: number; watch: number; display_name: string }>;
  counts.weightTables.present = existing?.tables ?? 0;
  counts.watchPatterns.present = existing?.watch ?? 0;
  for (const kind of Object.values(counts)) kind.add = Math.max(0, kind.inArchive - kind.present);

  return {
    result: {
      exportedAt,
      exportedBy,
      counts,
      adoptedHunts,
      profile: { displayName, changes: displayName !== '' && displayName !== existing?.display_name },
      problems,
    },
  };
}

/** Photos of the archive that the importer's keepers already have on the same side. */
async function presentPhotos(dataSource: DataSource, userId: string, photos: readonly ArchivePhoto[]): Promise<number> {
  if (photos.length === 0) return 0;
  const keepers = await resolveOwned(dataSource.manager, 'keepers', userId, [...new Set(photos.map((photo) => photo.keeperId))]);
  const rows: Array<{ keeper_id: string; side: string }> = await dataSource.query(
    `SELECT keeper_id, side FROM photos WHERE user_id = $1 AND keeper_id = ANY($2::uuid[])`,
    [userId, [...keepers.values()].map((keeper) => keeper.id)],
  );
  const have = new Set(rows.map((row) => `${row.keeper_id}|${row.side}`));
  return photos.filter((photo) => have.has(`${keepers.get(photo.keeperId)!.id}|${photo.side}`)).length;
}
