import * as z from 'zod/mini';
import { massUnits, temperatureUnits, volumeUnits } from '../units/burn-units.ts';
import { unitSystems } from '../units/length.ts';
import { roles } from './roles.ts';

/** Paper sizes a maker can choose as their default (shared/print/paper.ts has their measures). */
export const paperIds = ['letter', 'legal', 'tabloid', 'a4', 'a3'] as const;

/**
 * The signed-in user as the API returns it (GET /api/account). Built with zod's tree-shakable
 * build (zod/mini), because every page checks the session: the first page a visitor opens then
 * carries a few kB of validator rather than the whole of zod. The server extends it with the full
 * build (shared/account/account.ts), so there is one definition of the shape.
 */
export const accountSchema = z.object({
  id: z.string(),
  name: z.string(),
  email: z.string(),
  emailVerified: z.boolean(),
  role: z.enum(roles),
  units: z.enum(unitSystems),
  defaultPaper: z.enum(paperIds),
  drillSetIds: z.array(z.string()),
  /** Burn log units: the maker's choice, or the ones that go with their length units. */
  massUnit: z.enum(massUnits),
  temperatureUnit: z.enum(temperatureUnits),
  volumeUnit: z.enum(volumeUnits),
});
export type Account = z.infer<typeof accountSchema>;
