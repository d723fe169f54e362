import { boundsOfCalls, type Bounds } from '../../../shared/drawing/drawing-bounds.ts';
import type { DrawingContext, Stroke } from '../../../shared/drawing/drawing-context.ts';
import { RecordingContext, type DrawCall } from '../../../shared/drawing/recording-context.ts';
import type { Layout, Piece } from '../../../shared/layout/layout-types.ts';
import { kitText } from '../../../shared/print/kit-text.ts';
import type { UnitSystem } from '../../../shared/units/length.ts';
import { collectAssembledCan, drawAssembled, projectHole } from './draw-assembled.ts';
import { drawPieceView, flaggedHoleIds, locateHole, placeWholePiece } from './piece-view.ts';

export type PreviewView = 'wall' | 'bottom' | 'assembled';

/** What one preview shows, drawn once into recorded calls that every redraw replays. */
export interface PreviewScene {
  calls: DrawCall[];
  bounds: Bounds;
  /** What is shown, in words, for screen readers. */
  label: string;
  pieceId: string | null;
}

/** A ring round an emphasised hole, 1.5 mm clear of its edge; screen only, never printed. */
const HALO_GAP_MM = 1.5;
const halo: Stroke = { widthMm: 0.6, color: 'accent' };

/**
 * The piece a view shows: the asked-for piece when it is of the view's kind, else one of that
 * kind from the same part, else the first of that kind (a bottom before a lid).
 */
export function pickPiece(layout: Layout, view: PreviewView, pieceId?: string): Piece | undefined {
  const kind = view === 'bottom' ? 'disc' : 'wrap-strip';
  const chosen = layout.pieces.find((p) => p.id === pieceId);
  if (chosen?.kind === kind) return chosen;
  const ofKind = layout.pieces.filter((p) => p.kind === kind).sort((a, b) => rankFace(a) - rankFace(b));
  return ofKind.find((p) => p.partId === chosen?.partId) ?? ofKind[0];
}

const rankFace = (piece: Piece) => (piece.kind === 'disc' && piece.face === 'lid' ? 1 : 0);

/** The part's own name, from a piece name such as "Burn chamber, wall (top band)" (shared/layout/build-pieces.ts). */
export function nameOfPart(piece: Piece): string {
  return piece.name.replace(/, (wall( \((top|bottom) band\))?|bottom|lid|opening)$/, '');
}

/** Records what a view of the layout draws, with halos round the highlighted holes. */
export function planScene(layout: Layout, units: UnitSystem, view: PreviewView, pieceId?: string, highlight?: ReadonlySet<string>): PreviewScene {
  const text = kitText(units);
  const flagged = flaggedHoleIds(layout);
  const rec = new RecordingContext();
  const piece = pickPiece(layout, view, pieceId);
  if (!piece) return { calls: [], bounds: { minX: 0, minY: 0, maxX: 100, maxY: 100 }, label: describeEmpty(view), pieceId: null };
  const name = nameOfPart(piece);
  let label: string;

  if (view === 'assembled') {
    const can = collectAssembledCan(layout, piece.partId, name);
    if (!can) return { calls: [], bounds: { minX: 0, minY: 0, maxX: 100, maxY: 100 }, label: describeEmpty(view), pieceId: null };
    // From opposite the seam, as a can is usually shown: its holes, not its joint.
    const frontDeg = can.seamAngleDeg + 180;
    drawAssembled(rec, can, frontDeg, text, flagged);
    let seen = 0;
    for (const hole of can.holes) {
      const at = projectHole(can, hole, frontDeg);
      if (!at) continue;
      seen++;
      if (highlight?.has(hole.id)) drawHalo(rec, at.x, at.y, hole.diameterMm);
    }
    label = `Assembled view of ${name} from the side, ${seen} of ${count(can.holes.length, 'wall hole')} in view`;
  } else {
    const placement = placeWholePiece(piece);
    drawPieceView(rec, layout, piece, placement, text, flagged);
    const holes = layout.holes.filter((h) => h.pieceId === piece.id);
    for (const hole of holes) if (highlight?.has(hole.id)) drawHalo(rec, ...locateHole(piece, placement, hole), hole.diameterMm);
    const band = /\((top|bottom) band\)$/.exec(piece.name)?.[0];
    const kind = piece.kind === 'disc' ? `${piece.face === 'lid' ? 'Lid' : 'Bottom'} disc` : band ? `Wall strip ${band}` : 'Wall strip';
    const marked = holes.filter((h) => flagged.has(h.id)).length;
    label = `${kind} of ${name}, ${count(holes.length, 'hole')}${marked ? `, ${marked} flagged by the checks` : ''}`;
  }
  return { calls: rec.calls, bounds: boundsOfCalls(rec.calls) ?? { minX: 0, minY: 0, maxX: 100, maxY: 100 }, label, pieceId: piece.id };
}

function drawHalo(ctx: DrawingContext, x: number, y: number, diameterMm: number): void {
  ctx.circle(x, y, diameterMm / 2 + HALO_GAP_MM, { stroke: halo });
}

const count = (n: number, noun: string) => `${n} ${noun}${n === 1 ? '' : 's'}`;

function describeEmpty(view: PreviewView): string {
  return view === 'bottom' ? 'Nothing to show: this design has no holes in a can end' : 'Nothing to show: this design has no holes in a can wall';
}
