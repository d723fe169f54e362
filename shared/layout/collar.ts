import type { Design, Part } from '../design/design-schema.ts';
import { holeAreaMm2 } from '../airflow/open-area.ts';
import { normalizeDeg } from './angles.ts';
import { MARK_REACH_PAST_HOLE_MM, OVERLAP_TAB_MM } from './build-pieces.ts';
import { wrapStripLengthMm } from '../vessels/vessel.ts';
import { rowHeight } from './wall-bands.ts';
import type { Hole, Mark, WrapStripPiece } from './layout-types.ts';

/**
 * An intake collar: a band round the shell over its intake row, drilled with the same holes at the
 * same angles. Turned on the shell, its holes slide off the shell's and the intake closes partly;
 * its strip carries a scale of how open the intake is at each mark. Its holes are not air openings
 * of their own: the airflow totals leave them out, and the range it gives is reported instead.
 */

/** The shell intake row a collar follows: the shell's first intake row on its wall. */
export function followedIntakeRow(design: Pick<Design, 'parts'>): { shell: Part; row: Part['sideRows'][number] } | undefined {
  const shell = design.parts.find((p) => p.role === 'shell');
  const row = shell?.sideRows.find((r) => r.group === 'intake');
  return shell && row ? { shell, row } : undefined;
}

/** Where a collar usually stands: centred on the intake row it follows, up from the shell's bottom. */
export function usualCollarBottomMm(design: Pick<Design, 'parts'>, collar: Part): number {
  const followed = followedIntakeRow(design);
  if (!followed) return 0;
  return Math.max(0, rowHeight(followed.row, followed.shell.vessel.heightMm) - collar.vessel.heightMm / 2);
}

/**
 * Area common to two circles of radius r whose centres are s apart (the lens of two equal
 * circles): 2 r^2 acos(s / 2r) - (s / 2) sqrt(4 r^2 - s^2), 0 once s >= 2r
 * (circle-circle intersection, E. W. Weisstein, MathWorld "Circle-Circle Intersection").
 */
export function lensAreaMm2(radiusMm: number, distanceMm: number): number {
  const r = radiusMm;
  const s = Math.abs(distanceMm);
  if (s >= 2 * r) return 0;
  return 2 * r * r * Math.acos(s / (2 * r)) - (s / 2) * Math.sqrt(4 * r * r - s * s);
}

export interface CollarSetting {
  /** What the scale prints: open, 3/4, 1/2, 1/4, closed (or least open). */
  label: string;
  /** Open area over the fully open area. */
  fraction: number;
  /** How far the collar is turned from fully open: degrees, and mm along the shell's outside. */
  turnDeg: number;
  offsetMm: number;
  openAreaMm2: number;
}

export interface CollarRange {
  partId: string;
  shellPartId: string;
  /** The shell's intake area with the collar fully open (every hole over its partner). */
  fullAreaMm2: number;
  /** The least the intake can be by turning the collar, and whether that is closed (under 0.5 %). */
  leastAreaMm2: number;
  closes: boolean;
  settings: CollarSetting[];
}

/**
 * Open area of the intake with the collar turned by turnDeg: the sum of the lenses of every collar
 * hole with every shell hole it overlaps, both treated as circles on the unrolled shell wall.
 */
export function collarOpenAreaMm2(shellHoles: Hole[], shellDiameterMm: number, turnDeg: number): number {
  return overlapArea(holePairs(shellHoles, shellDiameterMm, Math.abs(turnDeg)), turnDeg);
}

/** A collar hole and a shell hole that may overlap: their angle apart (signed) and the lens radius. */
interface HolePair {
  apartDeg: number;
  radiusMm: number;
  limitMm: number;
  mmPerDeg: number;
}

/**
 * The pairs that can overlap for turns up to maxTurnDeg, found once: a hole meets only its
 * neighbours, so each turn then costs a few lenses a hole, not every pair.
 */
function holePairs(shellHoles: Hole[], shellDiameterMm: number, maxTurnDeg: number): HolePair[] {
  const mmPerDeg = (Math.PI * shellDiameterMm) / 360;
  const pairs: HolePair[] = [];
  for (const collarHole of shellHoles) {
    for (const shellHole of shellHoles) {
      let apartDeg = normalizeDeg(collarHole.angleDeg - shellHole.angleDeg);
      if (apartDeg > 180) apartDeg -= 360;
      if ((Math.abs(apartDeg) - maxTurnDeg) * mmPerDeg < shellHole.diameterMm) pairs.push({ apartDeg, radiusMm: shellHole.diameterMm / 2, limitMm: shellHole.diameterMm, mmPerDeg });
    }
  }
  return pairs;
}

function overlapArea(pairs: HolePair[], turnDeg: number): number {
  let total = 0;
  for (const pair of pairs) {
    let apart = Math.abs(pair.apartDeg + turnDeg) % 360;
    if (apart > 180) apart = 360 - apart;
    const s = apart * pair.mmPerDeg;
    if (s < pair.limitMm) total += lensAreaMm2(pair.radiusMm, s);
  }
  return total;
}

const SCALE_FRACTIONS: [number, string][] = [
  [0.75, '3/4'],
  [0.5, '1/2'],
  [0.25, '1/4'],
];

