import { z } from 'zod';
import { unitSystems } from '../units/length.ts';

export const unitSystemSchema = z.enum(unitSystems);
export type { UnitSystem } from '../units/length.ts';

export const preferencesSchema = z.object({ units: unitSystemSchema }).strict();
export type Preferences = z.infer<typeof preferencesSchema>;
