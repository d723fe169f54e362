import { estimateTextWidthMm, type DrawingContext, type TextStyle } from '../drawing/drawing-context.ts';
import { MARK_REACH_PAST_HOLE_MM } from '../layout/build-pieces.ts';
import { describeNumberRange } from '../layout/hole-numbers.ts';
import type { Hole, Layout, WrapStripPiece } from '../layout/layout-types.ts';
import { drawHoleMark } from './draw-hole.ts';
import { HOLE_NUMBER_SIZE_MM, strokes, type } from './draw-style.ts';
import { placeHoleNumbers, textRect, type MarkedHole } from './hole-labels.ts';
import type { Placement, Rect } from './imposition-types.ts';
import { describeDrill, describeLength, type KitText } from './kit-text.ts';

/**
 * A wrap strip (or one tile of it): outline, the bottom edge that sits on the can's bottom, the
 * seam line at the start, the overlap tab past the end, row guides, hole marks, their numbers
 * and labels, which way is up, the strip's length and the can it was made for, and the wrap
 * check round the end line. Sheet x = originX + strip x; sheet y = originY - strip y (strip y
 * is up from the bottom edge).
 */
export function drawStrip(
  ctx: DrawingContext,
  piece: WrapStripPiece,
  placement: Placement,
  layout: Layout,
  text: KitText,
  flagged: ReadonlySet<string>,
  numbers: ReadonlyMap<string, number> = new Map(),
): void {
  const L = piece.lengthMm;
  const H = piece.heightMm;
  const from = placement.tile?.fromXMm ?? 0;
  const to = placement.tile?.toXMm ?? L + piece.overlapTabMm;
  const sx = (x: number) => placement.originX + x;
  // Strip y runs up from the strip's own bottom edge; holes and row lines are in can y.
  const sy = (y: number) => placement.originY - y;
  const canY = (y: number) => sy(y - piece.fromYMm);
  const clip = (a: number, b: number): [number, number] | null => (Math.min(b, to) > Math.max(a, from) ? [Math.max(a, from), Math.min(b, to)] : null);
  // Words drawn on the strip, kept clear by the hole numbers.
  const reserved: Rect[] = [];
  const say = (x: number, y: number, words: string, style: TextStyle) => {
    ctx.text(x, y, words, style);
    reserved.push(textRect(x, y, words, style.sizeMm, style.anchor));
  };

  const body = clip(0, L);
  if (body) {
    // The reference edge (set level with the can's bottom or rim) is drawn heavier than the cut edge.
    ctx.line(sx(body[0]), sy(0), sx(body[1]), sy(0), piece.reference === 'bottom' ? strokes.edge : strokes.cut);
    ctx.line(sx(body[0]), sy(H), sx(body[1]), sy(H), piece.reference === 'top' ? strokes.edge : strokes.cut);
  }
  const tab = clip(L, L + piece.overlapTabMm);
  if (tab) {
    ctx.polyline([[sx(tab[0]), sy(0)], [sx(tab[1]), sy(0)], [sx(tab[1]), sy(H)], [sx(tab[0]), sy(H)]], { stroke: strokes.cut });
    if (tab[1] - tab[0] > 6) ctx.text(sx((tab[0] + tab[1]) / 2) + 1, sy(H / 2), text.tapeTab, { ...type.small, anchor: 'middle', rotateDeg: 90 });
  }
  if (from <= 0) {
    ctx.line(sx(0), sy(0), sx(0), sy(H), strokes.edge);
    // Clear of the edge note, which runs along the reference edge.
    say(sx(0) + 1.5, piece.reference === 'top' ? sy(0) - 1.5 : sy(H) + 4, text.seamStart, type.small);
  }
  if (L >= from && L <= to) ctx.line(sx(L), sy(0), sx(L), sy(H), { ...strokes.guide, color: 'ink' });
  // On a later tile, past the shared band where the join crosses stand.
  const noteX = sx(Math.max(body ? body[0] : from, from + (placement.tile?.joinLeft ? placement.tile.overlapMm : 0))) + 1.5;
  if (piece.reference === 'bottom') say(noteX, sy(0) - 1.5, text.bottomEdge, type.tiny);
  else say(noteX, sy(H) + 2.6, text.topEdge, type.tiny);

  for (const mark of layout.marks) {
    if (mark.kind !== 'row-line' || mark.pieceId !== piece.id) continue;
    const span = clip(0, L);
    if (span) ctx.line(sx(span[0]), canY(mark.yMm), sx(span[1]), canY(mark.yMm), strokes.guide);
  }

  for (const mark of layout.marks) if (mark.kind === 'collar-scale' && mark.pieceId === piece.id) reserved.push(...drawCollarScale(ctx, mark.ticks, H, from, to, sx, sy, text, piece.lengthMm));
  if (placement.tile) {
    const pieceHoles = layout.holes.filter((h) => h.pieceId === piece.id).map((h) => ({ xMm: h.xMm, yMm: h.yMm - piece.fromYMm, reachMm: h.diameterMm / 2 + MARK_REACH_PAST_HOLE_MM }));
    reserved.push(...drawJoins(ctx, placement, H, sx, sy, text, pieceHoles));
  }
  // Along the top edge, unless a collar's scale has that edge: then along the bottom.
  const collar = layout.marks.some((m) => m.kind === 'collar-scale' && m.pieceId === piece.id);
  reserved.push(...drawWrapCheck(ctx, piece, from, to, sx, sy, text, !collar));

  const rows = new Map<string, Hole[]>();
  for (const hole of layout.holes) {
    if (hole.pieceId !== piece.id) continue;
    rows.set(hole.sourceId, [...(rows.get(hole.sourceId) ?? []), hole]);
    if (hole.xMm >= from - 1e-9 && hole.xMm <= to + 1e-9) drawHoleMark(ctx, sx(hole.xMm), canY(hole.yMm), hole.diameterMm, flagged.has(hole.id));
  }
  const numbered: MarkedHole[][] = [];
  for (const [rowId, holes] of rows) {
    const first = holes[0]!;
    const shown = holes.filter((h) => h.xMm >= from - 1e-9 && h.xMm <= to + 1e-9).sort((a, b) => a.xMm - b.xMm);
    const visible = shown[0];
    if (!visible) continue;
    const rowMark = layout.marks.find((m) => m.kind === 'row-line' && m.pieceId === piece.id && m.sourceId === rowId);
    const name = rowMark?.kind === 'row-line' ? rowMark.label : rowId;
    const range = describeNumberRange(holes.flatMap((h) => numbers.get(h.id) ?? []));
    const label = `${name}: ${holes.length} × ${describeDrill(first, text)}${range ? ` · ${text.holeNumbers(range)}` : ''}`;
    // Beside the row's first hole on this tile, but never past the tile's right end.
    const room = sx(Math.min(to, L + piece.overlapTabMm)) - estimateTextWidthMm(label, type.label.sizeMm) - 1;
    // A later tile starts past its shared band, where the join label stands.
    const start = sx(from + (placement.tile?.joinLeft ? placement.tile.overlapMm : 0)) + 1;
    const labelX = Math.max(start, Math.min(sx(visible.xMm) - 3, room));
    say(labelX, canY(first.yMm) - first.diameterMm / 2 - 2.6, label, type.label);
    numbered.push(
      shown.flatMap((h) => {
        const number = numbers.get(h.id);
        if (number === undefined) return [];
        return [{ x: sx(h.xMm), y: canY(h.yMm), radiusMm: h.diameterMm / 2, reachMm: h.diameterMm / 2 + MARK_REACH_PAST_HOLE_MM, number, towards: STRIP_NUMBER_PLACES }];
      }),
    );
  }
  if (body) {
    const area = { x: sx(body[0]), y: sy(H), width: sx(body[1]) - sx(body[0]), height: H };
    for (const n of placeHoleNumbers(numbered, area, reserved, HOLE_NUMBER_SIZE_MM)) ctx.text(n.x, n.y, n.text, { ...type.tiny, sizeMm: HOLE_NUMBER_SIZE_MM, anchor: 'middle', color: 'ink' });
  }

  const title = placement.tile && placement.tile.count > 1 ? `${piece.name} · ${text.tile(placement.tile.number, placement.tile.count)}` : piece.name;
  ctx.text(placement.rect.x + 1, placement.rect.y + 4, title, type.title);
  drawWayUp(ctx, placement, estimateTextWidthMm(title, type.title.sizeMm, 'bold'), sx(to), text);
  drawLengthNote(ctx, piece, placement, sx(from), sx(to), text);
}

