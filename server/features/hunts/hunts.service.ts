import type { DataSource } from 'typeorm';
import type { BestFind, CreateHuntRequest, HuntDetail, HuntList, HuntListQuery, HuntSummary, UpdateHuntRequest } from '../../../shared/contracts/hunts';
import { afterCursor, decodeCursor, keysetPage, timeIdCursor } from '../../lib/cursor';
import { NON_LOW_MASK, idsOf, int, iso } from '../../lib/patterns';
import { huntAccess, requireOwner } from '../crew/hunt-access';
import { HuntMemberEntity, type MemberRole } from '../crew/hunt-member.entity';
import type { WeightTable } from '../../../shared/engine';
import type { WeightsService } from '../weights/weights.service';
import { HuntEntity, type HuntStatus } from './hunt.entity';

interface HuntListRow {
  id: string;
  title: string;
  source: string;
  denomination: number;
  planned_straps: number;
  in_sequence: boolean;
  series: string | null;
  status: HuntStatus;
  started_at: Date;
  closed_at: Date | null;
  owner_id: string;
  owner_name: string;
  role: MemberRole;
  member_count: number;
}

const HUNT_COLUMNS = `h.id, h.title, h.source, h.denomination, h.planned_straps, h.in_sequence, h.series, h.status, h.started_at, h.closed_at,
  h.owner_id, u.display_name AS owner_name, m.role,
  (SELECT count(*)::int FROM hunt_members mm WHERE mm.hunt_id = h.id) AS member_count`;

