import type { EndPattern, RingPlan } from '../design/design-schema.ts';
import { normalizeDeg } from './angles.ts';

export interface Ring {
  radiusMm: number;
  count: number;
  phaseDeg: number;
}

/** The rings a plan asks for, before any check: radius, count and phase of each. */
export function planRings(plan: RingPlan): Ring[] {
  switch (plan.strategy) {
    case 'divider':
      // Doubling counts: each ring's marks halve the angles of the one inside it.
      return Array.from({ length: plan.ringCount }, (_, i) => ({ radiusMm: plan.firstRadiusMm + i * plan.ringSpacingMm, count: plan.firstCount * 2 ** i, phaseDeg: 0 }));
    case 'equal-pitch':
      return Array.from({ length: plan.ringCount }, (_, i) => {
        const radiusMm = plan.firstRadiusMm + i * plan.ringSpacingMm;
        return { radiusMm, count: Math.max(1, Math.round((2 * Math.PI * radiusMm) / plan.targetPitchMm)), phaseDeg: 0 };
      });
    case 'explicit':
      return plan.rings.map((ring) => ({ ...ring }));
  }
}

export interface EndPosition {
  index: number;
  ring: number;
  radiusMm: number;
  /** From the index mark, counter-clockwise as seen on the template. */
  angleDeg: number;
}

/** Every hole of an end pattern; ring -1 is the centre hole. */
export function placeEndPattern(pattern: EndPattern): { rings: Ring[]; positions: EndPosition[] } {
  // Stagger turns each ring by half its own pitch more than the ring inside it. With equal
  // counts that alternates (0, half, 0...); with doubling counts (4, 8, 16) no hole lines up
  // radially with a hole of the next ring.
  let turn = 0;
  const rings = planRings(pattern.rings).map((ring, i) => {
    if (pattern.stagger && i > 0) turn += 180 / ring.count;
    return { ...ring, phaseDeg: normalizeDeg(pattern.phaseDeg + ring.phaseDeg + turn) };
  });
  const positions: EndPosition[] = [];
  if (pattern.centerHole) positions.push({ index: 0, ring: -1, radiusMm: 0, angleDeg: 0 });
  rings.forEach((ring, r) => {
    for (let k = 0; k < ring.count; k++) {
      positions.push({ index: positions.length, ring: r, radiusMm: ring.radiusMm, angleDeg: normalizeDeg(ring.phaseDeg + (k * 360) / ring.count) });
    }
  });
  return { rings, positions };
}

/** How many holes a pattern will make, without placing them (for the hard cap). */
export function countEndPatternHoles(pattern: EndPattern): number {
  return (pattern.centerHole ? 1 : 0) + planRings(pattern.rings).reduce((sum, ring) => sum + ring.count, 0);
}
