import type { Response } from 'express';
import Papa from 'papaparse';
import type { DataSource } from 'typeorm';
import type { ExportKind } from '../../../shared/contracts/transfer';
import { idsOf } from '../../lib/patterns';
import { csvCell } from './csv-cell';

type Row = Record<string, unknown>;

/** Rows read per query: an export of any size holds at most this many in memory. */
const PAGE = 2000;

const iso = (value: unknown) => (value instanceof Date ? value.toISOString() : value === null || value === undefined ? null : String(value));
const patterns = (mask: unknown) => idsOf(Number(mask)).join(' ');

interface Source {
  /** SELECT … WHERE <owner> AND (sort key) > ($2, $3) ORDER BY … LIMIT $4 */
  sql: string;
  /** The keyset of the last row, to start the next page after it. */
  key(row: Row): [unknown, string];
  first: [unknown, string];
  /** The row as the CSV file and the JSON file show it. */
  shape(row: Row): Row;
}

const ZERO_UUID = '00000000-0000-0000-0000-000000000000';
const EPOCH = new Date(0);

// Each source pages by a keyset, so a long export never re-reads or skips a row and never holds the
// whole table. Hunts: every hunt the user is in; scans: the notes they logged; keepers: their own.
const SOURCES: Record<ExportKind, Source> = {
  hunts: {
    sql: `SELECT h.id, h.title, h.source, h.denomination, h.planned_straps, h.status, m.role, h.started_at, h.closed_at,
                 (SELECT count(*)::int FROM scans s WHERE s.hunt_id = h.id AND s.user_id = $1) AS notes_you_logged
            FROM hunt_members m JOIN hunts h ON h.id = m.hunt_id
           WHERE m.user_id = $1 AND (h.started_at, h.id) > ($2::timestamptz, $3::uuid)
           ORDER BY h.started_at, h.id LIMIT $4`,
    key: (row) => [row.started_at, row.id as string],
    first: [EPOCH, ZERO_UUID],
    shape: (row) => ({
      id: row.id,
      title: row.title,
      source: row.source,
      denomination: row.denomination,
      planned_straps: row.planned_straps,
      status: row.status,
      role: row.role,
      started_at: iso(row.started_at),
      closed_at: iso(row.closed_at),
      notes_you_logged: row.notes_you_logged,
    }),
  },
  scans: {
    sql: `SELECT s.id, s.hunt_id, h.title AS hunt, s.strap, s.serial, s.digits, s.star, s.district, s.pulled, s.pattern_mask,
                 s.points, s.keep, s.scanned_at, s.entry_method, s.camera_confidence
            FROM scans s JOIN hunts h ON h.id = s.hunt_id
           WHERE s.user_id = $1 AND (s.scanned_at, s.id) > ($2::timestamptz, $3::uuid)
           ORDER BY s.scanned_at, s.id LIMIT $4`,
    key: (row) => [row.scanned_at, row.id as string],
    first: [EPOCH, ZERO_UUID],
    shape: (row) => ({
      id: row.id,
      hunt_id: row.hunt_id,
      hunt: row.hunt,
      strap: row.strap,
      serial: row.serial,
      digits: row.digits,
      star: row.star,
      district: row.district,
      pulled: row.pulled,
      patterns: patterns(row.pattern_mask),
      points: Number(row.points),
      keep: row.keep,
      date: iso(row.scanned_at),
      entry_method: row.entry_method,
      camera_confidence: row.camera_confidence === null ? '' : Number(row.camera_confidence),
    }),
  },
  keepers: {
    sql: `SELECT k.id, k.serial, k.digits, k.star, k.series, k.district, k.facility, k.denomination, k.grade, k.estimated_value_cents,
                 k.status, k.notes, k.pattern_mask, k.points, k.hunt_id, k.scan_id, k.found_at,
                 (SELECT string_agg(p.side, ' ' ORDER BY p.side DESC) FROM photos p WHERE p.keeper_id = k.id) AS photos
            FROM keepers k
           WHERE k.user_id = $1 AND (k.found_at, k.id) > ($2::timestamptz, $3::uuid)
           ORDER BY k.found_at, k.id LIMIT $4`,
    key: (row) => [row.found_at, row.id as string],
    first: [EPOCH, ZERO_UUID],
    shape: (row) => ({
      id: row.id,
      serial: row.serial,
      digits: row.digits,
      star: row.star,
      series: row.series,
      district: row.district,
      facility: row.facility,
      denomination: row.denomination,
      grade: row.grade,
      estimated_value_cents: row.estimated_value_cents,
      status: row.status,
      note: row.notes,
      patterns: patterns(row.pattern_mask),
      points: Number(row.points),
      hunt_id: row.hunt_id,
      scan_id: row.scan_id,
      date: iso(row.found_at),
      photos: row.photos ?? '',
    }),
  },
};

