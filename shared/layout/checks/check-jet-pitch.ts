import type { Hole } from '../layout-types.ts';
import { findWidestGap, gapOnWallMm } from '../widest-gap.ts';
import { mm, type Check } from './check-context.ts';
import { nameSource } from '../../design/name-source.ts';

/**
 * Secondary jets must sit close enough for their flames to join into one ring: warn above the
 * design's warning pitch, error above its error pitch (defaults 5/8 in and 3/4 in: common
 * practice, no source). A keep-out gap counts as a pitch too: the ring breaks there.
 */
export const checkJetPitch: Check = ({ design, pieces, holesByPiece }) => {
  const { jetPitchWarnMm, jetPitchErrorMm } = design.rules;
  const findings = [];
  for (const piece of pieces) {
    if (piece.kind !== 'wrap-strip') continue;
    const rows = new Map<string, Hole[]>();
    for (const hole of holesByPiece.get(piece.id) ?? []) {
      if (hole.group !== 'secondary') continue;
      rows.set(hole.sourceId, [...(rows.get(hole.sourceId) ?? []), hole]);
    }
    for (const [rowId, holes] of rows) {
      if (holes.length < 2) continue;
      const sorted = [...holes].sort((a, b) => a.angleDeg - b.angleDeg);
      const gap = findWidestGap(sorted.map((h) => h.angleDeg));
      const widest = { from: sorted[gap.from]!, to: sorted[gap.to]! };
      const pitchMm = gapOnWallMm(gap.gapDeg, piece.vesselDiameterMm);
      // The limits apply exactly as the design states them: no allowance is added.
      if (pitchMm <= jetPitchWarnMm) continue;
      const error = pitchMm > jetPitchErrorMm;
      findings.push({
        rule: 'jet-pitch',
        severity: error ? ('error' as const) : ('warning' as const),
        pieceId: piece.id,
        message: `Jets of "${nameSource(design, rowId)}" are up to ${mm(pitchMm)} mm apart (limit ${mm(error ? jetPitchErrorMm : jetPitchWarnMm)} mm): their flames will not join into one ring. Add holes or close the gap.`,
        numbers: { pitchMm: mm(pitchMm), warnMm: jetPitchWarnMm, errorMm: jetPitchErrorMm },
        holeIds: [widest.from.id, widest.to.id],
      });
    }
  }
  return findings;
};
