import { z } from 'zod';

/** Length units a maker reads and types: inches (with fractions) or millimetres. */
export const unitSystemSchema = z.enum(['in', 'mm']);
export type UnitSystem = z.infer<typeof unitSystemSchema>;

export const preferencesSchema = z.object({ units: unitSystemSchema }).strict();
export type Preferences = z.infer<typeof preferencesSchema>;
