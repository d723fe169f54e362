import { estimateTextWidthMm } from '../drawing/drawing-context.ts';
import type { Rect } from './imposition-types.ts';

/** A hole mark as the number placer sees it: its centre on the sheet, its circle and its crosshair. */
export interface MarkedHole {
  x: number;
  y: number;
  radiusMm: number;
  /** How far the crosshair's arms reach from the centre. */
  reachMm: number;
  number: number;
  /** Unit vectors from the hole to where its number may go, best first. */
  towards: [number, number][];
}

/** A number to print, centred on (x, y) as its baseline's middle. */
export interface NumberLabel {
  x: number;
  y: number;
  text: string;
}

/** Clear paper round a number, so it never touches a line (common practice, no source). */
const CLEARANCE_MM = 0.4;
/** Grid cell of the collision search: about one hole mark and its number. */
const CELL_MM = 8;
/** Steps out from the hole's circle when looking for room along a direction. */
const STEP_MM = 0.25;

interface Box {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

type Obstacle = { kind: 'circle'; x: number; y: number; r: number } | { kind: 'box'; box: Box };

/**
 * Where the hole numbers go: each next to its hole, along the first of its directions with room,
 * as close as it clears its own circle and arms, touching no hole circle, crosshair arm, flag,
 * other number or anything in `reserved`, inside `bounds` and passing `accept`. The first and
 * last hole of a row are tried first, so a row shows where its numbers start and end when there
 * is room; then the rest in order, which leaves every other or every third number on a tight
 * row. Obstacles go in a grid, so a sheet of 2,000 holes costs a few neighbours a try.
 */
export function placeHoleNumbers(rows: MarkedHole[][], bounds: Rect, reserved: Rect[], sizeMm: number, accept: (box: Rect) => boolean = () => true): NumberLabel[] {
  const grid = new Grid<Obstacle>();
  const arm = 0.2;
  for (const row of rows) {
    for (const h of row) {
      const circle = { kind: 'circle' as const, x: h.x, y: h.y, r: h.radiusMm };
      grid.add(circleBox(h.x, h.y, h.radiusMm), circle);
      const across = { x0: h.x - h.reachMm, y0: h.y - arm, x1: h.x + h.reachMm, y1: h.y + arm };
      const down = { x0: h.x - arm, y0: h.y - h.reachMm, x1: h.x + arm, y1: h.y + h.reachMm };
      grid.add(across, { kind: 'box', box: across });
      grid.add(down, { kind: 'box', box: down });
      // The flag's place is kept for it on every hole, flagged or not, so a number never reads as a flag.
      {
        const c = h.reachMm * Math.SQRT1_2;
        const flag = { x0: h.x + c - 1.6, y0: h.y + c - 1.8, x1: h.x + c + 1.6, y1: h.y + c + 1 };
        grid.add(flag, { kind: 'box', box: flag });
      }
    }
  }
  for (const r of reserved) grid.add(toBox(r), { kind: 'box', box: toBox(r) });
  const inside = toBox(bounds);
  const free = (padded: Box) =>
    padded.x0 >= inside.x0 &&
    padded.x1 <= inside.x1 &&
    padded.y0 >= inside.y0 &&
    padded.y1 <= inside.y1 &&
    !grid.some(padded, (o) => (o.kind === 'box' ? overlaps(padded, o.box) : circleMeetsBox(o, padded))) &&
    accept({ x: padded.x0, y: padded.y0, width: padded.x1 - padded.x0, height: padded.y1 - padded.y0 });

  const labels: NumberLabel[] = [];
  for (const row of rows) {
    const order = row.length <= 2 ? row : [row[0]!, row[row.length - 1]!, ...row.slice(1, -1)];
    for (const hole of order) {
      const text = String(hole.number);
      const width = estimateTextWidthMm(text, sizeMm);
      const height = sizeMm * 0.72;
      const box = findRoom(hole, width, height, free);
      if (!box) continue;
      grid.add(box, { kind: 'box', box });
      labels.push({ x: (box.x0 + box.x1) / 2, y: box.y1, text });
    }
  }
  return labels;
}

/**
 * The nearest free box along the hole's directions: first the nearest spot that clears the hole's
 * own circle, arms and flag place (plain arithmetic), then that spot and two a little further out
 * against everything else (the grid).
 */
function findRoom(hole: MarkedHole, width: number, height: number, free: (padded: Box) => boolean): Box | null {
  const arm = 0.2 + CLEARANCE_MM;
  const c = hole.reachMm * Math.SQRT1_2;
  const flag = { x0: hole.x + c - 1.6, y0: hole.y + c - 1.8, x1: hole.x + c + 1.6, y1: hole.y + c + 1 };
  const clearOfOwn = (b: Box) => {
    const dx = Math.max(b.x0 - hole.x, 0, hole.x - b.x1);
    const dy = Math.max(b.y0 - hole.y, 0, hole.y - b.y1);
    if (dx * dx + dy * dy < (hole.radiusMm + CLEARANCE_MM) ** 2) return false;
    const crossesDown = b.x0 < hole.x + arm && b.x1 > hole.x - arm && b.y0 < hole.y + hole.reachMm && b.y1 > hole.y - hole.reachMm;
    const crossesAcross = b.y0 < hole.y + arm && b.y1 > hole.y - arm && b.x0 < hole.x + hole.reachMm && b.x1 > hole.x - hole.reachMm;
    return !crossesDown && !crossesAcross && !overlaps(b, flag);
  };
  const boxAt = (ux: number, uy: number, t: number) => {
    const cx = hole.x + ux * t;
    const cy = hole.y + uy * t;
    return { x0: cx - width / 2, y0: cy - height / 2, x1: cx + width / 2, y1: cy + height / 2 };
  };
  const farthest = hole.reachMm + width + height;
  for (const [ux, uy] of hole.towards) {
    let t = hole.radiusMm;
    while (t <= farthest && !clearOfOwn(boxAt(ux, uy, t))) t += STEP_MM;
    if (t > farthest) continue;
    for (const extra of [0, 0.5, 1]) {
      const box = boxAt(ux, uy, t + extra);
      if (free(pad(box, CLEARANCE_MM))) return box;
    }
  }
  return null;
}

/** A rect round the text a drawing writes at (x, y) from its baseline, `anchor` as in TextStyle. */
export function textRect(x: number, y: number, text: string, sizeMm: number, anchor: 'start' | 'middle' | 'end' = 'start'): Rect {
  const width = estimateTextWidthMm(text, sizeMm);
  const left = anchor === 'start' ? x : anchor === 'middle' ? x - width / 2 : x - width;
  return { x: left, y: y - sizeMm * 0.75, width, height: sizeMm };
}

class Grid<T> {
  private cells = new Map<string, T[]>();
  add(box: Box, item: T): void {
    for (const key of this.keys(box)) {
      const cell = this.cells.get(key);
      if (cell) cell.push(item);
      else this.cells.set(key, [item]);
    }
  }
  /** Whether any item in the cells the box touches passes `test`. */
  some(box: Box, test: (item: T) => boolean): boolean {
    for (let i = Math.floor(box.x0 / CELL_MM); i <= Math.floor(box.x1 / CELL_MM); i++) {
      for (let j = Math.floor(box.y0 / CELL_MM); j <= Math.floor(box.y1 / CELL_MM); j++) {
        const cell = this.cells.get(`${i},${j}`);
        if (cell && cell.some(test)) return true;
      }
    }
    return false;
  }
  private keys(box: Box): string[] {
    const keys: string[] = [];
    for (let i = Math.floor(box.x0 / CELL_MM); i <= Math.floor(box.x1 / CELL_MM); i++) {
      for (let j = Math.floor(box.y0 / CELL_MM); j <= Math.floor(box.y1 / CELL_MM); j++) keys.push(`${i},${j}`);
    }
    return keys;
  }
}

function toBox(r: Rect): Box {
  return { x0: Math.min(r.x, r.x + r.width), y0: Math.min(r.y, r.y + r.height), x1: Math.max(r.x, r.x + r.width), y1: Math.max(r.y, r.y + r.height) };
}

function circleBox(x: number, y: number, r: number): Box {
  return { x0: x - r, y0: y - r, x1: x + r, y1: y + r };
}

function pad(b: Box, d: number): Box {
  return { x0: b.x0 - d, y0: b.y0 - d, x1: b.x1 + d, y1: b.y1 + d };
}

function overlaps(a: Box, b: Box): boolean {
  return a.x0 < b.x1 && b.x0 < a.x1 && a.y0 < b.y1 && b.y0 < a.y1;
}

function circleMeetsBox(c: { x: number; y: number; r: number }, b: Box): boolean {
  // A point inside the box near the circle: the circle meets the box if it is closer than r.
  const dx = Math.max(b.x0 - c.x, 0, c.x - b.x1);
  const dy = Math.max(b.y0 - c.y, 0, c.y - b.y1);
  return dx * dx + dy * dy < c.r * c.r;
}
