import { z } from 'zod';
import { roles } from './roles.ts';

/** A role as the server checks it (roles.ts stays free of zod: every page's first chunk reads it). */
export const roleSchema = z.enum(roles);
