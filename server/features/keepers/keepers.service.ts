import type { DataSource } from 'typeorm';
import { read } from '../../../shared/engine';
import type { Reading } from '../../../shared/engine';
import type {
  CreateKeeperRequest,
  KeeperDetail,
  KeeperList,
  KeeperListQuery,
  KeeperSort,
  KeeperSummary,
  UpdateKeeperRequest,
} from '../../../shared/contracts/keepers';
import type { PhotoView } from '../../../shared/contracts/photos';
import { z } from 'zod';
import { containsPattern } from '../../lib/like';
import { afterCursor, assertCursorKind, decodeCursor, keysetPage } from '../../lib/cursor';
import { HttpError, notFound } from '../../lib/errors';
import { idsOf, maskOf } from '../../lib/patterns';
import type { ReadingContext, WeightsService } from '../weights/weights.service';
import { KeeperEntity } from './keeper.entity';

/** What a keeper's reading depends on besides the owner's weights and watch patterns. */
type NoteFacts = Pick<KeeperEntity, 'serial' | 'star' | 'series' | 'district' | 'facility' | 'denomination' | 'starRunSize'>;

function readNote(facts: NoteFacts, context: ReadingContext): Reading | null {
  const reading = read(facts.serial, {
    weights: context.weights,
    watch: context.watch,
    star: facts.star,
    series: facts.series ?? undefined,
    district: facts.district ?? undefined,
    facility: facts.facility ?? undefined,
    denomination: facts.denomination ?? undefined,
    starRunSize: facts.starRunSize,
  });
  return reading.ok ? reading : null;
}

function unreadable(message: string): HttpError {
  return new HttpError(400, 'invalid', 'Some fields need attention', { serial: message });
}

/** Photos of a keeper, as the photo feature answers them; lists use their thumbnails. */
export interface KeeperPhotos {
  listFor(keeperIds: readonly string[]): Promise<Map<string, PhotoView[]>>;
}

function thumbOf(photos: readonly PhotoView[] | undefined): string | null {
  return photos?.find((photo) => photo.side === 'front')?.thumbUrl ?? photos?.[0]?.thumbUrl ?? null;
}

function toSummary(keeper: KeeperEntity, photos?: readonly PhotoView[]): KeeperSummary {
  return {
    id: keeper.id,
    serial: keeper.serial,
    digits: keeper.digits,
    prefix: keeper.prefix,
    suffix: keeper.suffix,
    star: keeper.star,
    series: keeper.series,
    district: keeper.district,
    facility: keeper.facility,
    denomination: keeper.denomination,
    grade: keeper.grade,
    originalPaper: keeper.originalPaper,
    starRunSize: keeper.starRunSize,
    estimatedValueCents: keeper.estimatedValueCents,
    status: keeper.status,
    notes: keeper.notes,
    patterns: idsOf(keeper.patternMask),
    points: Number(keeper.points),
    huntId: keeper.huntId,
    scanId: keeper.scanId,
    foundAt: keeper.foundAt.toISOString(),
    createdAt: keeper.createdAt.toISOString(),
    updatedAt: keeper.updatedAt.toISOString(),
    thumbUrl: thumbOf(photos),
  };
}

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

export type BeforeRemoveKeeper = (userId: string, keeperId: string) => Promise<void>;

export class KeepersService {
  private readonly beforeRemoveHooks: BeforeRemoveKeeper[] = [];

  constructor(
    private readonly dataSource: DataSource,
    private readonly weights: WeightsService,
    private readonly photos: KeeperPhotos = { listFor: async () => new Map() },
  ) {}

  /** Data kept outside PostgreSQL (photo bytes in the object store) is cleaned up here. */
  onBeforeRemove(hook: BeforeRemoveKeeper): void {
    this.beforeRemoveHooks.push(hook);
  }

  private async detail(keeper: KeeperEntity, reading: Reading): Promise<KeeperDetail> {
    const photos = (await this.photos.listFor([keeper.id])).get(keeper.id) ?? [];
    return { ...toSummary(keeper, photos), reading, photos };
  }

