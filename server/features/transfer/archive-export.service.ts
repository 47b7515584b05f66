import { createHash } from 'node:crypto';
import type { Response } from 'express';
import type { DataSource } from 'typeorm';
import {
  ARCHIVE_FORMAT,
  ARCHIVE_JSON,
  ARCHIVE_README,
  ARCHIVE_VERSION,
  PHOTO_EXTENSION,
  type ArchiveHunt,
  type ArchiveKeeper,
  type ArchiveNote,
  type ArchivePhoto,
  type ArchiveSummary,
} from '../../../shared/contracts/archive';
import type { PhotoContentType, PhotoSide } from '../../../shared/contracts/photos';
import { logger } from '../../lib/logger';
import type { ObjectStore } from '../../lib/object-store';
import { idsOf, iso } from '../../lib/patterns';
import { ARCHIVE_README_TEXT } from './archive/readme';
import { ZipResponse } from './archive/zip-response';

type Row = Record<string, unknown>;

/** Rows read per query: the archive of any account holds at most one page of each kind in memory. */
const PAGE = 2000;
/** What one note or keeper adds to the zip once compressed, for the progress bar's estimate. */
const BYTES_PER_RECORD = 60;

const ZERO_UUID = '00000000-0000-0000-0000-000000000000';
const EPOCH = new Date(0);
const isoOf = (value: unknown) => iso(value as Date | null);

interface Keyset {
  sql: string;
  key(row: Row): [unknown, string];
}

// Each kind pages by a keyset on (time, id), so a long export never re-reads or skips a row. Both
// archives of a round trip list everything in the same order because the times and ids come back.
const HUNTS: Keyset = {
  sql: `SELECT h.id, h.title, h.source, h.denomination, h.planned_straps, h.status, h.started_at, h.closed_at, h.in_sequence, h.series, m.role,
               COALESCE((SELECT json_agg(json_build_object('displayName', u.display_name, 'role', o.role) ORDER BY o.joined_at, o.user_id)
                           FROM hunt_members o JOIN users u ON u.id = o.user_id
                          WHERE o.hunt_id = h.id AND o.user_id <> $1), '[]'::json) AS crew,
               COALESCE((SELECT json_agg(json_build_object('number', st.number, 'swappedIn', st.swapped_in, 'shortOver', st.short_over, 'note', st.note)
                                         ORDER BY st.number)
                           FROM straps st WHERE st.hunt_id = h.id), '[]'::json) AS straps
          FROM hunt_members m JOIN hunts h ON h.id = m.hunt_id
         WHERE m.user_id = $1 AND (h.started_at, h.id) > ($2::timestamptz, $3::uuid)
         ORDER BY h.started_at, h.id LIMIT $4`,
  key: (row) => [row.started_at, row.id as string],
};

const NOTES: Keyset = {
  sql: `SELECT s.id, s.hunt_id, s.strap, s.serial, s.star, s.pulled, s.scanned_at, s.entry_method, s.camera_confidence, s.star_run_size,
               s.pattern_mask, s.points, s.keep
          FROM scans s
         WHERE s.user_id = $1 AND (s.scanned_at, s.id) > ($2::timestamptz, $3::uuid)
         ORDER BY s.scanned_at, s.id LIMIT $4`,
  key: (row) => [row.scanned_at, row.id as string],
};

const KEEPERS: Keyset = {
  sql: `SELECT k.id, k.scan_id, k.hunt_id, k.serial, k.star, k.series, k.district, k.facility, k.denomination, k.grade,
               k.estimated_value_cents, k.status, k.notes, k.original_paper, k.star_run_size, k.pattern_mask, k.points,
               k.found_at, k.created_at, k.updated_at
          FROM keepers k
         WHERE k.user_id = $1 AND (k.found_at, k.id) > ($2::timestamptz, $3::uuid)
         ORDER BY k.found_at, k.id LIMIT $4`,
  key: (row) => [row.found_at, row.id as string],
};

