import type { Design } from '../design/design-schema.ts';
import { layoutDesign } from '../layout/layout-design.ts';
import { formatCanCode } from '../vessels/can-code.ts';
import type { DesignSummary } from './library-schemas.ts';

/** Lays the design out and keeps what a version list shows: holes per size, cans, airflow ratio. */
export function summarizeDesign(design: Design): DesignSummary {
  const layout = layoutDesign(design);
  return {
    holes: layout.holes.length,
    bySize: layout.groups.flatMap((group) => group.sizes.map((size) => ({ group: group.group, drillLabel: size.drillLabel, count: size.count }))),
    parts: design.parts.map((part) => ({ id: part.id, role: part.role, vesselName: part.vessel.name, canCode: findCanCode(part.vessel.outerDiameterMm, part.vessel.heightMm) })),
    // Three decimals are far finer than the one the version list shows.
    ratio: layout.airflow.ratio === null ? null : Math.round(layout.airflow.ratio * 1000) / 1000,
    jetPitchMm: jetPitchMm(design),
  };
}

/**
 * The nominal pitch of the chamber's first jet row: its circumference over its positions
 * (an arc, the length the wrap strip measures).
 */
function jetPitchMm(design: Design): number | null {
  const chamber = design.parts.find((part) => part.role === 'burn-chamber');
  const row = chamber?.sideRows.find((r) => r.group === 'secondary');
  if (!chamber || !row) return null;
  return Math.round(((Math.PI * chamber.vessel.outerDiameterMm) / row.count) * 100) / 100;
}

/** A can under half a sixteenth of an inch has no code (formatCanCode refuses it). */
function findCanCode(diameterMm: number, heightMm: number): string | null {
  try {
    return formatCanCode(diameterMm, heightMm);
  } catch {
    return null;
  }
}