/** Where a strip hole's number goes, best first: under it (sheet y runs down), then between its arms. */
const STRIP_NUMBER_PLACES: [number, number][] = [
  [0, 1],
  [-Math.SQRT1_2, Math.SQRT1_2],
  [Math.SQRT1_2, -Math.SQRT1_2],
  [-Math.SQRT1_2, -Math.SQRT1_2],
];

/**
 * Wrap check steps: how much wider or narrower across the can is than the design says, per tick
 * (1 mm, or 1/16 in for a design in inches). A strip of length pi x D meets its start pi x d further
 * on round a can d wider (circumference = pi x diameter).
 */
export function wrapCheckSteps(units: 'in' | 'mm'): { deltaMm: number; label: string }[] {
  const step = units === 'in' ? 25.4 / 16 : 1;
  // The ticks between are left bare: their labels would run into each other.
  const names = units === 'in' ? ['−1/8', '', '0', '', '+1/8'] : ['−2', '', '0', '', '+2'];
  return [-2, -1, 0, 1, 2].map((k, i) => ({ deltaMm: k * step, label: names[i]! }));
}

/** The zero tick of the wrap check is longer than the rest, so it reads (and measures) apart. */
export const WRAP_ZERO_TICK_MM = 5;
const WRAP_TICK_MM = 3;