/** Column order of each CSV file (also the header when a user has no rows of that kind). */
export const CSV_COLUMNS: Record<ExportKind, string[]> = {
  hunts: ['id', 'title', 'source', 'denomination', 'planned_straps', 'status', 'role', 'started_at', 'closed_at', 'notes_you_logged'],
  scans: ['id', 'hunt_id', 'hunt', 'strap', 'serial', 'digits', 'star', 'district', 'pulled', 'patterns', 'points', 'keep', 'date', 'entry_method', 'camera_confidence'],
  keepers: [
    'id', 'serial', 'digits', 'star', 'series', 'district', 'facility', 'denomination', 'grade', 'estimated_value_cents',
    'status', 'note', 'patterns', 'points', 'hunt_id', 'scan_id', 'date', 'photos',
  ],
};

/** Writes and waits when the socket's buffer is full, so a slow download never piles the export up in memory. */
async function write(res: Response, chunk: string): Promise<void> {
  if (res.destroyed) throw new Error('client went away');
  if (!res.write(chunk)) {
    await new Promise<void>((resolve, reject) => {
      const done = () => {
        res.off('drain', done);
        res.off('close', gone);
        resolve();
      };
      const gone = () => {
        res.off('drain', done);
        reject(new Error('client went away'));
      };
      res.once('drain', done);
      res.once('close', gone);
    });
  }
}

export class ExportService {
  constructor(private readonly dataSource: DataSource) {}

  private async *pages(kind: ExportKind, userId: string): AsyncGenerator<Row[]> {
    const source = SOURCES[kind];
    let after = source.first;
    for (;;) {
      const rows: Row[] = await this.dataSource.query(source.sql, [userId, after[0], after[1], PAGE]);
      if (rows.length === 0) return;
      yield rows.map(source.shape);
      if (rows.length < PAGE) return;
      after = source.key(rows[rows.length - 1]!);
    }
  }

  /**
   * One kind as CSV, streamed page by page. Cells that a spreadsheet would run as a formula (=, +, -, @,
   * tab, CR), multi-line ones included, get a leading apostrophe (csv-cell.ts).
   */
  async csv(res: Response, userId: string, kind: ExportKind): Promise<void> {
    const columns = CSV_COLUMNS[kind];
    res.status(200);
    res.setHeader('Content-Type', 'text/csv; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="strapsift-${kind === 'scans' ? 'notes' : kind}-${new Date().toISOString().slice(0, 10)}.csv"`);
    res.setHeader('Cache-Control', 'no-store');
    await write(res, `${Papa.unparse([columns], { newline: '\r\n' })}\r\n`);
    for await (const rows of this.pages(kind, userId)) {
      const data = rows.map((row) => columns.map((c) => csvCell(row[c] ?? '')));
      await write(res, `${Papa.unparse({ fields: columns, data }, { header: false, newline: '\r\n' })}\r\n`);
    }
    res.end();
  }

  /** Everything in one JSON file, streamed: the account, then each kind as an array. */
  async json(res: Response, userId: string): Promise<void> {
    const [account] = (await this.dataSource.query(`SELECT email, display_name, created_at FROM users WHERE id = $1`, [userId])) as Row[];
    const [weightTables, watchPatterns, straps] = (await Promise.all([
      this.dataSource.query(`SELECT name, active, weights, created_at FROM weight_tables WHERE user_id = $1 ORDER BY created_at, id`, [userId]),
      this.dataSource.query(`SELECT text, label, created_at FROM watch_patterns WHERE user_id = $1 ORDER BY created_at, id`, [userId]),
      this.dataSource.query(
        `SELECT st.hunt_id, st.number, st.swapped_in, st.short_over, st.note
           FROM straps st JOIN hunt_members m ON m.hunt_id = st.hunt_id AND m.user_id = $1
          ORDER BY st.hunt_id, st.number`,
        [userId],
      ),
    ])) as Row[][];
    res.status(200);
    res.setHeader('Content-Type', 'application/json; charset=utf-8');
    res.setHeader('Content-Disposition', `attachment; filename="strapsift-export-${new Date().toISOString().slice(0, 10)}.json"`);
    res.setHeader('Cache-Control', 'no-store');
    const head = {
      format: 'strapsift-export',
      version: 1,
      exportedAt: new Date().toISOString(),
      account: { email: account?.email, displayName: account?.display_name, createdAt: iso(account?.created_at) },
      weightTables: weightTables.map((row) => ({ name: row.name, active: row.active, weights: row.weights, createdAt: iso(row.created_at) })),
      watchPatterns: watchPatterns.map((row) => ({ pattern: row.text, label: row.label, createdAt: iso(row.created_at) })),
      straps: straps.map((row) => ({ huntId: row.hunt_id, number: row.number, swappedIn: row.swapped_in, shortOver: row.short_over, note: row.note })),
    };
    await write(res, JSON.stringify(head).slice(0, -1));
    for (const kind of ['hunts', 'scans', 'keepers'] as const) {
      await write(res, `,${JSON.stringify(kind)}:[`);
      let first = true;
      for await (const rows of this.pages(kind, userId)) {
        await write(res, `${first ? '' : ','}${rows.map((row) => JSON.stringify(row)).join(',')}`);
        first = false;
      }
      await write(res, ']');
    }
    await write(res, '}\n');
    res.end();
  }
}
