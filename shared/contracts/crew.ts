import { z } from 'zod';
import { email } from './auth';
import { isoDateTime, uuid } from './common';

/** The hunt's owner edits, closes and deletes it; crew log scans into it and read it. */
export const memberRole = z.enum(['owner', 'crew']);
export type MemberRole = z.infer<typeof memberRole>;

export const memberView = z.object({
  userId: uuid,
  displayName: z.string(),
  role: memberRole,
  joinedAt: isoDateTime,
  /** Notes this member logged into the hunt. */
  notesLogged: z.number().int(),
});
export type MemberView = z.infer<typeof memberView>;

export const memberList = z.object({ items: z.array(memberView) });
export type MemberList = z.infer<typeof memberList>;

/**
 * Adds an existing account as crew (owner only). Invitations by e-mail replace this in the mail issue;
 * until then the account must already exist.
 */
export const addMemberRequest = z.object({ email }).strict();
export type AddMemberRequest = z.infer<typeof addMemberRequest>;

export const memberParams = z.object({ id: uuid, userId: uuid });
