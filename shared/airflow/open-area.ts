import type { HoleGroup } from '../design/design-schema.ts';
import type { GroupTotal, Hole } from '../layout/layout-types.ts';

/** Open area of one round hole: pi d^2 / 4. */
export function holeAreaMm2(diameterMm: number): number {
  return (Math.PI * diameterMm * diameterMm) / 4;
}

/** Open area of n holes of one size: n x pi d^2 / 4. */
export function openAreaMm2(count: number, diameterMm: number): number {
  return count * holeAreaMm2(diameterMm);
}

const groupOrder: HoleGroup[] = ['primary', 'secondary', 'intake', 'other'];

/** Hole count, open area and the drills used, per group. */
export function totalGroups(holes: Hole[]): GroupTotal[] {
  const totals = new Map<HoleGroup, GroupTotal>();
  for (const hole of holes) {
    let total = totals.get(hole.group);
    if (!total) {
      total = { group: hole.group, holeCount: 0, openAreaMm2: 0, sizes: [] };
      totals.set(hole.group, total);
    }
    total.holeCount++;
    total.openAreaMm2 += holeAreaMm2(hole.diameterMm);
    const size = total.sizes.find((s) => s.drillId === hole.drillId);
    if (size) size.count++;
    else total.sizes.push({ drillId: hole.drillId, drillLabel: hole.drillLabel, diameterMm: hole.diameterMm, count: 1 });
  }
  return groupOrder.flatMap((group) => {
    const total = totals.get(group);
    return total ? [{ ...total, sizes: total.sizes.sort((a, b) => b.diameterMm - a.diameterMm) }] : [];
  });
}
