import { z } from 'zod';
import { unitSystems } from '../units/length.ts';

export const unitSystemSchema = z.enum(unitSystems);
export type { UnitSystem } from '../units/length.ts';

export const paperPreferenceSchema = z.enum(['letter', 'legal', 'tabloid', 'a4', 'a3']);

/** What a maker sets once: units, the paper their printer takes, and the drills they own. */
export const preferencesSchema = z
  .object({
    units: unitSystemSchema.optional(),
    defaultPaper: paperPreferenceSchema.optional(),
    drillSetIds: z.array(z.string().trim().min(1).max(20)).max(400).optional(),
  })
  .strict()
  .refine((p) => p.units !== undefined || p.defaultPaper !== undefined || p.drillSetIds !== undefined, 'Give at least one preference');
export type Preferences = z.infer<typeof preferencesSchema>;
