import type { Rect, SheetFurniture } from './imposition-types.ts';

/** Clear space between furniture and pieces, and between furniture items (common practice, no source). */
export const FURNITURE_GAP_MM = 3;
/**
 * Calibration rulers: 100 mm and 4 in (101.6 mm) from a common zero, with 4 mm before the zero
 * for the unit names and room past the ends for the last figures.
 */
export const RULER_LENGTH_MM = 110;
export const RULER_WIDTH_MM = 12;
/** A 1 in and a 25 mm square side by side (25.4 + 6 + 25 mm) with a 2 mm border for labels. */
export const CHECK_SQUARES_MM = { width: 60, height: 28 } as const;
/** Design, parts, version and date, "sheet n of m" and units: four lines of text. */
export const TITLE_BLOCK_MM = { width: 70, height: 24 } as const;
/** Drill size, count and pilot, a line each. */
export const DRILL_LEGEND_MM = { width: 60, height: 24 } as const;
/** "Print at 100 %" and the safety line. */
export const NOTES_HEIGHT_MM = 10;

export interface FurnitureLayout {
  furniture: SheetFurniture;
  /** Where pieces may go. */
  content: Rect;
}

/**
 * The choices the brief leaves open, tried in turn: the legend beside the title block or under
 * it; the check squares beside the horizontal ruler or above it; the top row and the horizontal
 * ruler starting at the margin or right of the vertical ruler's column.
 */
interface Arrangement {
  legendBeside: boolean;
  checksBeside: boolean;
  rowInset: boolean;
  rulerInset: boolean;
}

const arrangements: Arrangement[] = [true, false].flatMap((legendBeside) =>
  [true, false].flatMap((checksBeside) =>
    [false, true].flatMap((rowInset) => [false, true].map((rulerInset) => ({ legendBeside, checksBeside, rowInset, rulerInset }))),
  ),
);

/**
 * Lays out the furniture every kit sheet carries, in the printable area (the sheet less the
 * margin on every side): notes across the top, then the title block and drill legend; the
 * vertical ruler down the left; the horizontal ruler and the check squares along the bottom.
 * The content rect is what is left between them, FURNITURE_GAP_MM clear of each. Of the
 * arrangements that fit, the one leaving the tallest content wins (wrap strips need height;
 * their length is tiled), earlier ones on a tie.
 */
export function layoutFurniture(widthMm: number, heightMm: number, marginMm: number): FurnitureLayout {
  if (![widthMm, heightMm, marginMm].every(Number.isFinite) || marginMm < 0) {
    throw new RangeError(`Sheet size and margin must be finite numbers, got ${widthMm} x ${heightMm} mm with a ${marginMm} mm margin.`);
  }
  let best: FurnitureLayout | null = null;
  for (const arrangement of arrangements) {
    const candidate = arrangeFurniture(widthMm, heightMm, marginMm, arrangement);
    if (candidate && (!best || candidate.content.height > best.content.height + 1e-9)) best = candidate;
  }
  if (!best) {
    throw new RangeError(`A ${widthMm} x ${heightMm} mm sheet with ${marginMm} mm margins has no room for the rulers, title block and notes.`);
  }
  return best;
}

/** One arrangement, or null if it does not fit the printable area. */
function arrangeFurniture(widthMm: number, heightMm: number, marginMm: number, a: Arrangement): FurnitureLayout | null {
  const g = FURNITURE_GAP_MM;
  const left = marginMm;
  const top = marginMm;
  const right = widthMm - marginMm;
  const bottom = heightMm - marginMm;
  const column = RULER_WIDTH_MM + g;

  const notes = rect(left, top, right - left, NOTES_HEIGHT_MM);
  const rowX = left + (a.rowInset ? column : 0);
  const rowY = notes.y + notes.height + g;
  const titleBlock = rect(rowX, rowY, TITLE_BLOCK_MM.width, TITLE_BLOCK_MM.height);
  const drillLegend = a.legendBeside
    ? rect(right - DRILL_LEGEND_MM.width, rowY, DRILL_LEGEND_MM.width, DRILL_LEGEND_MM.height)
    : rect(rowX, rowY + TITLE_BLOCK_MM.height + g, DRILL_LEGEND_MM.width, DRILL_LEGEND_MM.height);
  if (a.legendBeside && titleBlock.x + titleBlock.width + g > drillLegend.x) return null;
  const topBandEnd = Math.max(bottomOf(titleBlock), bottomOf(drillLegend));

  const rulerX = rect(left + (a.rulerInset ? column : 0), bottom - RULER_WIDTH_MM, RULER_LENGTH_MM, RULER_WIDTH_MM);
  const checkSquares = a.checksBeside
    ? rect(rulerX.x + rulerX.width + g, bottom - CHECK_SQUARES_MM.height, CHECK_SQUARES_MM.width, CHECK_SQUARES_MM.height)
    : rect(rulerX.x, rulerX.y - g - CHECK_SQUARES_MM.height, CHECK_SQUARES_MM.width, CHECK_SQUARES_MM.height);
  const bottomBandStart = Math.min(rulerX.y, checkSquares.y);

  // The vertical ruler's column runs from under whatever sits at its left in the top band
  // to over whatever sits at its left in the bottom band; the ruler hangs at its foot.
  const columnTop = a.rowInset ? rowY : topBandEnd + g;
  const columnBottom = a.rulerInset ? bottom : bottomBandStart - g;
  const rulerY = rect(left, columnBottom - RULER_LENGTH_MM, RULER_WIDTH_MM, RULER_LENGTH_MM);

  const content = rect(left + column, topBandEnd + g, right - left - column, bottomBandStart - g - (topBandEnd + g));
  const fits =
    rightOf(titleBlock) <= right &&
    rightOf(drillLegend) <= right &&
    rightOf(rulerX) <= right &&
    rightOf(checkSquares) <= right &&
    rulerY.y >= columnTop &&
    content.width > 0 &&
    content.height > 0;
  return fits ? { furniture: { rulerX, rulerY, checkSquares, titleBlock, drillLegend, notes }, content } : null;
}

function rect(x: number, y: number, width: number, height: number): Rect {
  return { x, y, width, height };
}

function rightOf(r: Rect): number {
  return r.x + r.width;
}

function bottomOf(r: Rect): number {
  return r.y + r.height;
}
