import type { DrawingContext } from '../drawing/drawing-context.ts';
import { strokes, type } from './draw-style.ts';
import { drawCheckSquares } from './draw-ruler.ts';

/** Length of the long calibration rulers: long enough that 1 mm of error is 0.67 %. */
export const CALIBRATION_X_MM = 150;
export const CALIBRATION_Y_MM = 200;

/**
 * The calibration sheet: one long ruler across and one down, each with mm ticks and a number
 * every 10 mm. The maker measures end mark to end mark and enters the two lengths; the printer
 * profile then scales later kits so they measure true.
 */
export function drawCalibrationSheet(ctx: DrawingContext, marginMm: number): void {
  // Fits every supported paper in portrait: Letter is the shortest, 279.4 mm (ANSI).
  const left = marginMm + 20;
  const top = marginMm + 20;
  ctx.text(marginMm, marginMm + 6, 'Canwright printer calibration', { ...type.title, sizeMm: 5 });
  const steps = [
    '1. Print this page at 100 % / actual size (no "fit to page").',
    `2. Measure the long rulers from the 0 mark to the ${CALIBRATION_X_MM} and ${CALIBRATION_Y_MM} marks.`,
    '3. Enter both lengths in Canwright; later kits are scaled so they print true.',
  ];
  steps.forEach((line, i) => ctx.text(marginMm, marginMm + 12 + i * 4.5, line, type.label));

  const y0 = top + 8;
  ctx.line(left, y0, left + CALIBRATION_X_MM, y0, strokes.edge);
  for (let mm = 0; mm <= CALIBRATION_X_MM; mm++) {
    const length = mm % 10 === 0 ? 6 : mm % 5 === 0 ? 4 : 2.5;
    ctx.line(left + mm, y0, left + mm, y0 + length, strokes.tick);
    if (mm % 10 === 0) ctx.text(left + mm, y0 + 9.5, String(mm), { ...type.tiny, anchor: 'middle' });
  }
  ctx.text(left, y0 - 2, `Across: measure 0 to ${CALIBRATION_X_MM} mm`, type.small);

  const x0 = left;
  const yTop = y0 + 16;
  const usable = CALIBRATION_Y_MM;
  ctx.line(x0, yTop, x0, yTop + usable, strokes.edge);
  for (let mm = 0; mm <= usable; mm++) {
    const length = mm % 10 === 0 ? 6 : mm % 5 === 0 ? 4 : 2.5;
    ctx.line(x0, yTop + mm, x0 + length, yTop + mm, strokes.tick);
    if (mm % 10 === 0) ctx.text(x0 + 8, yTop + mm + 0.8, String(mm), type.tiny);
  }
  ctx.text(x0 + 16, yTop + 6, `Down: measure 0 to ${usable} mm`, { ...type.small, rotateDeg: -90 });
  drawCheckSquares(ctx, { x: x0 + 40, y: yTop + 20, width: 60, height: 28 });
}
