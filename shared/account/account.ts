import { z } from 'zod';
import { accountSchema as accountWireSchema } from './account-wire.ts';
import { roleSchema } from './role-schema.ts';

export type { Account } from './account-wire.ts';

/** The account (GET /api/account) with the full zod build's methods, for the server and the admin screens. */
export const accountSchema = z.object(accountWireSchema.shape);

/** A row of the admin users table (GET /api/admin/users). */
export const adminUserSchema = accountSchema.omit({ units: true, defaultPaper: true, drillSetIds: true, massUnit: true, temperatureUnit: true, volumeUnit: true }).extend({
  disabled: z.boolean(),
  createdAt: z.string(),
});
export type AdminUser = z.infer<typeof adminUserSchema>;

export const adminUserListSchema = z.object({ users: z.array(adminUserSchema), total: z.number().int() });
export type AdminUserList = z.infer<typeof adminUserListSchema>;

/** The longest search the admin's user list takes. */
export const ADMIN_SEARCH_MAX = 200;

export const adminUserQuerySchema = z.object({
  search: z.string().trim().max(ADMIN_SEARCH_MAX).optional(),
  limit: z.coerce.number().int().min(1).max(200).default(50),
  offset: z.coerce.number().int().min(0).default(0),
});

export const adminUserChangeSchema = z
  .object({ role: roleSchema.optional(), disabled: z.boolean().optional() })
  .strict()
  .refine((change) => change.role !== undefined || change.disabled !== undefined, 'Give a role, disabled, or both');
export type AdminUserChange = z.infer<typeof adminUserChangeSchema>;