/**
 * The wrap check round the end line: ticks in from the top (or bottom) edge at L + pi x d for each step d,
 * 0 on the end line itself. Wrapped tight round the can, the strip's start edge meets 0 when the
 * can is as wide as the design says; at +1 it is 1 mm wider across. Returns the words' rects.
 */
function drawWrapCheck(ctx: DrawingContext, piece: WrapStripPiece, from: number, to: number, sx: (x: number) => number, sy: (y: number) => number, text: KitText, atTop: boolean): Rect[] {
  const H = piece.heightMm;
  // Strip y along a tick: from the edge into the strip.
  const inward = (mm: number) => (atTop ? H - mm : mm);
  const rects: Rect[] = [];
  const shown = wrapCheckSteps(text.units)
    .map((step) => ({ ...step, x: piece.lengthMm + Math.PI * step.deltaMm }))
    .filter((t) => t.x >= from - 1e-9 && t.x <= to + 1e-9);
  for (const tick of shown) {
    const long = tick.deltaMm === 0;
    const length = long ? WRAP_ZERO_TICK_MM : WRAP_TICK_MM;
    ctx.line(sx(tick.x), sy(inward(0)), sx(tick.x), sy(inward(length)), strokes.tick);
    if (!tick.label) continue;
    // The 0 stands beside its tick, off the end line that runs through it; the others past their tick's end.
    const y = long ? sy(atTop ? H - length : length - 1.5) : atTop ? sy(H - length - 2.2) : sy(length + 0.6);
    const x = long ? sx(tick.x) + 0.8 : sx(tick.x);
    const anchor = long ? 'start' : 'middle';
    ctx.text(x, y, tick.label, { ...type.tiny, anchor, color: 'ink' });
    rects.push(textRect(x, y, tick.label, type.tiny.sizeMm, anchor));
  }
  return rects;
}