/** The collar's scale: turns at which the intake is open, 3/4, 1/2, 1/4 and closed (or least open). */
export function collarRange(partId: string, shellPartId: string, shellHoles: Hole[], shellDiameterMm: number): CollarRange {
  const fullAreaMm2 = shellHoles.reduce((sum, h) => sum + holeAreaMm2(h.diameterMm), 0);
  const mmPerDeg = (Math.PI * shellDiameterMm) / 360;
  const widestDeg = Math.max(0, ...shellHoles.map((h) => h.diameterMm)) / mmPerDeg;
  const pairs = holePairs(shellHoles, shellDiameterMm, widestDeg);
  const area = (turnDeg: number) => overlapArea(pairs, turnDeg);
  const setting = (label: string, turnDeg: number): CollarSetting => {
    const openAreaMm2 = area(turnDeg);
    return { label, turnDeg, offsetMm: turnDeg * mmPerDeg, openAreaMm2, fraction: fullAreaMm2 > 0 ? openAreaMm2 / fullAreaMm2 : 0 };
  };
  if (shellHoles.length === 0 || fullAreaMm2 === 0) return { partId, shellPartId, fullAreaMm2: 0, leastAreaMm2: 0, closes: true, settings: [setting('open', 0)] };

  // Turning one hole-width closes a lone hole; neighbours may open again before that. Find the least
  // open turn in the first hole-width by sampling, then each scale mark by bisection before it
  // (the area only falls from fully open to the least).
  const steps = 64;
  let leastDeg = 0;
  let leastArea = fullAreaMm2;
  for (let i = 1; i <= steps; i++) {
    const t = (widestDeg * i) / steps;
    const a = area(t);
    if (a < leastArea - 1e-9) {
      leastArea = a;
      leastDeg = t;
    }
  }
  // Narrow the least open turn down between the samples either side of it (golden-section search).
  {
    let lo = Math.max(0, leastDeg - widestDeg / steps);
    let hi = Math.min(widestDeg, leastDeg + widestDeg / steps);
    const g = (Math.sqrt(5) - 1) / 2;
    for (let i = 0; i < 40; i++) {
      const a = hi - g * (hi - lo);
      const b = lo + g * (hi - lo);
      if (area(a) < area(b)) hi = b;
      else lo = a;
    }
    const t = (lo + hi) / 2;
    if (area(t) < leastArea) {
      leastDeg = t;
      leastArea = area(t);
    }
  }
  const closes = leastArea < 0.005 * fullAreaMm2;
  if (closes) {
    // The first turn at which no hole overlaps any more: bisect down to where the area leaves 0.
    let lo = 0;
    let hi = leastDeg;
    for (let i = 0; i < 60; i++) {
      const mid = (lo + hi) / 2;
      if (area(mid) > 1e-9) lo = mid;
      else hi = mid;
    }
    leastDeg = hi;
    leastArea = area(hi);
  }
  const settings: CollarSetting[] = [setting('open', 0)];
  for (const [fraction, label] of SCALE_FRACTIONS) {
    const target = fraction * fullAreaMm2;
    if (target <= leastArea) continue;
    let lo = 0;
    let hi = leastDeg;
    for (let i = 0; i < 60; i++) {
      const mid = (lo + hi) / 2;
      if (area(mid) > target) lo = mid;
      else hi = mid;
    }
    settings.push(setting(label, (lo + hi) / 2));
  }
  settings.push(setting(closes ? 'closed' : 'least', leastDeg));
  return { partId, shellPartId, fullAreaMm2, leastAreaMm2: leastArea, closes, settings };
}

export interface BuiltCollar {
  piece: WrapStripPiece;
  holes: Hole[];
  marks: Mark[];
  range: CollarRange;
}

/**
 * The collar's strip: the shell's intake holes at the same angles and the same height on the
 * stove, measured up from the collar's own bottom edge, and the scale along its top edge read
 * against the shell's seam: fully open, the collar's start line sits over the seam; the marks run
 * back from the strip's end (where it meets that start line), one for each setting's turn.
 */
export function buildCollar(collar: Part, collarBottomMm: number, shell: Part, shellIntake: Hole[], design: Design): BuiltCollar {
  const vessel = collar.vessel;
  const name = collar.name?.trim() || 'Intake collar';
  const lengthMm = wrapStripLengthMm(vessel, design.paperThicknessMm);
  const piece: WrapStripPiece = {
    kind: 'wrap-strip',
    id: `${collar.id}:wall`,
    partId: collar.id,
    role: collar.role,
    name: `${name}, band`,
    lengthMm,
    heightMm: vessel.heightMm,
    fromYMm: 0,
    toYMm: vessel.heightMm,
    reference: 'bottom',
    vesselHeightMm: vessel.heightMm,
    vesselDiameterMm: vessel.outerDiameterMm,
    overlapTabMm: OVERLAP_TAB_MM,
    seamAngleDeg: shell.vessel.seamAngleDeg,
    markReachMm: Math.max(0, ...shellIntake.map((h) => h.diameterMm / 2)) + MARK_REACH_PAST_HOLE_MM,
  };
  const holes: Hole[] = shellIntake.map((h) => ({
    ...h,
    id: `${piece.id}/${h.sourceId}/${h.index}`,
    pieceId: piece.id,
    xMm: (normalizeDeg(h.angleDeg - piece.seamAngleDeg) / 360) * lengthMm,
    yMm: h.yMm - collarBottomMm,
  }));
  const range = collarRange(collar.id, shell.id, shellIntake, shell.vessel.outerDiameterMm);
  const marks: Mark[] = [{ kind: 'seam-line', pieceId: piece.id, xMm: 0 }];
  const first = shellIntake[0];
  if (first) marks.push({ kind: 'row-line', pieceId: piece.id, sourceId: first.sourceId, label: 'Collar holes', yMm: first.yMm - collarBottomMm });
  marks.push({
    kind: 'collar-scale',
    pieceId: piece.id,
    ticks: range.settings.map((s) => ({ xMm: lengthMm - (s.turnDeg / 360) * lengthMm, label: s.label, fraction: s.fraction })),
  });
  return { piece, holes, marks, range };
}
