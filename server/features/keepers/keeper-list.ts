import type { DataSource } from 'typeorm';
import { z } from 'zod';
import type { KeeperListQuery, KeeperSort } from '../../../shared/contracts/keepers';
import { afterCursor, assertCursorKind, decodeCursor, keysetPage } from '../../lib/cursor';
import { containsPattern } from '../../lib/like';

/**
 * Each sort as an SQL key with a tiebreak on id, so keyset pages never skip or repeat a keeper.
 * Missing grades and values sort last, as -1.
 */
const SORTS: Record<KeeperSort, { key: string; dir: 'ASC' | 'DESC'; kind: 'time' | 'number' | 'text' }> = {
  newest: { key: 'k.found_at', dir: 'DESC', kind: 'time' },
  oldest: { key: 'k.found_at', dir: 'ASC', kind: 'time' },
  points: { key: 'k.points', dir: 'DESC', kind: 'number' },
  value: { key: 'COALESCE(k.estimated_value_cents, -1)', dir: 'DESC', kind: 'number' },
  grade: { key: 'COALESCE(k.grade, -1)', dir: 'DESC', kind: 'number' },
  serial: { key: 'k.digits', dir: 'ASC', kind: 'text' },
};

const keeperCursor = z.tuple([z.union([z.string().max(64), z.number()]), z.string().uuid()]);

const CASTS = { time: 'timestamptz', number: 'float8', text: 'text' } as const;

/**
 * One page of a hunter's keeper ids in the asked order, filtered by status and by words or digits,
 * with the cursor of the next page. The rows themselves are loaded by id afterwards.
 */
export async function keeperPage(dataSource: DataSource, userId: string, query: KeeperListQuery): Promise<{ ids: string[]; nextCursor: string | null }> {
  const sort = SORTS[query.sort];
  const after = decodeCursor(query.cursor, keeperCursor);
  const params: unknown[] = [userId];
  const where = ['k.user_id = $1'];
  if (query.status) {
    params.push(query.status);
    where.push(`k.status = $${params.length}`);
  }
  if (query.query) {
    params.push(containsPattern(query.query));
    const p = `$${params.length}`;
    // Digits typed with spaces or dashes still find the serial.
    const digitsOnly = query.query.replace(/[\s-]/g, '');
    params.push(/^\d+$/.test(digitsOnly) ? containsPattern(digitsOnly) : null);
    const d = `$${params.length}`;
    where.push(`(k.serial ILIKE ${p} OR k.notes ILIKE ${p} OR k.series ILIKE ${p} OR k.district ILIKE ${p} OR (${d}::text IS NOT NULL AND k.digits LIKE ${d}))`);
  }
  if (after) {
    assertCursorKind(after[0], sort.kind);
    where.push(afterCursor(params, [sort.key, 'k.id'], [CASTS[sort.kind], 'uuid'], after, sort.dir));
  }
  params.push(query.limit + 1);
  const rows: Array<{ id: string; sort_key: Date | number | string | null }> = await dataSource.query(
    `SELECT k.id, ${sort.key} AS sort_key FROM keepers k
      WHERE ${where.join(' AND ')}
      ORDER BY ${sort.key} ${sort.dir}, k.id ${sort.dir}
      LIMIT $${params.length}`,
    params,
  );
  const { page, nextCursor } = keysetPage(rows, query.limit, (last) =>
    last.sort_key === null ? null : [last.sort_key instanceof Date ? last.sort_key.toISOString() : last.sort_key, last.id],
  );
  return { ids: page.map((row) => row.id), nextCursor };
}
