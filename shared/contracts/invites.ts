import { z } from 'zod';
import { email } from './auth';
import { isoDateTime, uuid } from './common';

/** How long an invitation link works. */
export const INVITE_DAYS = 14;

/** The owner invites someone by e-mail; they need no account yet. */
export const createInviteRequest = z.object({ email }).strict();
export type CreateInviteRequest = z.infer<typeof createInviteRequest>;

export const inviteView = z.object({ id: uuid, email: z.string(), createdAt: isoDateTime, expiresAt: isoDateTime });
export type InviteView = z.infer<typeof inviteView>;

/** Open invitations of a hunt (owner only), newest first. */
export const inviteList = z.object({ items: z.array(inviteView) });
export type InviteList = z.infer<typeof inviteList>;

export const inviteParams = z.object({ id: uuid, inviteId: uuid });

/** 32 random bytes in base64url. */
export const inviteToken = z.string().regex(/^[A-Za-z0-9_-]{43}$/, 'is not an invitation link');
export const inviteTokenParams = z.object({ token: inviteToken });

/**
 * What the accept page shows before anyone signs in: the hunt's title, who invited, and the address the
 * invitation went to. `status` says whether it can still be accepted.
 */
export const invitePreview = z.object({
  huntTitle: z.string(),
  invitedBy: z.string(),
  email: z.string(),
  expiresAt: isoDateTime,
  status: z.enum(['open', 'accepted', 'expired']),
});
export type InvitePreview = z.infer<typeof invitePreview>;

export const inviteAccepted = z.object({ huntId: uuid, alreadyMember: z.boolean() });
export type InviteAccepted = z.infer<typeof inviteAccepted>;

/** A mail the server sent on the caller's request, to the caller's own address. */
export const mailSent = z.object({ sent: z.literal(true), to: z.string() });
export type MailSent = z.infer<typeof mailSent>;
