import { boundsOfCalls, type Bounds } from '../../../shared/drawing/drawing-bounds.ts';
import type { DrawingContext, Stroke } from '../../../shared/drawing/drawing-context.ts';
import { RecordingContext, type DrawCall } from '../../../shared/drawing/recording-context.ts';
import type { Layout, Piece } from '../../../shared/layout/layout-types.ts';
import { kitText } from '../../../shared/print/kit-text.ts';
import type { UnitSystem } from '../../../shared/units/length.ts';
import { drawSection, type SectionPlan } from '../../../shared/print/draw-section.ts';
import { describeLength, type KitText } from '../../../shared/print/kit-text.ts';
import type { PlacedPart } from '../../../shared/layout/assembly.ts';
import { drawPieceView, flaggedHoleIds, locateHole, placeWholePiece } from './piece-view.ts';
import { numberHoles } from '../../../shared/layout/hole-numbers.ts';

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
export function planScene(layout: Layout, units: UnitSystem, view: PreviewView, pieceId?: string, highlight?: ReadonlySet<string>, highlightParts?: ReadonlySet<string>): PreviewScene {
  const text = kitText(units);
  const flagged = flaggedHoleIds(layout);
  const rec = new RecordingContext();
  if (view === 'assembled') {
    // Parts named by an error or a warning, and those of the finding the maker chose.
    const lit = new Set([...layout.findings.filter((f) => f.severity !== 'note').flatMap((f) => f.partIds ?? []), ...(highlightParts ?? [])]);
    const plan = drawSection(rec, layout, text, lit);
    for (const part of layout.assembly) if (highlightParts?.has(part.partId)) drawPartHalo(rec, plan, part);
    return { calls: rec.calls, bounds: boundsOfCalls(rec.calls) ?? { minX: 0, minY: 0, maxX: 100, maxY: 100 }, label: describeSection(layout, plan, text, lit), pieceId: pickPiece(layout, view, pieceId)?.id ?? null };
  }
  const piece = pickPiece(layout, view, pieceId);
  if (!piece) return { calls: [], bounds: { minX: 0, minY: 0, maxX: 100, maxY: 100 }, label: describeEmpty(view), pieceId: null };
  const name = nameOfPart(piece);
  const placement = placeWholePiece(piece);
  // The same hole numbers as the printed kit, the build sheet and the CSV.
  const numbers = new Map(numberHoles(layout).map(({ hole, number }) => [hole.id, number]));
  drawPieceView(rec, layout, piece, placement, text, flagged, numbers);
  const holes = layout.holes.filter((h) => h.pieceId === piece.id);
  for (const hole of holes) if (highlight?.has(hole.id)) drawHalo(rec, ...locateHole(piece, placement, hole), hole.diameterMm);
  const band = /\((top|bottom) band\)$/.exec(piece.name)?.[0];
  const kind = piece.kind === 'disc' ? `${piece.face === 'lid' ? 'Lid' : 'Bottom'} disc` : band ? `Wall strip ${band}` : 'Wall strip';
  const marked = holes.filter((h) => flagged.has(h.id)).length;
  const label = `${kind} of ${name}, ${count(holes.length, 'hole')}${marked ? `, ${marked} flagged by the checks` : ''}`;
  return { calls: rec.calls, bounds: boundsOfCalls(rec.calls) ?? { minX: 0, minY: 0, maxX: 100, maxY: 100 }, label, pieceId: piece.id };
}

/** A dashed frame 2 mm round a part the chosen finding is about; screen only. */
function drawPartHalo(ctx: DrawingContext, plan: SectionPlan, part: PlacedPart): void {
  const r = part.outerDiameterMm / 2 + 2;
  ctx.rect(plan.axisX - r, plan.groundY - part.topMm - 2, 2 * r, part.topMm - part.bottomMm + 4, { stroke: { ...halo, dashMm: [2, 1] } });
}

/** The section in words: each part and where it stands, the dimensions, what the checks name. */
function describeSection(layout: Layout, plan: SectionPlan, text: KitText, lit: ReadonlySet<string>): string {
  const at = (mm: number) => describeLength(mm, text);
  const parts = layout.assembly.map((p) => `${p.name} from ${at(p.bottomMm)} to ${at(p.topMm)}${lit.has(p.partId) ? ' (named by the checks)' : ''}`);
  const { gapMm, jetsMm, intakeMm } = plan.dimensions;
  const dims = [gapMm !== undefined ? `gap ${at(gapMm)}` : '', jetsMm !== undefined ? `jets at ${at(jetsMm)}` : '', intakeMm !== undefined ? `intake at ${at(intakeMm)}` : ''].filter(Boolean);
  return `Section through the stove: ${parts.join('; ')}${dims.length ? `; ${dims.join(', ')}` : ''}`;
}

function drawHalo(ctx: DrawingContext, x: number, y: number, diameterMm: number): void {
  ctx.circle(x, y, diameterMm / 2 + HALO_GAP_MM, { stroke: halo });
}

const count = (n: number, noun: string) => `${n} ${noun}${n === 1 ? '' : 's'}`;

function describeEmpty(view: PreviewView): string {
  return view === 'bottom' ? 'Nothing to show: this design has no holes in a can end' : 'Nothing to show: this design has no holes in a can wall';
}
