import { z } from 'zod';
import { isoDateTime, uuid } from './common';

export const email = z
  .string()
  .trim()
  .toLowerCase()
  .max(254, 'must be at most 254 characters')
  .email('must be an e-mail address');

/** Shown beside every password field, so the rule is known before the server refuses one. */
export const PASSWORD_RULE =
  'At least 10 characters. Not one of the common passwords that leak lists are full of, and not your e-mail or name. A few unrelated words work well.';

export const newPassword = z
  .string()
  .min(10, 'must be at least 10 characters')
  .max(200, 'must be at most 200 characters');

export const displayName = z.string().trim().min(1, 'is required').max(80, 'must be at most 80 characters');

export const userRole = z.enum(['collector', 'admin']);
export type UserRole = z.infer<typeof userRole>;

export const publicUser = z.object({
  id: uuid,
  email: z.string(),
  displayName: z.string(),
  role: userRole,
  createdAt: isoDateTime,
});
export type PublicUser = z.infer<typeof publicUser>;

export const registerRequest = z.object({ email, password: newPassword, displayName });
export type RegisterRequest = z.infer<typeof registerRequest>;

export const loginRequest = z.object({ email, password: z.string().min(1, 'is required').max(200) });
export type LoginRequest = z.infer<typeof loginRequest>;

/** `token` is the short-lived bearer token; `refreshToken` buys a new one without the password. */
export const authResponse = z.object({
  token: z.string(),
  refreshToken: z.string(),
  expiresIn: z.number().int(),
  user: publicUser,
});
export type AuthResponse = z.infer<typeof authResponse>;

export const refreshRequest = z.object({ refreshToken: z.string().min(1, 'is required').max(2000) });
export const forgotRequest = z.object({ email });
export type ForgotRequest = z.infer<typeof forgotRequest>;
/** 202 whether or not an account has that e-mail, so the answer tells nobody who has an account. */
export const forgotResponse = z.object({ accepted: z.literal(true), message: z.string() });
export type ForgotResponse = z.infer<typeof forgotResponse>;
/** Answered with an AuthResponse: the new password signs the user in, and every older session ends. */
export const resetRequest = z.object({ token: z.string().min(10, 'is not a valid reset token').max(200), password: newPassword });
export type ResetRequest = z.infer<typeof resetRequest>;

export const updateMeRequest = z
  .object({
    displayName: displayName.optional(),
    email: email.optional(),
    currentPassword: z.string().max(200).optional(),
    newPassword: newPassword.optional(),
  })
  .strict()
  // A stolen session must not be enough to take the account: the e-mail and the password need the password.
  .refine((body) => (!body.newPassword && !body.email) || body.currentPassword, {
    message: 'is required to change the e-mail or the password',
    path: ['currentPassword'],
  });
export type UpdateMeRequest = z.infer<typeof updateMeRequest>;

/** One signed-in device on the You screen. */
export const deviceSession = z.object({
  id: uuid,
  device: z.string(),
  createdAt: isoDateTime,
  lastUsedAt: isoDateTime,
  current: z.boolean(),
});
export type DeviceSession = z.infer<typeof deviceSession>;
export const deviceSessionList = z.object({ items: z.array(deviceSession) });
export type DeviceSessionList = z.infer<typeof deviceSessionList>;

/** The link mailed to the old address after an e-mail change. */
export const undoEmailRequest = z.object({ token: z.string().min(10, 'is not a valid link').max(200) });
/** The address is back; every session ended, and the reset token lets the owner choose a new password at once. */
export const undoEmailResponse = z.object({ email: z.string(), resetToken: z.string() });
export type UndoEmailResponse = z.infer<typeof undoEmailResponse>;
