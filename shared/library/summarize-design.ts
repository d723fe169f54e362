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
  };
}

/** A can under half a sixteenth of an inch has no code (formatCanCode refuses it). */
function findCanCode(diameterMm: number, heightMm: number): string | null {
  try {
    return formatCanCode(diameterMm, heightMm);
  } catch {
    return null;
  }
}
