import { z } from 'zod';

/** Every account is a maker; instructors also run workshops; admins manage accounts. */
export const roles = ['maker', 'instructor', 'admin'] as const;
export const roleSchema = z.enum(roles);
export type Role = z.infer<typeof roleSchema>;

export const roleLabels: Record<Role, string> = {
  maker: 'Maker',
  instructor: 'Instructor',
  admin: 'Admin',
};
