/** Every account is a maker; instructors also run workshops; admins manage accounts. */
export const roles = ['maker', 'instructor', 'admin'] as const;
export type Role = (typeof roles)[number];

export const roleLabels: Record<Role, string> = {
  maker: 'Maker',
  instructor: 'Instructor',
  admin: 'Admin',
};
