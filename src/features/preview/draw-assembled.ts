import { estimateTextWidthMm, type DrawingContext } from '../../../shared/drawing/drawing-context.ts';
import type { Hole, Layout, WrapStripPiece } from '../../../shared/layout/layout-types.ts';
import { strokes, type } from '../../../shared/print/draw-style.ts';
import type { Rect } from '../../../shared/print/imposition-types.ts';
import { describeLength, type KitText } from '../../../shared/print/kit-text.ts';

/** One can's wall with every hole on its strips, for the side view. */
export interface AssembledCan {
  partId: string;
  name: string;
  diameterMm: number;
  heightMm: number;
  seamAngleDeg: number;
  holes: Hole[];
  /** Row heights up from the can's bottom, for faint guides. */
  rowYs: number[];
}

/** Room round the can for the title above and the size note below. */
const TOP_MM = 9;
const SIDE_MM = 6;
const FOOT_MM = 12;
/** Segments of a hole's ellipse: smooth at any zoom a preview allows (common practice, no source). */
const ELLIPSE_SEGMENTS = 24;
/** Holes seen nearly edge-on (under about 3 degrees of their face) are left out. */
const EDGE_ON_COS = 0.05;

/** The part's wall as one can, or null when the part has no wall strip. */
export function collectAssembledCan(layout: Layout, partId: string, name: string): AssembledCan | null {
  const strips = layout.pieces.filter((p): p is WrapStripPiece => p.kind === 'wrap-strip' && p.partId === partId);
  const first = strips[0];
  if (!first) return null;
  const ids = new Set(strips.map((s) => s.id));
  const rowYs = layout.marks.flatMap((m) => (m.kind === 'row-line' && ids.has(m.pieceId) ? [m.yMm] : []));
  return { partId, name, diameterMm: first.vesselDiameterMm, heightMm: first.vesselHeightMm, seamAngleDeg: first.seamAngleDeg, holes: layout.holes.filter((h) => ids.has(h.pieceId)), rowYs };
}

/** The title and the two note lines under the can. */
function describeCan(can: AssembledCan, frontDeg: number, text: KitText): { title: string; notes: [string, string] } {
  const seamInFront = Math.cos(((can.seamAngleDeg - frontDeg) * Math.PI) / 180) > EDGE_ON_COS;
  return {
    title: `${can.name}, assembled`,
    notes: [`${describeLength(can.diameterMm, text)} across, ${describeLength(can.heightMm, text)} tall`, `Seen from the side, ${seamInFront ? 'seam in front' : 'seam at the back'}`],
  };
}

/** The box the side view takes (wide enough for its words), with the can's top-left corner at (SIDE_MM, TOP_MM). */
export function assembledBox(can: AssembledCan, frontDeg: number, text: KitText): Rect {
  const { title, notes } = describeCan(can, frontDeg, text);
  const words = Math.max(estimateTextWidthMm(title, type.title.sizeMm, 'bold') + 2, ...notes.map((n) => estimateTextWidthMm(n, type.small.sizeMm) + SIDE_MM + 2));
  return { x: 0, y: 0, width: Math.max(can.diameterMm + 2 * SIDE_MM, words), height: TOP_MM + can.heightMm + FOOT_MM };
}

/**
 * Where a wall hole appears seen from outside at frontDeg (an orthographic side view): across at
 * R sin(phi) from the can's axis, where phi is its angle from the front, and foreshortened to
 * cos(phi) of its width; null for holes on the back half. Angles run counter-clockwise seen from
 * above, so from the front they run left to right (worked geometry).
 */
export function projectHole(can: AssembledCan, hole: Hole, frontDeg: number): { x: number; y: number; squash: number } | null {
  const phi = ((hole.angleDeg - frontDeg) * Math.PI) / 180;
  const squash = Math.cos(phi);
  if (squash <= EDGE_ON_COS) return null;
  return { x: SIDE_MM + can.diameterMm / 2 + (can.diameterMm / 2) * Math.sin(phi), y: TOP_MM + can.heightMm - hole.yMm, squash };
}

/**
 * The can from the side: its outline, row guides, the seam when it faces the viewer, and the
 * holes of the front half as ellipses. Sheet mm, box at (0, 0) (see assembledBox).
 */
export function drawAssembled(ctx: DrawingContext, can: AssembledCan, frontDeg: number, text: KitText, flagged: Set<string>): void {
  const box = assembledBox(can, frontDeg, text);
  const { title, notes } = describeCan(can, frontDeg, text);
  const D = can.diameterMm;
  const H = can.heightMm;
  ctx.rect(box.x, box.y, box.width, box.height, { fill: 'paper' });
  ctx.rect(SIDE_MM, TOP_MM, D, H, { stroke: strokes.edge });
  for (const y of can.rowYs) ctx.line(SIDE_MM, TOP_MM + H - y, SIDE_MM + D, TOP_MM + H - y, strokes.guide);

  const seam = ((can.seamAngleDeg - frontDeg) * Math.PI) / 180;
  if (Math.cos(seam) > EDGE_ON_COS) {
    const x = SIDE_MM + D / 2 + (D / 2) * Math.sin(seam);
    ctx.line(x, TOP_MM, x, TOP_MM + H, { ...strokes.guide, color: 'ink' });
    ctx.text(x - 1, TOP_MM + H - 2, 'Seam', { ...type.tiny, rotateDeg: 90 });
  }

  for (const hole of can.holes) {
    const at = projectHole(can, hole, frontDeg);
    if (!at) continue;
    const a = (hole.diameterMm / 2) * at.squash;
    const b = hole.diameterMm / 2;
    const points: [number, number][] = [];
    for (let i = 0; i < ELLIPSE_SEGMENTS; i++) {
      const t = (i / ELLIPSE_SEGMENTS) * 2 * Math.PI;
      points.push([at.x + a * Math.cos(t), at.y + b * Math.sin(t)]);
    }
    const edge = flagged.has(hole.id) ? { ...strokes.hole, color: 'accent' as const, widthMm: 0.4 } : strokes.hole;
    ctx.polyline(points, { fill: 'soft', closed: true });
    ctx.polyline(points, { stroke: edge, closed: true });
  }

  ctx.text(1, 4, title, type.title);
  ctx.text(SIDE_MM, TOP_MM + H + 4.5, notes[0], type.small);
  ctx.text(SIDE_MM, TOP_MM + H + 8.5, notes[1], type.small);
}