/** An arrow and "this way up" at the right end of the label band, where the title leaves room. */
function drawWayUp(ctx: DrawingContext, placement: Placement, titleWidthMm: number, rightX: number, text: KitText): void {
  const words = text.wayUp;
  const width = estimateTextWidthMm(words, type.small.sizeMm) + 3;
  const right = Math.min(rightX, placement.rect.x + placement.rect.width - 1);
  if (right - width < placement.rect.x + 1 + titleWidthMm + 3) return;
  const y = placement.rect.y + 4;
  const ax = right - width + 1;
  // Arrow point up: a stem and a filled head, 3 mm tall, in ink.
  ctx.line(ax, y + 0.2, ax, y - 2, strokes.edge);
  ctx.polyline([[ax, y - 3.2], [ax - 1.1, y - 1.6], [ax + 1.1, y - 1.6]], { fill: 'ink', closed: true });
  ctx.text(ax + 2, y, words, { ...type.small, color: 'ink' });
}

/**
 * Under the strip: its length from start line to end line and the can it was made for; on the
 * tile with the end line, the way to read the wrap check beside it (the length said shorter when
 * both would not fit).
 */
function drawLengthNote(ctx: DrawingContext, piece: WrapStripPiece, placement: Placement, leftX: number, rightX: number, text: KitText): void {
  const long = text.stripLength(describeLength(piece.lengthMm, text), describeLength(piece.vesselDiameterMm, text), describeLength(Math.PI * piece.vesselDiameterMm, text));
  const short = text.stripLengthShort(describeLength(piece.lengthMm, text), describeLength(piece.vesselDiameterMm, text));
  const x = Math.max(placement.rect.x + 1, leftX + 1);
  const right = Math.min(placement.rect.x + placement.rect.width - 1, rightX);
  const end = placement.originX + piece.lengthMm;
  const withCaption = end >= leftX && end <= rightX;
  const width = (words: string) => estimateTextWidthMm(words, type.tiny.sizeMm);
  const gap = 3;
  const captionWidth = withCaption ? width(text.wrapCheck) + gap : 0;
  const line = [long, short].find((words) => x + width(words) + captionWidth <= right) ?? (withCaption && x + width(text.wrapCheck) <= right ? '' : undefined);
  if (line === undefined) return;
  const y = placement.originY + 3.6;
  if (line) ctx.text(x, y, line, type.tiny);
  if (withCaption) ctx.text(right, y, text.wrapCheck, { ...type.tiny, anchor: 'end', color: 'ink' });
}

/**
 * Alignment marks in the shared band: the same strip x on both tiles, labelled with the join
 * letter. The upright label stands where the band's holes leave it room, nearest the middle.
 * Answers the rects of the crosses and the label, for the hole numbers to keep clear of.
 */
function drawJoins(ctx: DrawingContext, placement: Placement, H: number, sx: (x: number) => number, sy: (y: number) => number, text: KitText, holes: { xMm: number; yMm: number; reachMm: number }[]): Rect[] {
  const tile = placement.tile!;
  const rects: Rect[] = [];
  const joins: [string | undefined, number, number][] = [
    [tile.joinLeft, tile.fromXMm, tile.fromXMm + tile.overlapMm],
    [tile.joinRight, tile.toXMm - tile.overlapMm, tile.toXMm],
  ];
  for (const [letter, a, b] of joins) {
    if (!letter) continue;
    const mid = (a + b) / 2;
    const crossY = Math.min(6, H * 0.15);
    // Near both edges of the strip.
    for (const y of [crossY, H - crossY]) {
      ctx.line(sx(mid) - 3, sy(y), sx(mid) + 3, sy(y), strokes.cross);
      ctx.line(sx(mid), sy(y) - 3, sx(mid), sy(y) + 3, strokes.cross);
      ctx.circle(sx(mid), sy(y), 1.5, { stroke: strokes.cross });
      rects.push({ x: sx(mid) - 3, y: sy(y) - 3, width: 6, height: 6 });
    }
    ctx.line(sx(a), sy(0), sx(a), sy(H), strokes.guide);
    ctx.line(sx(b), sy(0), sx(b), sy(H), strokes.guide);
    // Upright in the narrow shared band, so it never runs past the tile.
    const blocked = holes.filter((h) => Math.abs(h.xMm - mid) < h.reachMm + type.label.sizeMm).map((h) => [h.yMm - h.reachMm, h.yMm + h.reachMm] as const);
    // "A onto A" where the band's holes leave room for it, else the letter alone.
    const fitting = [text.join(letter), letter].map((words) => ({ words, length: estimateTextWidthMm(words, type.label.sizeMm, 'bold') + 1 }));
    const placed = fitting.map((f) => ({ ...f, y: freeSpot(H / 2, f.length, crossY + 3, H - crossY - 3, blocked) }));
    const found = placed.find((p) => p.y !== null);
    if (found?.y != null) {
      ctx.text(sx(mid) + 1, sy(found.y), found.words, { ...type.label, anchor: 'middle', weight: 'bold', rotateDeg: 90 });
      rects.push({ x: sx(mid) - 2, y: sy(found.y + found.length / 2), width: 4, height: found.length });
    } else {
      // A hole fills the band: the words go just over the strip's top edge, above the band.
      ctx.text(sx(mid), sy(H) - 0.8, text.join(letter), { ...type.label, anchor: 'middle', weight: 'bold' });
    }
  }
  return rects;
}

