import type { DataSource, EntityManager } from 'typeorm';
import { forbidden, notFound } from '../../lib/errors';
import type { HuntStatus } from '../hunts/hunt.entity';
import type { MemberRole } from './hunt-member.entity';

export interface HuntRow {
  id: string;
  ownerId: string;
  title: string;
  source: string;
  denomination: number;
  plannedStraps: number;
  inSequence: boolean;
  status: HuntStatus;
  startedAt: Date;
  closedAt: Date | null;
}

export interface HuntAccess {
  hunt: HuntRow;
  role: MemberRole;
}

/**
 * The hunt as the caller may see it. A hunt they are not a member of answers 404, exactly like one
 * that does not exist, so ids of other people's hunts reveal nothing.
 */
export async function huntAccess(db: DataSource | EntityManager, huntId: string, userId: string): Promise<HuntAccess> {
  const rows: HuntAccessRow[] = await db.query(
    `SELECT h.id, h.owner_id, h.title, h.source, h.denomination, h.planned_straps, h.in_sequence, h.status, h.started_at, h.closed_at, m.role
       FROM hunts h JOIN hunt_members m ON m.hunt_id = h.id AND m.user_id = $2
      WHERE h.id = $1`,
    [huntId, userId],
  );
  const row = rows[0];
  if (!row) throw notFound('No such hunt');
  return toHuntAccess(row);
}

/** The row as PostgreSQL returns it (timestamptz as Date; the enums as their text). */
interface HuntAccessRow {
  id: string;
  owner_id: string;
  title: string;
  source: string;
  denomination: number;
  planned_straps: number;
  in_sequence: boolean;
  status: HuntStatus;
  started_at: Date;
  closed_at: Date | null;
  role: MemberRole;
}

function toHuntAccess(row: HuntAccessRow): HuntAccess {
  return {
    role: row.role,
    hunt: {
      id: row.id,
      ownerId: row.owner_id,
      title: row.title,
      source: row.source,
      denomination: row.denomination,
      plannedStraps: row.planned_straps,
      inSequence: row.in_sequence,
      status: row.status,
      startedAt: row.started_at,
      closedAt: row.closed_at ?? null,
    },
  };
}

export function requireOwner(access: HuntAccess, what: string): void {
  if (access.role !== 'owner') throw forbidden(`Only the hunt's owner may ${what}`);
}
