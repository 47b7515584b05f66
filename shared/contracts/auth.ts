import { z } from 'zod';
import { isoDateTime, uuid } from './common';

export const email = z
  .string()
  .trim()
  .toLowerCase()
  .max(254, 'must be at most 254 characters')
  .email('must be an e-mail address');

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
  .refine((body) => !body.newPassword || body.currentPassword, {
    message: 'is required to set a new password',
    path: ['currentPassword'],
  });
export type UpdateMeRequest = z.infer<typeof updateMeRequest>;
