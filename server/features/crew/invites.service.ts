import type { DataSource } from 'typeorm';
import { INVITE_DAYS, type InviteAccepted, type InviteList, type InvitePreview, type InviteView } from '../../../shared/contracts/invites';
import { HttpError, conflict, notFound } from '../../lib/errors';
import { logger } from '../../lib/logger';
import { oneLine, renderMail, type Mailer } from '../../lib/mail';
import { hashSecretToken, newSecretToken } from '../../lib/secret-token';
import { huntAccess, requireOwner } from './hunt-access';
import { CrewInviteEntity } from './crew-invite.entity';

/** Invitations one owner may send per hour: mail to any address must not become a way to spam. */
const MAX_INVITES_PER_HOUR = 20;

function toView(invite: CrewInviteEntity): InviteView {
  return { id: invite.id, email: invite.email, createdAt: invite.createdAt.toISOString(), expiresAt: invite.expiresAt.toISOString() };
}

/**
 * Crew by invitation: the owner names an e-mail, the invitee gets a link, and whoever opens it signed in
 * (with an account made on the spot if need be) joins the hunt as crew. The link works once.
 */
export class InvitesService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly mailer: Mailer,
    private readonly publicUrl: () => string,
  ) {}

  private invites() {
    return this.dataSource.getRepository(CrewInviteEntity);
  }

  async list(userId: string, huntId: string): Promise<InviteList> {
    requireOwner(await huntAccess(this.dataSource, huntId, userId), 'see its invitations');
    const rows = await this.invites()
      .createQueryBuilder('i')
      .where('i.hunt_id = :huntId AND i.accepted_at IS NULL AND i.expires_at > now()', { huntId })
      .orderBy('i.created_at', 'DESC')
      .getMany();
    return { items: rows.map(toView) };
  }

  async invite(userId: string, huntId: string, email: string): Promise<InviteView> {
    const access = await huntAccess(this.dataSource, huntId, userId);
    requireOwner(access, 'invite crew');
    if (access.hunt.status === 'closed') throw conflict('This hunt is closed; crew can no longer join it');
    const [member] = (await this.dataSource.query(
      `SELECT 1 FROM hunt_members m JOIN users u ON u.id = m.user_id WHERE m.hunt_id = $1 AND u.email = $2`,
      [huntId, email],
    )) as unknown[];
    if (member) throw conflict('That e-mail belongs to someone already in this hunt');
    const [recent] = (await this.dataSource.query(
      `SELECT count(*)::int AS n FROM crew_invites WHERE invited_by = $1 AND created_at > now() - interval '1 hour'`,
      [userId],
    )) as Array<{ n: number }>;
    if ((recent?.n ?? 0) >= MAX_INVITES_PER_HOUR) {
      throw new HttpError(429, 'too_many_invites', `At most ${MAX_INVITES_PER_HOUR} invitations an hour; try again later`, undefined, 60 * 60);
    }
    const [inviter] = (await this.dataSource.query(`SELECT display_name FROM users WHERE id = $1`, [userId])) as Array<{ display_name: string }>;
    const token = newSecretToken();
    const invite = await this.invites().save(
      this.invites().create({
        huntId,
        invitedBy: userId,
        email,
        tokenHash: hashSecretToken(token),
        expiresAt: new Date(Date.now() + INVITE_DAYS * 24 * 60 * 60 * 1000),
        acceptedAt: null,
        acceptedBy: null,
      }),
    );
    const link = `${this.publicUrl().replace(/\/$/, '')}/invite/${token}`;
    const body = renderMail(`Join the hunt “${access.hunt.title}”`, [
      { text: `${inviter?.display_name ?? 'A Strapsift user'} invites you to sift straps together in the hunt “${access.hunt.title}” on Strapsift.` },
      { text: 'As crew you log the notes of your own straps into the shared hunt; the owner sees every strap sheet add up.' },
      { link, label: 'Accept the invitation' },
      { text: `Sign in, or create an account, with this e-mail address (${email}), and the hunt appears in your list. The link works once, for ${INVITE_DAYS} days, while the hunt is open.` },
      { small: 'If you do not know the sender, ignore this mail; nothing happens unless you accept.' },
    ]);
    try {
      await this.mailer.send({ to: email, subject: oneLine(`${inviter?.display_name ?? 'Someone'} invites you to a Strapsift hunt`), ...body });
    } catch (error) {
      await this.invites().delete({ id: invite.id });
      logger.error({ err: error, inviteId: invite.id }, 'invitation mail could not be sent');
      throw new HttpError(502, 'mail_failed', 'The invitation could not be sent just now; try again in a minute');
    }
    return toView(invite);
  }

  async revoke(userId: string, huntId: string, inviteId: string): Promise<void> {
    requireOwner(await huntAccess(this.dataSource, huntId, userId), 'withdraw invitations');
    const result = await this.invites().delete({ id: inviteId, huntId });
    if (!result.affected) throw notFound('No such invitation');
  }

  private async byToken(token: string): Promise<{ invite: CrewInviteEntity; huntTitle: string; invitedBy: string }> {
    const rows: Array<{ title: string; display_name: string }> = [];
    const invite = await this.invites().findOne({ where: { tokenHash: hashSecretToken(token) } });
    if (invite) {
      rows.push(
        ...((await this.dataSource.query(`SELECT h.title, u.display_name FROM hunts h JOIN users u ON u.id = $2 WHERE h.id = $1`, [
          invite.huntId,
          invite.invitedBy,
        ])) as Array<{ title: string; display_name: string }>),
      );
    }
    if (!invite || !rows[0]) throw notFound('This invitation does not exist or was withdrawn');
    return { invite, huntTitle: rows[0].title, invitedBy: rows[0].display_name };
  }

  private async huntClosed(huntId: string): Promise<boolean> {
    const [row] = (await this.dataSource.query(`SELECT status FROM hunts WHERE id = $1`, [huntId])) as Array<{ status: string }>;
    return row?.status === 'closed';
  }

  /** What the accept page shows to anyone holding the link, signed in or not. */
  async preview(token: string): Promise<InvitePreview> {
    const { invite, huntTitle, invitedBy } = await this.byToken(token);
    // A closed hunt takes no new crew, so its open invitations read as expired.
    const dead = invite.expiresAt.getTime() <= Date.now() || (await this.huntClosed(invite.huntId));
    const status = invite.acceptedAt ? 'accepted' : dead ? 'expired' : 'open';
    return { huntTitle, invitedBy, email: invite.email, expiresAt: invite.expiresAt.toISOString(), status };
  }

  /**
   * Spends the invitation and adds the caller as crew in one transaction; the UPDATE … WHERE accepted_at
   * IS NULL makes it single-use even when two accepts race. Accepting a hunt one is already in is harmless.
   */
  async accept(userId: string, token: string): Promise<InviteAccepted> {
    const tokenHash = hashSecretToken(token);
    return this.dataSource.transaction(async (manager) => {
      // Only the invited address may accept, and only while the hunt is open: a forwarded or leaked link
      // opens nothing for anyone else.
      const spent = (await manager.query(
        `UPDATE crew_invites i SET accepted_at = now(), accepted_by = $2
           FROM hunts h, users u
          WHERE i.token_hash = $1 AND i.accepted_at IS NULL AND i.expires_at > now()
            AND h.id = i.hunt_id AND h.status <> 'closed' AND u.id = $2 AND u.email = i.email
          RETURNING i.hunt_id`,
        [tokenHash, userId],
      )) as [Array<{ hunt_id: string }>, number];
      const huntId = spent[0][0]?.hunt_id;
      if (!huntId) {
        const [known] = (await manager.query(
          `SELECT i.hunt_id, i.accepted_by, i.accepted_at, i.expires_at, h.status, (u.email = i.email) AS addressed
             FROM crew_invites i JOIN hunts h ON h.id = i.hunt_id LEFT JOIN users u ON u.id = $2
            WHERE i.token_hash = $1`,
          [tokenHash, userId],
        )) as Array<{ hunt_id: string; accepted_by: string | null; accepted_at: Date | null; expires_at: Date; status: string; addressed: boolean }>;
        // Opening one's own accepted link again just leads back to the hunt.
        if (known && known.accepted_by === userId) return { huntId: known.hunt_id, alreadyMember: true };
        if (!known) throw notFound('This invitation does not exist or was withdrawn');
        if (known.status === 'closed') throw new HttpError(410, 'hunt_closed', 'This hunt is closed; crew can no longer join it');
        if (!known.accepted_at && known.expires_at.getTime() > Date.now() && !known.addressed) {
          throw new HttpError(403, 'wrong_account', 'This invitation was sent to another e-mail address; sign in with that address to accept it');
        }
        throw new HttpError(410, 'invite_used', 'This invitation was already used or has expired; ask the owner for a new one');
      }
      const added: unknown[] = await manager.query(
        `INSERT INTO hunt_members (hunt_id, user_id, role, joined_at) VALUES ($1, $2, 'crew', now()) ON CONFLICT DO NOTHING RETURNING user_id`,
        [huntId, userId],
      );
      return { huntId, alreadyMember: added.length === 0 };
    });
  }
}