/**
 * The centre nearest `ideal` for a run of `length` between `low` and `high` that overlaps none of
 * the `blocked` ranges; null when nothing fits.
 */
function freeSpot(ideal: number, length: number, low: number, high: number, blocked: readonly (readonly [number, number])[]): number | null {
  const half = length / 2;
  const free = (c: number) => c - half >= low && c + half <= high && blocked.every(([b0, b1]) => c + half <= b0 || c - half >= b1);
  if (free(ideal)) return ideal;
  // Candidates: just past each blocked range's ends, and the band's own ends.
  const candidates = [low + half, high - half, ...blocked.flatMap(([b0, b1]) => [b0 - half - 0.3, b1 + half + 0.3])];
  const fits = candidates.filter(free).sort((p, q) => Math.abs(p - ideal) - Math.abs(q - ideal));
  return fits[0] ?? null;
}

/**
 * An intake collar's scale: a tick down from the top edge at each setting's turn, labelled, and the
 * way to read it. Ticks are strip x, so they go through the same placement as the holes.
 */
function drawCollarScale(
  ctx: DrawingContext,
  ticks: { xMm: number; label: string }[],
  H: number,
  from: number,
  to: number,
  sx: (x: number) => number,
  sy: (y: number) => number,
  text: KitText,
  endMm?: number,
): Rect[] {
  const shown = ticks.filter((t) => t.xMm >= from - 1e-9 && t.xMm <= to + 1e-9);
  if (shown.length === 0) return [];
  const rects: Rect[] = [];
  for (const tick of shown) {
    ctx.line(sx(tick.xMm), sy(H), sx(tick.xMm), sy(H - 3), strokes.edge);
    // Upright, hanging from the tick: marks a few mm apart still read apart.
    // A tick on the end line gets its label right of the line, clear of its dashes.
    const shift = endMm !== undefined && Math.abs(tick.xMm - endMm) < 1.2 ? 1.8 : 0;
    ctx.text(sx(tick.xMm) + 0.7 + shift, sy(H - 3.5), tick.label, { ...type.tiny, anchor: 'end', rotateDeg: 90 });
    // Turned upright, the label hangs below the tick, a text height wide.
    rects.push({ x: sx(tick.xMm) - 1.5 + shift, y: sy(H), width: 2.4, height: 3.5 + estimateTextWidthMm(tick.label, type.tiny.sizeMm) });
  }
  const leftmost = Math.min(...shown.map((t) => t.xMm));
  ctx.text(sx(leftmost) - 2, sy(H) + 2.6, text.collarScale, { ...type.tiny, anchor: 'end' });
  rects.push(textRect(sx(leftmost) - 2, sy(H) + 2.6, text.collarScale, type.tiny.sizeMm, 'end'));
  return rects;
}