export class HuntsService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly weights: WeightsService,
  ) {}

  /** `weights`: the active table when the caller holds it already (requireAuth reads it with the sign-in). */
  async list(userId: string, query: HuntListQuery, weights?: WeightTable): Promise<HuntList> {
    const after = decodeCursor(query.cursor, timeIdCursor);
    const params: unknown[] = [userId];
    const where = ['m.user_id = $1'];
    if (query.status) {
      params.push(query.status);
      where.push(`h.status = $${params.length}`);
    }
    if (after) where.push(afterCursor(params, ['h.started_at', 'h.id'], ['timestamptz', 'uuid'], after, 'DESC'));
    params.push(query.limit + 1);
    const rows: HuntListRow[] = await this.dataSource.query(
      `SELECT ${HUNT_COLUMNS}
         FROM hunt_members m JOIN hunts h ON h.id = m.hunt_id JOIN users u ON u.id = h.owner_id
        WHERE ${where.join(' AND ')}
        ORDER BY h.started_at DESC, h.id DESC
        LIMIT $${params.length}`,
      params,
    );
    const { page, nextCursor } = keysetPage(rows, query.limit, (last) => [last.started_at.toISOString(), last.id]);
    return { items: await this.summarise(userId, page, weights), nextCursor };
  }

  async get(userId: string, huntId: string): Promise<HuntDetail> {
    await huntAccess(this.dataSource, huntId, userId);
    const rows: HuntListRow[] = await this.dataSource.query(
      `SELECT ${HUNT_COLUMNS}
         FROM hunt_members m JOIN hunts h ON h.id = m.hunt_id JOIN users u ON u.id = h.owner_id
        WHERE m.user_id = $1 AND h.id = $2`,
      [userId, huntId],
    );
    const [summary] = await this.summarise(userId, rows);
    return summary!;
  }

  async create(userId: string, request: CreateHuntRequest): Promise<HuntDetail> {
    const now = new Date();
    const id = await this.dataSource.transaction(async (manager) => {
      const hunt = await manager.getRepository(HuntEntity).save(
        manager.getRepository(HuntEntity).create({
          ownerId: userId,
          title: request.title,
          source: request.source,
          denomination: request.denomination,
          plannedStraps: request.plannedStraps,
          inSequence: request.inSequence ?? false,
          series: request.series ?? null,
          status: 'open',
          startedAt: request.startedAt ? new Date(request.startedAt) : now,
          closedAt: null,
        }),
      );
      await manager.getRepository(HuntMemberEntity).insert({ huntId: hunt.id, userId, role: 'owner', joinedAt: now });
      return hunt.id;
    });
    return this.get(userId, id);
  }

  async update(userId: string, huntId: string, change: UpdateHuntRequest): Promise<HuntDetail> {
    requireOwner(await huntAccess(this.dataSource, huntId, userId), 'change it');
    const { startedAt, ...rest } = change;
    await this.dataSource
      .getRepository(HuntEntity)
      .update({ id: huntId }, { ...rest, ...(startedAt ? { startedAt: new Date(startedAt) } : {}) });
    return this.get(userId, huntId);
  }

  async remove(userId: string, huntId: string): Promise<void> {
    requireOwner(await huntAccess(this.dataSource, huntId, userId), 'delete it');
    await this.dataSource.getRepository(HuntEntity).delete({ id: huntId });
  }

  /** Closing twice keeps the first closing time: a retried request changes nothing. */
  async close(userId: string, huntId: string): Promise<HuntDetail> {
    const access = await huntAccess(this.dataSource, huntId, userId);
    requireOwner(access, 'close it');
    if (access.hunt.status !== 'closed') {
      await this.dataSource.getRepository(HuntEntity).update({ id: huntId }, { status: 'closed', closedAt: new Date() });
    }
    return this.get(userId, huntId);
  }

  /** Figures for a page of hunts in one statement (counts and best find per hunt), whatever the page size. */
  private async summarise(userId: string, rows: HuntListRow[], activeWeights?: WeightTable): Promise<HuntSummary[]> {
    if (rows.length === 0) return [];
    const ids = rows.map((row) => row.id);
    const weights = activeWeights ?? (await this.weights.activeWeights(userId));
    const figures: Array<Record<string, unknown>> = await this.dataSource.query(
      `SELECT ids.hunt_id, f.notes, f.hits, f.keeps, f.pulled, f.straps, f.last_scan_at,
              b.id AS best_id, b.serial AS best_serial, b.digits AS best_digits, b.pattern_mask AS best_mask, b.points AS best_points
         FROM unnest($1::uuid[]) AS ids(hunt_id)
         CROSS JOIN LATERAL (
           SELECT count(*)::int AS notes,
                  count(*) FILTER (WHERE (pattern_mask & $2) <> 0 OR value <= $3)::int AS hits,
                  count(*) FILTER (WHERE keep)::int AS keeps,
                  count(*) FILTER (WHERE pulled)::int AS pulled,
                  count(DISTINCT strap)::int AS straps,
                  max(scanned_at) AS last_scan_at
             FROM scans WHERE hunt_id = ids.hunt_id) f
         LEFT JOIN LATERAL (
           SELECT id, serial, digits, pattern_mask, points
             FROM scans WHERE hunt_id = ids.hunt_id AND points > 0
            ORDER BY points DESC, scanned_at ASC, id ASC
            LIMIT 1) b ON true`,
      [ids, NON_LOW_MASK, weights.lowLimit],
    );
    const statsBy = new Map(figures.map((row) => [row.hunt_id as string, row]));
    const bestBy = new Map<string, BestFind>(
      figures
        .filter((row) => row.best_id !== null)
        .map((row) => [
          row.hunt_id as string,
          {
            scanId: row.best_id as string,
            serial: row.best_serial as string,
            digits: row.best_digits as string,
            patterns: idsOf(row.best_mask as number),
            points: Number(row.best_points),
          },
        ]),
    );
    return rows.map((row) => {
      const s = statsBy.get(row.id);
      return {
        id: row.id,
        title: row.title,
        source: row.source,
        denomination: row.denomination,
        plannedStraps: row.planned_straps,
        inSequence: row.in_sequence,
        series: row.series ?? null,
        status: row.status,
        role: row.role,
        owner: { id: row.owner_id, displayName: row.owner_name },
        memberCount: row.member_count,
        startedAt: row.started_at.toISOString(),
        closedAt: iso(row.closed_at),
        lastScanAt: iso(s?.last_scan_at as Date | undefined),
        notesSearched: int(s?.notes),
        hits: int(s?.hits),
        keeps: int(s?.keeps),
        pulled: int(s?.pulled),
        strapCount: int(s?.straps),
        bestFind: bestBy.get(row.id) ?? null,
      };
    });
  }
}
