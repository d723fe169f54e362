import { z } from 'zod';
import { massUnits, temperatureUnits, volumeUnits } from '../units/burn-units.ts';
import { unitSystems } from '../units/length.ts';
import { paperIds } from './account-wire.ts';

export const unitSystemSchema = z.enum(unitSystems);
export type { UnitSystem } from '../units/length.ts';

export const massUnitSchema = z.enum(massUnits);
export const temperatureUnitSchema = z.enum(temperatureUnits);
export const volumeUnitSchema = z.enum(volumeUnits);

export const paperPreferenceSchema = z.enum(paperIds);

/** What a maker sets once: units (lengths, and for the burn log mass, temperature, volume), the paper their printer takes, and the drills they own. */
export const preferencesSchema = z
  .object({
    units: unitSystemSchema.optional(),
    defaultPaper: paperPreferenceSchema.optional(),
    drillSetIds: z.array(z.string().trim().min(1).max(20)).max(400).optional(),
    massUnit: massUnitSchema.optional(),
    temperatureUnit: temperatureUnitSchema.optional(),
    volumeUnit: volumeUnitSchema.optional(),
  })
  .strict()
  .refine((p) => Object.values(p).some((value) => value !== undefined), 'Give at least one preference');
export type Preferences = z.infer<typeof preferencesSchema>;