  private keepers() {
    return this.dataSource.getRepository(KeeperEntity);
  }

  private async owned(userId: string, id: string): Promise<KeeperEntity> {
    const keeper = await this.keepers().findOne({ where: { id, userId } });
    if (!keeper) throw notFound('No such keeper');
    return keeper;
  }

  async list(userId: string, query: KeeperListQuery): Promise<KeeperList> {
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
      const digitsOnly = query.query.replace(/[\s-]/g, '');
      params.push(/^\d+$/.test(digitsOnly) ? containsPattern(digitsOnly) : null);
      const d = `$${params.length}`;
      where.push(
        `(k.serial ILIKE ${p} OR k.notes ILIKE ${p} OR k.series ILIKE ${p} OR k.district ILIKE ${p} OR (${d}::text IS NOT NULL AND k.digits LIKE ${d}))`,
      );
    }
    if (after) {
      assertCursorKind(after[0], sort.kind);
      const cast = sort.kind === 'time' ? 'timestamptz' : sort.kind === 'number' ? 'float8' : 'text';
      where.push(afterCursor(params, [sort.key, 'k.id'], [cast, 'uuid'], after, sort.dir));
    }
    params.push(query.limit + 1);
    const rows: Array<{ id: string; sort_key: Date | number | string | null }> = await this.dataSource.query(
      `SELECT k.id, ${sort.key} AS sort_key FROM keepers k
        WHERE ${where.join(' AND ')}
        ORDER BY ${sort.key} ${sort.dir}, k.id ${sort.dir}
        LIMIT $${params.length}`,
      params,
    );
    const { page: pageRows, nextCursor } = keysetPage(rows, query.limit, (last) =>
      last.sort_key === null ? null : [last.sort_key instanceof Date ? last.sort_key.toISOString() : last.sort_key, last.id],
    );
    const entities = pageRows.length ? await this.keepers().findBy(pageRows.map((row) => ({ id: row.id, userId }))) : [];
    const byId = new Map(entities.map((keeper) => [keeper.id, keeper]));
    const photos = await this.photos.listFor(pageRows.map((row) => row.id));
    return { items: pageRows.map((row) => toSummary(byId.get(row.id)!, photos.get(row.id))), nextCursor };
  }

  async get(userId: string, id: string): Promise<KeeperDetail> {
    const keeper = await this.owned(userId, id);
    const reading = readNote(keeper, await this.weights.readingContext(userId));
    if (!reading) throw new Error(`keeper ${id} holds a serial the engine cannot read`);
    return this.detail(keeper, reading);
  }

  /**
   * From a logged note or typed in. Keeping the same logged note twice returns the first keeper
   * (200 instead of 201), so a retried request never makes two.
   */
  async create(userId: string, request: CreateKeeperRequest): Promise<{ keeper: KeeperDetail; created: boolean }> {
    const context = await this.weights.readingContext(userId);
    let base: {
      serial: string;
      star: boolean;
      district: string | null;
      denomination: number | null;
      huntId: string | null;
      foundAt: Date;
      starRunSize: number | null;
    };
    if (request.scanId) {
      const rows: Array<Record<string, unknown>> = await this.dataSource.query(
        `SELECT s.id, s.serial, s.star, s.district, s.hunt_id, s.scanned_at, s.star_run_size, h.denomination
           FROM scans s JOIN hunts h ON h.id = s.hunt_id JOIN hunt_members m ON m.hunt_id = s.hunt_id AND m.user_id = $2
          WHERE s.id = $1`,
        [request.scanId, userId],
      );
      const scan = rows[0];
      if (!scan) throw notFound('No such note');
      const existing = await this.keepers().findOne({ where: { userId, scanId: request.scanId } });
      if (existing) return { keeper: await this.get(userId, existing.id), created: false };
      base = {
        serial: scan.serial as string,
        star: scan.star as boolean,
        district: (scan.district as string | null) ?? null,
        denomination: scan.denomination as number,
        huntId: scan.hunt_id as string,
        foundAt: scan.scanned_at as Date,
        starRunSize: (scan.star_run_size as number | null) ?? null,
      };
    } else {
      base = { serial: request.serial!, star: false, district: null, denomination: null, huntId: null, foundAt: new Date(), starRunSize: null };
    }

    const facts: NoteFacts = {
      serial: base.serial,
      star: request.star ?? base.star,
      series: request.series ?? null,
      district: request.district !== undefined ? request.district : base.district,
      facility: request.facility ?? null,
      denomination: request.denomination !== undefined ? request.denomination : base.denomination,
      starRunSize: request.starRunSize !== undefined ? request.starRunSize : base.starRunSize,
    };
    const reading = read(facts.serial);
    if (!reading.ok) throw unreadable(reading.error.message);
    // A typed-in serial's prefix names its district unless the hunter said otherwise.
    if (request.district === undefined && facts.district === null) facts.district = reading.district;
    const scored = readNote(facts, context)!;
    try {
      const saved = await this.keepers().save(
        this.keepers().create({
          ...facts,
          userId,
          scanId: request.scanId ?? null,
          huntId: base.huntId,
          digits: scored.digits,
          prefix: scored.prefix,
          suffix: scored.suffix,
          star: scored.star,
          grade: request.grade ?? null,
          originalPaper: request.originalPaper ?? null,
          starRunSize: request.starRunSize ?? base.starRunSize,
          estimatedValueCents: request.estimatedValueCents ?? null,
          status: request.status ?? 'kept',
          notes: request.notes || null,
          patternMask: maskOf(scored.patterns),
          points: scored.score.points,
          foundAt: request.foundAt ? new Date(request.foundAt) : base.foundAt,
        }),
      );
      return { keeper: await this.detail(saved, scored), created: true };
    } catch (error) {
      // Two "keep" taps racing for one note: the unique index lets one through, the other gets it back.
      if ((error as { code?: string }).code === '23505' && request.scanId) {
        const existing = await this.keepers().findOne({ where: { userId, scanId: request.scanId } });
        if (existing) return { keeper: await this.get(userId, existing.id), created: false };
      }
      throw error;
    }
  }

  async update(userId: string, id: string, change: UpdateKeeperRequest): Promise<KeeperDetail> {
    const keeper = await this.owned(userId, id);
    if (change.serial !== undefined) {
      const reading = read(change.serial);
      if (!reading.ok) throw unreadable(reading.error.message);
      keeper.serial = change.serial;
      if (change.district === undefined && reading.district) keeper.district = reading.district;
    }
    if (change.star !== undefined) keeper.star = change.star;
    if (change.series !== undefined) keeper.series = change.series;
    if (change.district !== undefined) keeper.district = change.district;
    if (change.facility !== undefined) keeper.facility = change.facility;
    if (change.denomination !== undefined) keeper.denomination = change.denomination;
    if (change.grade !== undefined) keeper.grade = change.grade;
    if (change.originalPaper !== undefined) keeper.originalPaper = change.originalPaper;
    if (change.starRunSize !== undefined) keeper.starRunSize = change.starRunSize;
    if (change.estimatedValueCents !== undefined) keeper.estimatedValueCents = change.estimatedValueCents;
    if (change.status !== undefined) keeper.status = change.status;
    if (change.notes !== undefined) keeper.notes = change.notes || null;
    if (change.foundAt !== undefined) keeper.foundAt = new Date(change.foundAt);
    const scored = readNote(keeper, await this.weights.readingContext(userId));
    if (!scored) throw unreadable('is not a serial');
    keeper.digits = scored.digits;
    keeper.prefix = scored.prefix;
    keeper.suffix = scored.suffix;
    keeper.star = scored.star;
    keeper.patternMask = maskOf(scored.patterns);
    keeper.points = scored.score.points;
    const saved = await this.keepers().save(keeper);
    return this.detail(saved, scored);
  }

  async remove(userId: string, id: string): Promise<void> {
    await this.owned(userId, id);
    for (const hook of this.beforeRemoveHooks) await hook(userId, id);
    const result = await this.keepers().delete({ id, userId });
    if (!result.affected) throw notFound('No such keeper');
  }
}
