import type { Hole, Layout } from '../../shared/layout/layout-types.ts';
import type { Sheet } from '../../shared/print/imposition-types.ts';
import type { RasterImage } from '../helpers/rasterize-pdf.ts';
import { inkAt, pxPerMm, type RectMm } from './measure-ink.ts';

/**
 * Measuring the marks of a rendered kit sheet, in sheet mm. Ink is 1 - grey: the palette's ink
 * (0.1 grey) reads 0.9 and its guides (0.62 grey) 0.38, so a pixel above DARK is a black mark.
 */
const DARK = 0.6;
/** Below this a pixel is bare paper: where an anti-aliased line's fringe ends. */
const FAINT = 0.03;
/** Search half-width across an arm, and the widest run a 0.15 mm arm may show (0.15 mm + fringe). */
const ARM_WINDOW_MM = 0.6;
const ARM_MAX_RUN_MM = 0.35;
/** Ruler tick spans: 100 mm, and 4 in = 101.6 mm (25.4 mm an inch, ISO 31-1). */
const RULER_SPAN_MM = 101.6;

export interface DrawnHole {
  hole: Hole;
  /** Where the hole's centre belongs on the sheet, mm. */
  x: number;
  y: number;
}

/**
 * The holes a sheet draws, each at its sheet position by the coordinate contract of
 * imposition-types.ts: strip (originX + x, originY - (y - fromYMm)); disc (originX + x, originY - y).
 * A strip tile draws the holes whose strip x lies in its [fromXMm, toXMm].
 */
export function listDrawnHoles(layout: Layout, sheet: Sheet): DrawnHole[] {
  const drawn: DrawnHole[] = [];
  for (const placement of sheet.placements) {
    const piece = layout.pieces.find((p) => p.id === placement.pieceId);
    if (!piece) continue;
    for (const hole of layout.holes) {
      if (hole.pieceId !== piece.id) continue;
      if (piece.kind === 'disc') {
        drawn.push({ hole, x: placement.originX + hole.xMm, y: placement.originY - hole.yMm });
        continue;
      }
      const from = placement.tile?.fromXMm ?? 0;
      const to = placement.tile?.toXMm ?? piece.lengthMm + piece.overlapTabMm;
      if (hole.xMm < from - 1e-9 || hole.xMm > to + 1e-9) continue;
      drawn.push({ hole, x: placement.originX + hole.xMm, y: placement.originY - (hole.yMm - piece.fromYMm) });
    }
  }
  return drawn;
}

/**
 * Centres (sheet mm along `axis`) of the dark runs crossing a thin band: the band's ink is averaged
 * across, then each run is taken at its ink-weighted centre.
 */
export function measureRunCentres(image: RasterImage, dpi: number, band: RectMm, axis: 'x' | 'y'): number[] {
  const s = pxPerMm(dpi);
  const [a0, a1] = axis === 'x' ? [band.x, band.x + band.width] : [band.y, band.y + band.height];
  const [b0, b1] = axis === 'x' ? [band.y, band.y + band.height] : [band.x, band.x + band.width];
  const profile: number[] = [];
  for (let a = Math.floor(a0 * s); a < Math.ceil(a1 * s); a++) {
    let sum = 0;
    let n = 0;
    for (let b = Math.floor(b0 * s); b < Math.ceil(b1 * s); b++, n++) sum += axis === 'x' ? inkAt(image, a, b) : inkAt(image, b, a);
    profile.push(sum / n);
  }
  const first = Math.floor(a0 * s);
  const centres: number[] = [];
  let ink = 0;
  let moment = 0;
  let peak = 0;
  profile.forEach((v, i) => {
    if (v > FAINT) {
      ink += v;
      moment += v * (first + i + 0.5);
      peak = Math.max(peak, v);
    }
    if ((v <= FAINT || i === profile.length - 1) && ink > 0) {
      if (peak > DARK) centres.push(moment / ink / s);
      [ink, moment, peak] = [0, 0, 0];
    }
  });
  return centres;
}

