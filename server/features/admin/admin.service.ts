import type { DataSource } from 'typeorm';
import { z } from 'zod';
import type { AdminStats, AdminUser, AdminUserPage, AdminUserQuery } from '../../../shared/contracts/admin';
import { containsPattern } from '../../lib/like';
import { afterCursor, decodeCursor, keysetPage } from '../../lib/cursor';
import { HttpError, notFound } from '../../lib/errors';
import { int } from '../../lib/patterns';
import type { UserRole } from '../users/user.entity';

const emailCursor = z.tuple([z.string().max(254)]);

export class AdminService {
  constructor(private readonly dataSource: DataSource) {}

  /** Ordered by e-mail, which is unique, so the cursor is the last e-mail sent. */
  async users(query: AdminUserQuery): Promise<AdminUserPage> {
    const after = decodeCursor(query.cursor, emailCursor);
    const params: unknown[] = [];
    const where: string[] = [];
    if (query.query) {
      params.push(containsPattern(query.query));
      where.push(`(u.email ILIKE $${params.length} OR u.display_name ILIKE $${params.length})`);
    }
    if (after) where.push(afterCursor(params, ['u.email'], ['text'], after, 'ASC'));
    params.push(query.limit + 1);
    const rows: AdminUserRow[] = await this.dataSource.query(
      `SELECT u.id, u.email, u.display_name, u.role, u.disabled, u.created_at,
              (SELECT count(*) FROM hunts h WHERE h.owner_id = u.id)::int AS hunts,
              (SELECT count(*) FROM scans s WHERE s.user_id = u.id)::int AS scans,
              (SELECT count(*) FROM keepers k WHERE k.user_id = u.id)::int AS keepers
         FROM users u
        ${where.length ? `WHERE ${where.join(' AND ')}` : ''}
        ORDER BY u.email
        LIMIT $${params.length}`,
      params,
    );
    const { page, nextCursor } = keysetPage(rows, query.limit, (last) => [last.email]);
    return { items: page.map(toAdminUser), nextCursor };
  }

  /**
   * Disabling raises the token version in the same statement, so every token already issued fails
   * the next request's check at once. An admin cannot lock themselves out.
   */
  async setDisabled(adminId: string, userId: string, disabled: boolean): Promise<AdminUser> {
    if (adminId === userId && disabled) {
      throw new HttpError(409, 'conflict', 'You cannot disable your own account');
    }
    // TypeORM answers an UPDATE with [rows, rowCount].
    const [updated] = (await this.dataSource.query(
      `UPDATE users SET disabled = $2,
              token_version = CASE WHEN $2 AND NOT disabled THEN token_version + 1 ELSE token_version END,
              updated_at = now()
        WHERE id = $1 RETURNING id`,
      [userId, disabled],
    )) as [Array<{ id: string }>, number];
    if (!updated.length) throw notFound('No such account');
    const rows: AdminUserRow[] = await this.dataSource.query(
      `SELECT u.id, u.email, u.display_name, u.role, u.disabled, u.created_at,
              (SELECT count(*) FROM hunts h WHERE h.owner_id = u.id)::int AS hunts,
              (SELECT count(*) FROM scans s WHERE s.user_id = u.id)::int AS scans,
              (SELECT count(*) FROM keepers k WHERE k.user_id = u.id)::int AS keepers
         FROM users u WHERE u.id = $1`,
      [userId],
    );
    return toAdminUser(rows[0]!);
  }

  async stats(): Promise<AdminStats> {
    const [row] = (await this.dataSource.query(
      `SELECT (SELECT count(*) FROM users) AS users,
              (SELECT count(*) FROM users WHERE role = 'collector') AS collectors,
              (SELECT count(*) FROM users WHERE role = 'admin') AS admins,
              (SELECT count(*) FROM users WHERE disabled) AS disabled_users,
              (SELECT count(*) FROM users WHERE created_at > now() - interval '7 days') AS new_users,
              (SELECT count(*) FROM hunts) AS hunts,
              (SELECT count(*) FROM hunts WHERE status = 'open') AS open_hunts,
              (SELECT count(*) FROM scans) AS scans,
              (SELECT count(*) FROM scans WHERE created_at > now() - interval '7 days') AS recent_scans,
              (SELECT count(*) FROM keepers) AS keepers,
              (SELECT count(*) FROM weight_tables) AS weight_tables,
              (SELECT count(*) FROM watch_patterns) AS watch_patterns`,
    )) as Array<Record<string, unknown>>;
    return {
      users: int(row?.users),
      collectors: int(row?.collectors),
      admins: int(row?.admins),
      disabledUsers: int(row?.disabled_users),
      newUsersLast7Days: int(row?.new_users),
      hunts: int(row?.hunts),
      openHunts: int(row?.open_hunts),
      scans: int(row?.scans),
      scansLast7Days: int(row?.recent_scans),
      keepers: int(row?.keepers),
      weightTables: int(row?.weight_tables),
      watchPatterns: int(row?.watch_patterns),
    };
  }
}

/** A user row with its counts as PostgreSQL returns them (count(*)::int as number, timestamptz as Date). */
interface AdminUserRow {
  id: string;
  email: string;
  display_name: string;
  role: UserRole;
  disabled: boolean;
  created_at: Date;
  hunts: number | string;
  scans: number | string;
  keepers: number | string;
}

function toAdminUser(row: AdminUserRow): AdminUser {
  return {
    id: row.id,
    email: row.email,
    displayName: row.display_name,
    role: row.role,
    disabled: row.disabled,
    createdAt: row.created_at.toISOString(),
    hunts: int(row.hunts),
    scans: int(row.scans),
    keepers: int(row.keepers),
  };
}
