import type { Drill } from './drill.ts';
import { allDrills, drillsInSeries, findDrill } from './series.ts';

/** A maker's own drills, by drill id, so a template only calls for drills they have. */
export interface DrillSet {
  name: string;
  drillIds: string[];
}

export interface DrillMatch {
  drill: Drill;
  /** drill - target, signed: positive means the hole comes out larger than asked. */
  offMm: number;
}

// Differences below a billionth of a millimetre are float noise, not a real size difference.
const EPSILON_MM = 1e-9;

const listRange = (first: number, last: number, step = 1): number[] =>
  Array.from({ length: Math.floor((last - first) / step) + 1 }, (_, i) => first + i * step);

// The fractional series runs 1/64, 2/64, ... so the drill for k/64 in sits at index k - 1.
const listFractionalIds = (first64ths: number, last64ths: number): string[] =>
  drillsInSeries('fractional').slice(first64ths - 1, last64ths).map((drill) => drill.id);

/** Sets as commonly sold boxed (common practice, no source), plus every drill for planning. */
export const commonDrillSets: readonly DrillSet[] = [
  { name: '29-piece fractional 1/16-1/2 in by 64ths', drillIds: listFractionalIds(4, 32) },
  { name: '13-piece fractional 1/16-1/4 in by 64ths', drillIds: listFractionalIds(4, 16) },
  { name: 'metric 1-10 mm by 0.5 mm', drillIds: listRange(10, 100, 5).map((tenths) => `mm:${tenths / 10}`) },
  { name: 'every drill', drillIds: allDrills().map((drill) => drill.id) },
];

/** The set's drills smallest first; unknown and repeated ids are dropped. */
export function resolveDrillSet(set: DrillSet): Drill[] {
  const drills = [...new Set(set.drillIds)].map(findDrill).filter((drill): drill is Drill => drill !== undefined);
  return drills.sort((a, b) => a.diameterMm - b.diameterMm);
}

/** The drill closest to target, either way; a tie goes to the smaller drill, since a hole can be opened up. */
export function nearestDrill(targetMm: number, set: readonly Drill[]): DrillMatch | undefined {
  if (!Number.isFinite(targetMm)) return undefined;
  let best: Drill | undefined;
  for (const drill of set) {
    if (!best) {
      best = drill;
      continue;
    }
    const gap = Math.abs(drill.diameterMm - targetMm) - Math.abs(best.diameterMm - targetMm);
    if (gap < -EPSILON_MM || (gap <= EPSILON_MM && drill.diameterMm < best.diameterMm)) best = drill;
  }
  return best && { drill: best, offMm: best.diameterMm - targetMm };
}

/** The largest drill no larger than target (offMm <= 0), for holes that must not come out oversize. */
export function nearestDrillNotOver(targetMm: number, set: readonly Drill[]): DrillMatch | undefined {
  if (!Number.isFinite(targetMm)) return undefined;
  let best: Drill | undefined;
  for (const drill of set) {
    if (drill.diameterMm > targetMm + EPSILON_MM) continue;
    if (!best || drill.diameterMm > best.diameterMm) best = drill;
  }
  // Clamped: a drill within float noise above target is the target size.
  return best && { drill: best, offMm: Math.min(0, best.diameterMm - targetMm) };
}
