import { designSchema, type Design, type DesignInput } from '../../shared/design/index.ts';
import { vesselFromCatalogue } from '../../shared/vessels/index.ts';

type PartInput = DesignInput['parts'][number];

/** A one-part design on a catalogue can; override what the test cares about. */
export function buildDesign(part: Partial<PartInput> = {}, overrides: Partial<DesignInput> = {}): Design {
  return designSchema.parse({
    schemaVersion: 1,
    name: 'Test stove',
    parts: [{ id: 'chamber', role: 'burn-chamber', vessel: vesselFromCatalogue('food-303x406'), ...part }],
    ...overrides,
  });
}

export const inchToMm = (inches: number) => inches * 25.4;
export const sqInToMm2 = (sqIn: number) => sqIn * 645.16;
