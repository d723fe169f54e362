import { findCatalogueVessel } from './catalogue.ts';
import type { VesselInput } from './vessel.ts';

/** The figures a catalogue size fixes; the seam angle is where the maker turned the can, not its size. */
const SIZE_FIELDS = ['outerDiameterMm', 'heightMm', 'wallThicknessMm', 'bottomRimInsetMm'] as const;
type SizeField = (typeof SIZE_FIELDS)[number];

/**
 * A vessel after the maker changes its figures. A catalogue can whose size changes is no longer
 * that catalogue size: it becomes a measured can named "Based on 303x406, edited", so no kit
 * prints the catalogue name over a can of another size. Seam and name edits keep the source.
 */
export function editVessel(vessel: VesselInput, change: Partial<VesselInput>): VesselInput {
  const next = { ...vessel, ...change };
  const resized = SIZE_FIELDS.some((field: SizeField) => field in change && change[field] !== vessel[field]);
  if (vessel.source !== 'catalogue' || !resized) return next;
  const entry = vessel.catalogueId ? findCatalogueVessel(vessel.catalogueId) : undefined;
  const { catalogueId: _dropped, ...rest } = next;
  return { ...rest, source: 'measured', name: `Based on ${entry?.code ?? entry?.name ?? vessel.name}, edited` };
}

/** A can measured by tape: the tape reads pi x D (circle circumference), so D = C / pi. */
export const diameterFromCircumference = (circumferenceMm: number): number => circumferenceMm / Math.PI;
