import { MM_PER_INCH } from '../units/length.ts';
import type { Drill } from './drill.ts';
import { nearestDrillNotOver } from './drill-set.ts';

// Rule of thumb (common practice, no source): pilot with about 1/8 in, never more than half the final size,
// and drill holes of 1/8 in or smaller in one go.
const PILOT_MAX_MM = MM_PER_INCH / 8;
// Float noise allowance, so a final of exactly 1/8 in (3.175 mm) counts as 1/8 in.
const EPSILON_MM = 1e-9;

/** The largest drill in the set no bigger than min(1/8 in, final / 2); undefined when no pilot is needed or none fits. */
export function suggestPilot(finalMm: number, set: readonly Drill[]): Drill | undefined {
  if (!Number.isFinite(finalMm) || finalMm <= PILOT_MAX_MM + EPSILON_MM) return undefined;
  return nearestDrillNotOver(Math.min(PILOT_MAX_MM, finalMm / 2), set)?.drill;
}
