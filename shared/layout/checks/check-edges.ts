import type { Hole } from '../layout-types.ts';
import { angularDistanceDeg } from '../angles.ts';
import { FindingGroups, mm, type Check } from './check-context.ts';
import { nameSource } from '../../design/name-source.ts';

/**
 * Holes off the part (error) or too close to its edges (warning): the top edge and the bottom
 * chime of a wall, the side seam, the rim of a can end. Margins are the design's rules.
 */
/** A margin met to within a micrometre is met: geometry built exactly on a limit must pass it. */
const EPSILON_MM = 1e-6;

export const checkEdges: Check = ({ design, pieces, holesByPiece }) => {
  const rules = design.rules;
  const found = new FindingGroups();
  const flag = (hole: Hole, rule: string, severity: 'error' | 'warning', pieceId: string, message: string, numbers: Record<string, number>) =>
    found.add(`${rule}|${hole.sourceId}|${pieceId}`, () => ({ rule, severity, pieceId, message, numbers }), [hole.id], (finding) => {
      for (const [key, value] of Object.entries(numbers)) if (key.endsWith('Mm') && key !== 'minimumMm' && value < (finding.numbers[key] ?? Infinity)) finding.numbers[key] = value;
    });

  for (const piece of pieces) {
    for (const hole of holesByPiece.get(piece.id) ?? []) {
      const r = hole.diameterMm / 2;
      const where = `"${nameSource(design, hole.sourceId)}" on ${piece.name}`;
      if (piece.kind === 'wrap-strip') {
        const below = hole.yMm - r;
        const above = piece.vesselHeightMm - (hole.yMm + r);
        if (below < -EPSILON_MM || above < -EPSILON_MM) {
          flag(hole, 'leaves-part', 'error', piece.id, `Holes of ${where} run past the ${below < 0 ? 'bottom' : 'top'} of the can.`, { overhangMm: mm(-Math.min(below, above)) });
          continue;
        }
        if (above < rules.topMarginMm - EPSILON_MM) flag(hole, 'near-top-edge', 'warning', piece.id, `Holes of ${where} are ${mm(above)} mm from the top edge (keep ${rules.topMarginMm} mm): the rim bends and the metal tears there.`, { clearanceMm: mm(above), minimumMm: rules.topMarginMm });
        if (below < rules.chimeMarginMm - EPSILON_MM) flag(hole, 'near-bottom-chime', 'warning', piece.id, `Holes of ${where} are ${mm(below)} mm from the bottom edge (keep ${rules.chimeMarginMm} mm): the chime seam is thick and the bit wanders.`, { clearanceMm: mm(below), minimumMm: rules.chimeMarginMm });
        const seamMm = (angularDistanceDeg(hole.angleDeg, piece.seamAngleDeg) / 360) * Math.PI * piece.vesselDiameterMm - r;
        if (seamMm < rules.seamMarginMm - EPSILON_MM) {
          const text = seamMm < 0 ? `Holes of ${where} cut into the side seam` : `Holes of ${where} are ${mm(seamMm)} mm from the side seam (keep ${rules.seamMarginMm} mm)`;
          flag(hole, 'near-seam', 'warning', piece.id, `${text}: the seam is doubled metal and may split.`, { clearanceMm: mm(seamMm), minimumMm: rules.seamMarginMm });
        }
      } else {
        const usable = piece.diameterMm / 2;
        const outer = Math.hypot(hole.xMm, hole.yMm) + r;
        if (outer > usable + EPSILON_MM) {
          flag(hole, 'outside-usable-bottom', 'error', piece.id, `Holes of ${where} reach ${mm(outer - usable)} mm past the flat of the can end, into the rim.`, { overhangMm: mm(outer - usable), usableRadiusMm: mm(usable) });
        } else if (usable - outer < rules.rimMarginMm - EPSILON_MM) {
          flag(hole, 'near-rim', 'warning', piece.id, `Holes of ${where} are ${mm(usable - outer)} mm from the rim (keep ${rules.rimMarginMm} mm).`, { clearanceMm: mm(usable - outer), minimumMm: rules.rimMarginMm });
        }
      }
    }
  }
  return found.list();
};
