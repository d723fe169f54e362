import type { DrawingContext, TextStyle } from '../drawing/drawing-context.ts';
import type { Hole } from '../layout/layout-types.ts';
import { wrapText } from './draw-build-sheet.ts';
import { describeDrill, type KitText } from './kit-text.ts';
import { drawCheckSquares, drawRuler } from './draw-ruler.ts';
import { strokes, type } from './draw-style.ts';
import { drawFlagSymbol } from './draw-hole.ts';
import type { Sheet } from './imposition-types.ts';

export interface KitInfo {
  designName: string;
  version: string;
  /** ISO date, e.g. 2026-12-01. */
  date: string;
  /** Drill label -> pilot drill label, where a pilot is advised. */
  pilots: Map<string, string>;
  /** The printer profile the kit is scaled for, in words (kit-text.ts scaledFor). */
  printer: string;
  /** Set per sheet by drawKitSheet: the sheet shows a hole a check flagged, so its legend explains the mark. */
  flaggedOnSheet?: boolean;
}

export interface LegendRow {
  hole: Pick<Hole, 'drillId' | 'drillLabel' | 'diameterMm'>;
  count: number;
}

/** Rulers, check squares, title block, drill legend and the two notes that every sheet carries. */
export function drawFurniture(ctx: DrawingContext, sheet: Sheet, sheetCount: number, parts: string, legend: LegendRow[], info: KitInfo, text: KitText): void {
  const f = sheet.furniture;
  drawRuler(ctx, f.rulerX, 'x');
  drawRuler(ctx, f.rulerY, 'y');
  drawCheckSquares(ctx, f.checkSquares);

  const t = f.titleBlock;
  ctx.rect(t.x, t.y, t.width, t.height, { stroke: strokes.frame });
  const titleLines: [string, TextStyle][] = [
    [fit(info.designName, t.width - 3, type.title.sizeMm), type.title],
    [fit(parts, t.width - 3, type.label.sizeMm), type.label],
    [`Version ${info.version} · ${info.date} · ${text.sheet(sheet.number, sheetCount)} · ${text.units === 'in' ? 'inches' : 'millimetres'}`, type.small],
    // The printer profile the kit is scaled for, on every sheet.
    [fit(info.printer, t.width - 3, type.small.sizeMm), { ...type.small, color: 'ink' }],
  ];
  titleLines.forEach(([line, style], i) => ctx.text(t.x + 1.5, t.y + 4.5 + i * 5.2, line, style));

  const l = f.drillLegend;
  ctx.rect(l.x, l.y, l.width, l.height, { stroke: strokes.frame });
  ctx.text(l.x + 1.5, l.y + 4, 'Drills on this sheet', { ...type.label, weight: 'bold' });
  // A sheet with flagged holes keeps its last line for the flag's legend.
  const rowsThatFit = Math.max(1, Math.floor((l.height - 6) / 3.8) - (info.flaggedOnSheet ? 1 : 0));
  legend.slice(0, rowsThatFit).forEach(({ hole, count }, i) => {
    const pilot = info.pilots.get(hole.drillId);
    const line = `${count} × ${describeDrill(hole, text)}${pilot ? `, pilot ${pilot}` : ''}`;
    ctx.text(l.x + 1.5, l.y + 8.2 + i * 3.8, fit(line, l.width - 3, type.small.sizeMm), type.small);
  });
  if (legend.length === 0) ctx.text(l.x + 1.5, l.y + 8, 'No holes on this sheet', type.small);
  if (legend.length > rowsThatFit) ctx.text(l.x + 1.5, l.y + l.height - (info.flaggedOnSheet ? 5 : 1.2), `and ${legend.length - rowsThatFit} more sizes (see the build sheet)`, type.tiny);
  if (info.flaggedOnSheet) {
    drawFlagSymbol(ctx, l.x + 3, l.y + l.height - 2.6);
    ctx.text(l.x + 5.5, l.y + l.height - 1.6, fit(text.flagLegend, l.width - 7, type.tiny.sizeMm), { ...type.tiny, color: 'ink' });
  }

  const n = f.notes;
  ctx.text(n.x, n.y + 2.9, text.printNote, { ...type.label, weight: 'bold' });
  // The safety note is never cut short: it wraps onto a second line.
  wrapText(text.safetyNote, n.width, type.tiny.sizeMm)
    .slice(0, 2)
    .forEach((line, i) => ctx.text(n.x, n.y + 6.3 + i * 3.1, line, type.tiny));
}

/** Cuts text that would run past a box (at about 0.55 em a character) and marks the cut. */
function fit(text: string, widthMm: number, sizeMm: number): string {
  const max = Math.floor(widthMm / (sizeMm * 0.55));
  return text.length <= max ? text : `${text.slice(0, Math.max(1, max - 1))}…`;
}
