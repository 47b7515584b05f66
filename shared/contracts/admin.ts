import { z } from 'zod';
import { userRole } from './auth';
import { cursorQuery, isoDateTime, page, uuid } from './common';

export const adminUserQuery = cursorQuery.extend({
  /** Part of an e-mail or display name. */
  query: z.string().trim().max(100, 'must be at most 100 characters').optional(),
});
export type AdminUserQuery = z.infer<typeof adminUserQuery>;

export const adminUser = z.object({
  id: uuid,
  email: z.string(),
  displayName: z.string(),
  role: userRole,
  disabled: z.boolean(),
  createdAt: isoDateTime,
  hunts: z.number().int(),
  scans: z.number().int(),
  keepers: z.number().int(),
});
export type AdminUser = z.infer<typeof adminUser>;

/** Ordered by e-mail. */
export const adminUserPage = page(adminUser);
export type AdminUserPage = z.infer<typeof adminUserPage>;

/** Disabling ends the account's sessions at once. */
export const updateAdminUserRequest = z.object({ disabled: z.boolean({ message: 'must be true or false' }) }).strict();
export type UpdateAdminUserRequest = z.infer<typeof updateAdminUserRequest>;

export const adminStats = z.object({
  users: z.number().int(),
  collectors: z.number().int(),
  admins: z.number().int(),
  disabledUsers: z.number().int(),
  newUsersLast7Days: z.number().int(),
  hunts: z.number().int(),
  openHunts: z.number().int(),
  scans: z.number().int(),
  scansLast7Days: z.number().int(),
  keepers: z.number().int(),
  weightTables: z.number().int(),
  watchPatterns: z.number().int(),
});
export type AdminStats = z.infer<typeof adminStats>;