/**
 * A calibration ruler's tick centres (sheet mm along its axis), scanned 0.6-1.4 mm in from each
 * edge (the shortest ticks are 2 mm and 1.6 mm long), from 1 mm before the zero (4 mm into the
 * rect) to 1 mm past 4 in. Works on a ruler drawn pre-scaled by a printer profile too.
 */
export function measureRulerTicks(image: RasterImage, dpi: number, rect: RectMm, axis: 'x' | 'y'): { mm: number[]; inch: number[] } {
  const from = (axis === 'x' ? rect.x : rect.y) + 3;
  const length = RULER_SPAN_MM + 2;
  if (axis === 'x') {
    return {
      mm: measureRunCentres(image, dpi, { x: from, y: rect.y + 0.6, width: length, height: 0.8 }, 'x'),
      inch: measureRunCentres(image, dpi, { x: from, y: rect.y + rect.height - 1.4, width: length, height: 0.8 }, 'x'),
    };
  }
  return {
    mm: measureRunCentres(image, dpi, { x: rect.x + rect.width - 1.4, y: from, width: 0.8, height: length }, 'y'),
    inch: measureRunCentres(image, dpi, { x: rect.x + 0.6, y: from, width: 0.8, height: length }, 'y'),
  };
}

/**
 * Where a straight arm crosses the pixel lines `along` (pixel indices): for each, the dark run
 * nearest the peak within ARM_WINDOW_MM of `across`, at its ink-weighted centre. Lines that
 * cross the arm (runs too long) and faint guides (no dark peak) are skipped. Mean in mm, or NaN.
 */
function measureArm(image: RasterImage, dpi: number, along: number[], across: number, vertical: boolean): number {
  const s = pxPerMm(dpi);
  const v0 = Math.floor((across - ARM_WINDOW_MM) * s);
  const v1 = Math.ceil((across + ARM_WINDOW_MM) * s);
  const ink = (u: number, v: number) => (vertical ? inkAt(image, v, u) : inkAt(image, u, v));
  const centres: number[] = [];
  for (const u of along) {
    let top = v0;
    for (let v = v0; v < v1; v++) if (ink(u, v) > ink(u, top)) top = v;
    if (ink(u, top) < DARK) continue;
    let lo = top;
    let hi = top;
    while (lo > v0 && ink(u, lo - 1) > FAINT) lo--;
    while (hi < v1 - 1 && ink(u, hi + 1) > FAINT) hi++;
    if (lo === v0 || hi === v1 - 1 || (hi - lo + 1) / s > ARM_MAX_RUN_MM) continue;
    let sum = 0;
    let moment = 0;
    for (let v = lo; v <= hi; v++) {
      sum += ink(u, v);
      moment += ink(u, v) * (v + 0.5);
    }
    centres.push(moment / sum / s);
  }
  return centres.length ? centres.reduce((a, b) => a + b, 0) / centres.length : NaN;
}

/** Pixel indices covering [from, to] mm. */
function pixelsBetween(fromMm: number, toMm: number, dpi: number): number[] {
  const s = pxPerMm(dpi);
  const pixels: number[] = [];
  for (let p = Math.ceil(fromMm * s); p < Math.floor(toMm * s); p++) pixels.push(p);
  return pixels;
}

/**
 * A crosshair's centre from its arms alone, near the expected (x0, y0): y from the horizontal arm
 * in two short bands inner..outer mm either side of x0, x likewise from the vertical arm; each the
 * mean of its two sides, so a circle, a centre dot or a neighbour's mark does not pull it.
 */
export function measureCrossCentre(image: RasterImage, dpi: number, x0: number, y0: number, band: { inner: number; outer: number }): { x: number; y: number } {
  const before = (c: number) => pixelsBetween(c - band.outer, c - band.inner, dpi);
  const after = (c: number) => pixelsBetween(c + band.inner, c + band.outer, dpi);
  const y = (measureArm(image, dpi, before(x0), y0, false) + measureArm(image, dpi, after(x0), y0, false)) / 2;
  const x = (measureArm(image, dpi, before(y0), x0, true) + measureArm(image, dpi, after(y0), x0, true)) / 2;
  return { x, y };
}