// Paged by keeper, so a keeper's front and back never fall on two pages; front before back.
const PHOTOS: Keyset = {
  sql: `WITH page AS (
          SELECT k.id, k.found_at FROM keepers k
           WHERE k.user_id = $1 AND EXISTS (SELECT 1 FROM photos p WHERE p.keeper_id = k.id)
             AND (k.found_at, k.id) > ($2::timestamptz, $3::uuid)
           ORDER BY k.found_at, k.id LIMIT $4)
        SELECT p.id, p.keeper_id, p.side, p.content_type, p.object_key, p.width, p.height, page.found_at
          FROM page JOIN photos p ON p.keeper_id = page.id
         ORDER BY page.found_at, page.id, p.side DESC`,
  key: (row) => [row.found_at, row.keeper_id as string],
};

const toHunt = (row: Row): ArchiveHunt => ({
  id: row.id as string,
  title: row.title as string,
  source: row.source as string,
  denomination: row.denomination as number,
  plannedStraps: row.planned_straps as number,
  status: row.status as ArchiveHunt['status'],
  startedAt: isoOf(row.started_at)!,
  closedAt: isoOf(row.closed_at),
  inSequence: row.in_sequence === true,
  series: (row.series as string | null) ?? null,
  role: row.role as ArchiveHunt['role'],
  crew: row.crew as ArchiveHunt['crew'],
  straps: row.straps as ArchiveHunt['straps'],
});

const toNote = (row: Row): ArchiveNote => ({
  id: row.id as string,
  huntId: row.hunt_id as string,
  strap: row.strap as number,
  serial: row.serial as string,
  star: row.star as boolean,
  pulled: row.pulled as boolean,
  scannedAt: isoOf(row.scanned_at)!,
  entryMethod: row.entry_method as ArchiveNote['entryMethod'],
  cameraConfidence: row.camera_confidence === null || row.camera_confidence === undefined ? null : Number(row.camera_confidence),
  starRunSize: row.star_run_size as number | null,
  patterns: idsOf(Number(row.pattern_mask)),
  points: Number(row.points),
  keep: row.keep as boolean,
});

const toKeeper = (row: Row): ArchiveKeeper => ({
  id: row.id as string,
  scanId: row.scan_id as string | null,
  huntId: row.hunt_id as string | null,
  serial: row.serial as string,
  star: row.star as boolean,
  series: row.series as string | null,
  district: row.district as string | null,
  facility: row.facility as ArchiveKeeper['facility'],
  denomination: row.denomination as number | null,
  grade: row.grade as number | null,
  estimatedValueCents: row.estimated_value_cents as number | null,
  status: row.status as ArchiveKeeper['status'],
  notes: row.notes as string | null,
  originalPaper: row.original_paper as boolean | null,
  starRunSize: row.star_run_size as number | null,
  patterns: idsOf(Number(row.pattern_mask)),
  points: Number(row.points),
  foundAt: isoOf(row.found_at)!,
  createdAt: isoOf(row.created_at)!,
  updatedAt: isoOf(row.updated_at)!,
});

/**
 * The full archive of one account: README.txt, the original photos, then strapsift.json with every
 * record. Everything streams: rows are read a page at a time and each page is written (and compressed)
 * before the next is read, so memory stays flat however many notes the account holds.
 */
