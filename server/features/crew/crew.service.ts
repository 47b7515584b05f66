import type { DataSource } from 'typeorm';
import type { AddMemberRequest, MemberList, MemberView } from '../../../shared/contracts/crew';
import { conflict, forbidden, notFound } from '../../lib/errors';
import { int } from '../../lib/patterns';
import { UserEntity } from '../users/user.entity';
import { huntAccess, requireOwner } from './hunt-access';
import { HuntMemberEntity, type MemberRole } from './hunt-member.entity';

export class CrewService {
  constructor(private readonly dataSource: DataSource) {}

  async list(userId: string, huntId: string): Promise<MemberList> {
    await huntAccess(this.dataSource, huntId, userId);
    const rows: Array<{ user_id: string; display_name: string; role: MemberRole; joined_at: Date; notes: number }> = await this.dataSource.query(
      `SELECT m.user_id, u.display_name, m.role, m.joined_at,
              (SELECT count(*) FROM scans s WHERE s.hunt_id = m.hunt_id AND s.user_id = m.user_id)::int AS notes
         FROM hunt_members m JOIN users u ON u.id = m.user_id
        WHERE m.hunt_id = $1
        ORDER BY (m.role = 'owner') DESC, m.joined_at, u.display_name`,
      [huntId],
    );
    return {
      items: rows.map((row) => ({
        userId: row.user_id,
        displayName: row.display_name,
        role: row.role,
        joinedAt: row.joined_at.toISOString(),
        notesLogged: int(row.notes),
      })),
    };
  }

  /** Adds an existing, enabled account as crew. Replaced by e-mail invitations in the mail issue. */
  async add(userId: string, huntId: string, request: AddMemberRequest): Promise<MemberView> {
    requireOwner(await huntAccess(this.dataSource, huntId, userId), 'add crew');
    const user = await this.dataSource.getRepository(UserEntity).findOne({ where: { email: request.email } });
    if (!user || user.disabled) throw notFound('No account has that e-mail');
    const joinedAt = new Date();
    const inserted: unknown[] = await this.dataSource.query(
      `INSERT INTO hunt_members (hunt_id, user_id, role, joined_at) VALUES ($1, $2, 'crew', $3)
       ON CONFLICT DO NOTHING RETURNING user_id`,
      [huntId, user.id, joinedAt],
    );
    if (inserted.length === 0) throw conflict(`${user.displayName} is already in this hunt`);
    return { userId: user.id, displayName: user.displayName, role: 'crew', joinedAt: joinedAt.toISOString(), notesLogged: 0 };
  }

  /**
   * The owner removes crew; a crew member may leave on their own. The owner cannot leave: the hunt is
   * theirs, so they delete it instead. Notes a removed member logged stay in the hunt.
   */
  async remove(userId: string, huntId: string, memberId: string): Promise<void> {
    const access = await huntAccess(this.dataSource, huntId, userId);
    if (memberId !== userId) requireOwner(access, 'remove crew');
    const members = this.dataSource.getRepository(HuntMemberEntity);
    const member = await members.findOne({ where: { huntId, userId: memberId } });
    if (!member) throw notFound('No such member in this hunt');
    if (member.role === 'owner') throw forbidden('The owner cannot leave their own hunt; delete the hunt instead');
    await members.delete({ huntId, userId: memberId });
  }

  /**
   * Before an owner's account is deleted, each hunt they share goes to its longest-standing crew
   * member, so the crew's notes (their rows, not the owner's) survive. Hunts without crew go with
   * the account.
   */
  async handOverHunts(userId: string): Promise<void> {
    await this.dataSource.transaction(async (manager) => {
      const hunts: Array<{ id: string; heir: string | null }> = await manager.query(
        `SELECT h.id,
                (SELECT m.user_id FROM hunt_members m WHERE m.hunt_id = h.id AND m.user_id <> $1
                  ORDER BY m.joined_at, m.user_id LIMIT 1) AS heir
           FROM hunts h WHERE h.owner_id = $1
          FOR UPDATE`,
        [userId],
      );
      for (const hunt of hunts) {
        if (!hunt.heir) continue;
        await manager.query(`UPDATE hunts SET owner_id = $2, updated_at = now() WHERE id = $1`, [hunt.id, hunt.heir]);
        await manager.query(`UPDATE hunt_members SET role = 'owner' WHERE hunt_id = $1 AND user_id = $2`, [hunt.id, hunt.heir]);
        await manager.query(`UPDATE hunt_members SET role = 'crew' WHERE hunt_id = $1 AND user_id = $2`, [hunt.id, userId]);
      }
    });
  }
}
