import type { Design, Part } from '../design/design-schema.ts';
import { resolveDrill, type DrillLookup } from './drill-lookup.ts';
import { placeEndPattern } from './end-pattern.ts';
import type { DiscPiece, Hole, Mark, Piece, WrapStripPiece } from './layout-types.ts';
import { normalizeDeg } from './angles.ts';
import { placeSideRow } from './side-row.ts';
import { usableBottomDiameterMm, wrapStripLengthMm } from '../vessels/vessel.ts';
import { planWallBands, rowHeight } from './wall-bands.ts';

/** A hole mark's crosshair runs this far past the hole's edge (see shared/print/draw-hole.ts). */
export const MARK_REACH_PAST_HOLE_MM = 2;

/** Paper past the end of a wrap strip, to tape over its start (common practice, no source). */
export const OVERLAP_TAB_MM = 15;

export interface PlacedPart {
  pieces: Piece[];
  holes: Hole[];
  marks: Mark[];
  /** Side-row positions left out because they fell in a keep-out, by row id. */
  dropped: Map<string, number>;
}

/** Unrolls one part into its pieces (a wall strip, end discs) and places every hole on them. */
export function buildPart(part: Part, design: Design, drills: DrillLookup): PlacedPart {
  const out: PlacedPart = { pieces: [], holes: [], marks: [], dropped: new Map() };
  const vessel = part.vessel;
  const name = part.name ?? part.role;

  if (part.sideRows.length > 0) {
    const bands = planWallBands(part, drills);
    for (const band of bands) {
      const strip: WrapStripPiece = {
        kind: 'wrap-strip',
        id: bands.length === 1 ? `${part.id}:wall` : `${part.id}:wall-${band.reference}`,
        partId: part.id,
        role: part.role,
        name: bands.length === 1 ? `${name}, wall` : `${name}, wall (${band.reference === 'top' ? 'top band' : 'bottom band'})`,
        lengthMm: wrapStripLengthMm(vessel, design.paperThicknessMm),
        heightMm: band.toYMm - band.fromYMm,
        fromYMm: band.fromYMm,
        toYMm: band.toYMm,
        reference: band.reference,
        vesselHeightMm: vessel.heightMm,
        vesselDiameterMm: vessel.outerDiameterMm,
        overlapTabMm: OVERLAP_TAB_MM,
        seamAngleDeg: vessel.seamAngleDeg,
        markReachMm: Math.max(0, ...band.rows.map((row) => resolveDrill(drills, row.drillId).diameterMm / 2)) + MARK_REACH_PAST_HOLE_MM,
      };
      out.pieces.push(strip);
      out.marks.push({ kind: 'seam-line', pieceId: strip.id, xMm: 0 });
      for (const row of band.rows) {
        const drill = resolveDrill(drills, row.drillId);
        const yMm = rowHeight(row, vessel.heightMm);
        const { positions, dropped } = placeSideRow(row, drill.diameterMm, vessel.outerDiameterMm);
        if (dropped.length) out.dropped.set(row.id, dropped.length);
        out.marks.push({ kind: 'row-line', pieceId: strip.id, sourceId: row.id, label: row.label ?? row.id, yMm });
        for (const position of positions) {
          out.holes.push({
            id: `${strip.id}/${row.id}/${position.index}`,
            pieceId: strip.id,
            group: row.group,
            sourceId: row.id,
            index: position.index,
            // The strip starts at the seam: x grows with the angle counter-clockwise from it.
            xMm: (normalizeDeg(position.angleDeg - vessel.seamAngleDeg) / 360) * strip.lengthMm,
            yMm,
            diameterMm: drill.diameterMm,
            drillId: drill.id,
            drillLabel: drill.label,
            angleDeg: position.angleDeg,
          });
        }
      }
    }
  }

  for (const face of ['bottom', 'lid'] as const) {
    const patterns = part.endPatterns.filter((pattern) => pattern.face === face);
    if (patterns.length === 0) continue;
    const disc: DiscPiece = {
      kind: 'disc',
      id: `${part.id}:${face}`,
      partId: part.id,
      role: part.role,
      name: `${name}, ${face}`,
      face,
      diameterMm: usableBottomDiameterMm(vessel),
      vesselDiameterMm: vessel.outerDiameterMm,
      indexAngleDeg: vessel.seamAngleDeg,
    };
    out.pieces.push(disc);
    out.marks.push({ kind: 'centre-cross', pieceId: disc.id }, { kind: 'index-mark', pieceId: disc.id, angleDeg: 0 });
    for (const pattern of patterns) {
      const drill = resolveDrill(drills, pattern.drillId);
      const { rings, positions } = placeEndPattern(pattern);
      for (const ring of rings) out.marks.push({ kind: 'ring-circle', pieceId: disc.id, sourceId: pattern.id, label: pattern.label ?? pattern.id, radiusMm: ring.radiusMm });
      for (const position of positions) {
        // Angles run counter-clockwise from the index mark, which is drawn straight up (+y).
        const theta = ((position.angleDeg + 90) * Math.PI) / 180;
        out.holes.push({
          id: `${disc.id}/${pattern.id}/${position.index}`,
          pieceId: disc.id,
          group: pattern.group,
          sourceId: pattern.id,
          index: position.index,
          xMm: position.radiusMm * Math.cos(theta),
          yMm: position.radiusMm * Math.sin(theta),
          diameterMm: drill.diameterMm,
          drillId: drill.id,
          drillLabel: drill.label,
          angleDeg: position.angleDeg,
          radiusMm: position.radiusMm,
        });
      }
    }
  }
  // A flame concentrator is cut from a can end: its template is that end with the opening to cut out.
  if (part.role === 'concentrator' && part.openingDiameterMm !== undefined && !out.pieces.some((p) => p.id === `${part.id}:lid`)) {
    const disc: DiscPiece = {
      kind: 'disc',
      id: `${part.id}:lid`,
      partId: part.id,
      role: part.role,
      name: `${name}, opening`,
      face: 'lid',
      diameterMm: usableBottomDiameterMm(vessel),
      vesselDiameterMm: vessel.outerDiameterMm,
      indexAngleDeg: vessel.seamAngleDeg,
    };
    out.pieces.push(disc);
    out.marks.push({ kind: 'centre-cross', pieceId: disc.id }, { kind: 'opening-circle', pieceId: disc.id, radiusMm: part.openingDiameterMm / 2 });
  }
  return out;
}
