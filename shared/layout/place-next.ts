import type { EndPattern, ExplicitRing, Part, Rules } from '../design/design-schema.ts';
import { usableBottomDiameterMm } from '../vessels/vessel.ts';
import { planRings } from './end-pattern.ts';
import { rowHeight } from './wall-bands.ts';

/**
 * Where a new explicit ring goes: one hole plus the design's minimum metal outside the outermost
 * ring (or the centre hole), so it cannot overlap what is there, with its holes at the outer
 * ring's pitch (never closer than the minimum metal allows). Null when no ring fits inside the
 * rim margin of the can end.
 */
export function placeNextRing(pattern: EndPattern, part: Part, drillDiameterMm: number, rules: Pick<Rules, 'minLigamentMm' | 'rimMarginMm'>): ExplicitRing | null {
  const rings = planRings(pattern.rings).sort((a, b) => a.radiusMm - b.radiusMm);
  const outer = rings.at(-1);
  const step = drillDiameterMm + rules.minLigamentMm;
  const radiusMm = (outer?.radiusMm ?? 0) + step;
  const usableRadius = usableBottomDiameterMm(part.vessel) / 2;
  if (radiusMm + drillDiameterMm / 2 + rules.rimMarginMm > usableRadius) return null;
  const circumference = 2 * Math.PI * radiusMm;
  const most = Math.max(1, Math.floor(circumference / step));
  const outerPitch = outer ? (2 * Math.PI * outer.radiusMm) / outer.count : step;
  const count = Math.min(most, Math.max(1, Math.round(circumference / outerPitch)));
  return { radiusMm, count, phaseDeg: 0 };
}

/**
 * A height for a new row round the wall that keeps clear of the rows there: from the top rim
 * down (jets usually sit high), each try one hole plus the minimum metal lower, within the
 * design's rim and chime margins. Null when the wall has no free band for it.
 */
export function placeNextRowHeight(part: Part, drillDiameterMm: number, diameterOf: (drillId: string) => number, rules: Pick<Rules, 'minLigamentMm' | 'topMarginMm' | 'chimeMarginMm'>): { from: 'top'; mm: number } | null {
  const H = part.vessel.heightMm;
  const r = drillDiameterMm / 2;
  const taken = part.sideRows.map((row) => ({ y: rowHeight(row, H), r: diameterOf(row.drillId) / 2 }));
  const step = drillDiameterMm + rules.minLigamentMm;
  for (let below = rules.topMarginMm + r; H - below - r >= rules.chimeMarginMm; below += step / 2) {
    const y = H - below;
    if (taken.every((t) => Math.abs(t.y - y) >= t.r + r + rules.minLigamentMm)) return { from: 'top', mm: below };
  }
  return null;
}
