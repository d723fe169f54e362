import { z } from 'zod';
import { massUnitSchema, paperPreferenceSchema, temperatureUnitSchema, unitSystemSchema, volumeUnitSchema } from './preferences.ts';
import { roleSchema } from './roles.ts';

/** The signed-in user as the API returns it (GET /api/account). */
export const accountSchema = z.object({
  id: z.string(),
  name: z.string(),
  email: z.string(),
  emailVerified: z.boolean(),
  role: roleSchema,
  units: unitSystemSchema,
  defaultPaper: paperPreferenceSchema,
  drillSetIds: z.array(z.string()),
  /** Burn log units: the maker's choice, or the ones that go with their length units. */
  massUnit: massUnitSchema,
  temperatureUnit: temperatureUnitSchema,
  volumeUnit: volumeUnitSchema,
});
export type Account = z.infer<typeof accountSchema>;

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
