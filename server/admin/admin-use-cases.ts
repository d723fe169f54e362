import { APIError } from 'better-auth/api';
import { adminUserSchema, type AdminUser, type AdminUserChange, type AdminUserList } from '../../shared/account/account.ts';
import { roleSchema } from '../../shared/account/role-schema.ts';
import type { Auth } from '../auth/auth.ts';
import { AppError, notFound } from '../http/app-error.ts';
import type { UserDirectory } from './user-directory.ts';

const storedUserSchema = adminUserSchema.extend({ role: roleSchema.catch('maker') });

/**
 * What an admin does to other accounts. Role and disable changes go through better-auth's
 * admin API with the admin's own request headers, so better-auth checks the permission a
 * second time and ends a disabled user's sessions itself.
 */
export function createAdminUseCases(auth: Auth, directory: UserDirectory) {
  function toAdminUser(row: { id: string; name: string; email: string; emailVerified: boolean; role: string | null; banned: boolean | null; createdAt: Date }): AdminUser {
    return storedUserSchema.parse({ ...row, disabled: row.banned === true, createdAt: row.createdAt.toISOString() });
  }

  async function getUser(userId: string): Promise<AdminUser> {
    const row = await directory.findById(userId);
    if (!row) throw notFound('That user');
    return toAdminUser(row);
  }

  return {
    async listUsers(query: { search?: string; limit: number; offset: number }): Promise<AdminUserList> {
      const { rows, total } = await directory.list(query);
      return { users: rows.map(toAdminUser), total };
    },

    async changeUser(adminId: string, userId: string, change: AdminUserChange, headers: Headers): Promise<AdminUser> {
      // An admin changing their own role or disabling themselves could leave the site with no admin.
      if (userId === adminId) throw new AppError(409, 'SELF_CHANGE', 'You cannot change your own role or disable your own account. Ask another admin.');
      try {
        if (change.role !== undefined) await auth.api.setRole({ body: { userId, role: change.role }, headers });
        if (change.disabled === true) await auth.api.banUser({ body: { userId, banReason: 'Disabled by an admin' }, headers });
        if (change.disabled === false) await auth.api.unbanUser({ body: { userId }, headers });
      } catch (error) {
        throw fromAuthError(error);
      }
      return getUser(userId);
    },
  };
}

function fromAuthError(error: unknown): unknown {
  if (!(error instanceof APIError)) return error;
  const message = (error.body as { message?: string } | undefined)?.message ?? error.message;
  if (error.statusCode === 404) return notFound('That user');
  return new AppError(error.statusCode, String(error.status), message);
}

export type AdminUseCases = ReturnType<typeof createAdminUseCases>;
