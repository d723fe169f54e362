import { createAccessControl } from 'better-auth/plugins/access';
import { adminAc, defaultStatements } from 'better-auth/plugins/admin/access';

/**
 * Permissions for better-auth's admin plugin. Only admins may manage users; makers and
 * instructors hold no user-management permission (instructors' workshop rights are Canwright's
 * own checks, not better-auth's).
 */
export const accessControl = createAccessControl(defaultStatements);

export const authRoles = {
  maker: accessControl.newRole({ user: [], session: [] }),
  instructor: accessControl.newRole({ user: [], session: [] }),
  admin: adminAc,
};