export class ArchiveExportService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly store: ObjectStore,
  ) {}

  async summary(userId: string): Promise<ArchiveSummary> {
    const [row] = (await this.dataSource.query(
      `SELECT (SELECT count(*)::int FROM hunt_members WHERE user_id = $1) AS hunts,
              (SELECT count(*)::int FROM scans WHERE user_id = $1) AS notes,
              (SELECT count(*)::int FROM keepers WHERE user_id = $1) AS keepers,
              (SELECT count(*)::int FROM photos WHERE user_id = $1) AS photos,
              (SELECT COALESCE(sum(byte_size), 0)::bigint FROM photos WHERE user_id = $1) AS photo_bytes`,
      [userId],
    )) as Row[];
    const counts = { hunts: Number(row?.hunts), notes: Number(row?.notes), keepers: Number(row?.keepers), photos: Number(row?.photos) };
    return { ...counts, estimatedBytes: Number(row?.photo_bytes) + (counts.notes + counts.keepers) * BYTES_PER_RECORD + 4096 };
  }

  private async *pages(keyset: Keyset, userId: string, size = PAGE): AsyncGenerator<Row[]> {
    let after: [unknown, string] = [EPOCH, ZERO_UUID];
    for (;;) {
      const rows: Row[] = await this.dataSource.query(keyset.sql, [userId, after[0], after[1], size]);
      if (rows.length === 0) return;
      yield rows;
      if (rows.length < size) return;
      after = keyset.key(rows[rows.length - 1]!);
    }
  }

  async write(res: Response, userId: string, now = new Date()): Promise<void> {
    const [account] = (await this.dataSource.query(`SELECT id, email, display_name, created_at FROM users WHERE id = $1`, [userId])) as Row[];
    res.status(200);
    res.setHeader('Content-Type', 'application/zip');
    res.setHeader('Content-Disposition', `attachment; filename="strapsift-archive-${now.toISOString().slice(0, 10)}.zip"`);
    res.setHeader('Cache-Control', 'no-store');
    const zip = new ZipResponse(res);
    try {
      zip.addSmall(ARCHIVE_README, ARCHIVE_README_TEXT);
      const photos = await this.writePhotos(zip, userId);
      const json = zip.text(ARCHIVE_JSON);
      const head = {
        format: ARCHIVE_FORMAT,
        version: ARCHIVE_VERSION,
        exportedAt: now.toISOString(),
        account: { id: account?.id, email: account?.email, displayName: account?.display_name, createdAt: isoOf(account?.created_at) },
        weightTables: await this.dataSource.query(
          `SELECT name, active, weights FROM weight_tables WHERE user_id = $1 ORDER BY created_at, id`,
          [userId],
        ),
        watchPatterns: ((await this.dataSource.query(
          `SELECT text, label, created_at FROM watch_patterns WHERE user_id = $1 ORDER BY created_at, id`,
          [userId],
        )) as Row[]).map((row) => ({ text: row.text, label: row.label, createdAt: isoOf(row.created_at) })),
      };
      // One record a line: the file stays readable in an editor, and a diff of two archives lines up.
      await json.write(`${JSON.stringify(head, null, 1).replace(/\n}$/, '')}`);
      await this.section(json, 'hunts', this.pages(HUNTS, userId, 200), toHunt);
      await this.section(json, 'notes', this.pages(NOTES, userId), toNote);
      await this.section(json, 'keepers', this.pages(KEEPERS, userId, 1000), toKeeper);
      await this.section(json, 'photos', (async function* () {
        yield photos;
      })(), (photo: ArchivePhoto) => photo);
      await json.write('\n}\n');
      await json.end();
      await zip.end();
    } catch (error) {
      zip.abort();
      throw error;
    }
  }

  private async section<T>(json: { write(text: string): Promise<void> }, name: string, pages: AsyncIterable<T[]>, shape: (row: T) => unknown): Promise<void> {
    await json.write(`,\n "${name}": [`);
    let first = true;
    for await (const rows of pages) {
      let text = '';
      for (const row of rows) {
        text += `${first ? '\n' : ',\n'}  ${JSON.stringify(shape(row))}`;
        first = false;
      }
      await json.write(text);
    }
    await json.write(first ? ']' : '\n ]');
  }

  /** Photos go first, each read once: its bytes into the zip, its size and hash into strapsift.json. */
  private async writePhotos(zip: ZipResponse, userId: string): Promise<ArchivePhoto[]> {
    const records: ArchivePhoto[] = [];
    for await (const rows of this.pages(PHOTOS, userId, 200)) {
      for (const row of rows) {
        const object = await this.store.get(row.object_key as string);
        if (!object) {
          logger.warn({ photoId: row.id }, 'photo bytes missing from the object store; left out of the archive');
          continue;
        }
        const contentType = row.content_type as PhotoContentType;
        const file = `photos/${row.keeper_id as string}-${row.side as PhotoSide}.${PHOTO_EXTENSION[contentType]}`;
        await zip.addStored(file, object.body);
        records.push({
          keeperId: row.keeper_id as string,
          side: row.side as PhotoSide,
          file,
          contentType,
          byteSize: object.body.length,
          width: row.width as number,
          height: row.height as number,
          sha256: createHash('sha256').update(object.body).digest('hex'),
        });
      }
    }
    return records;
  }
}
