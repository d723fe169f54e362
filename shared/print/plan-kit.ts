import type { Design } from '../design/design-schema.ts';
import type { DrawingContext } from '../drawing/drawing-context.ts';
import { allDrills, commonDrillSets, resolveDrillSet, suggestPilot } from '../drills/index.ts';
import { numberHoles } from '../layout/hole-numbers.ts';
import type { Layout } from '../layout/layout-types.ts';
import { buildSheetContent, type BuildSheetContent } from './build-sheet.ts';
import { drawBuildSheet } from './draw-build-sheet.ts';
import { drawKitSheet } from './draw-kit.ts';
import type { KitInfo } from './draw-furniture.ts';
import { checkImposable, imposePieces, ImpositionError } from './impose.ts';
import type { Imposition } from './imposition-types.ts';
import type { PrintOptions } from './paper.ts';
import { kitText } from './kit-text.ts';
import { drawSheetMap, sheetMapContent, type SheetMapContent } from './sheet-map.ts';

/** How one printer mis-scales, measured from its calibration sheet: 1.015 = prints 1.5 % long. */
export interface PrinterScale {
  scaleX: number;
  scaleY: number;
  /** The profile's name, printed on every sheet. */
  name?: string | undefined;
}

export interface KitPlan {
  imposition: Imposition;
  info: KitInfo;
  /** The page transform that pre-compensates the printer (identity without a profile). */
  transform: { scaleX: number; scaleY: number };
  drawSheet(index: number, ctx: DrawingContext): void;
  /** The build sheet's words (materials, holes, order of work, safety), printed after the templates. */
  buildSheet: BuildSheetContent;
  /** What each sheet holds, in words: "Outer shell, wall (part 1 of 3)". */
  sheetContents: string[];
  drawBuildSheet(ctx: DrawingContext, page: { widthMm: number; marginMm: number }): void;
  /** Which sheet holds which piece and how tiles join, printed after the templates. */
  sheetMap: SheetMapContent;
  /** Draws the sheet map from item `from`; answers where a next page carries on (see drawSheetMap). */
  drawSheetMap(ctx: DrawingContext, page: { widthMm: number; heightMm: number; marginMm: number }, from?: number): number;
}

/**
 * Everything a writer needs to print a design's kit: the sheets with their pieces, and a draw
 * function per sheet. The PDF, the SVG and the on-screen sheet previews all come from here.
 */
export function planKit(design: Design, layout: Layout, options: PrintOptions, meta: { version: string; date: string; printer?: PrinterScale }): KitPlan {
  const imposition = imposePieces(layout.pieces, options);
  const text = kitText(design.units);
  const info: KitInfo = { designName: design.name, version: meta.version, date: meta.date, pilots: pilotsFor(design, layout), printer: text.scaledFor(meta.printer) };
  const buildSheet = buildSheetContent(design, layout, info.pilots, text);
  // One numbering for the whole kit: the templates, the build sheet and the CSV agree.
  const numbers = new Map(numberHoles(layout).map(({ hole, number }) => [hole.id, number]));
  const sheetContents = imposition.sheets.map((sheet) =>
    sheet.placements
      .map((p) => {
        const name = layout.pieces.find((piece) => piece.id === p.pieceId)?.name ?? p.pieceId;
        return p.tile ? `${name} (${text.tile(p.tile.number, p.tile.count)})` : name;
      })
      .join('; '),
  );
  const sheetMap = sheetMapContent(design, layout, imposition, text);
  return {
    imposition,
    info,
    transform: compensate(meta.printer),
    buildSheet,
    sheetContents,
    sheetMap,
    drawSheetMap(ctx, page, from = 0) {
      return drawSheetMap(ctx, sheetMap, page, from);
    },
    drawSheet(index, ctx) {
      const sheet = imposition.sheets[index];
      if (!sheet) throw new RangeError(`No sheet ${index + 1} in this kit`);
      drawKitSheet(ctx, sheet, imposition, layout, info, text, numbers);
    },
    drawBuildSheet(ctx, page) {
      drawBuildSheet(ctx, buildSheet, page);
    },
  };
}

/** A printer that prints `scale` times too long gets drawings `1 / scale` long, so paper measures true. */
export function compensate(printer?: PrinterScale): { scaleX: number; scaleY: number } {
  return printer ? { scaleX: 1 / printer.scaleX, scaleY: 1 / printer.scaleY } : { scaleX: 1, scaleY: 1 };
}

/** A pilot drill for each size that wants one, from the maker's set (or the 29-piece set). */
function pilotsFor(design: Design, layout: Layout): Map<string, string> {
  const set = design.drillSet.drillIds.length ? resolveDrillSet(design.drillSet) : resolveDrillSet(commonDrillSets[0] ?? { name: 'all', drillIds: allDrills().map((d) => d.id) });
  const pilots = new Map<string, string>();
  for (const hole of layout.holes) {
    if (pilots.has(hole.drillId)) continue;
    const pilot = suggestPilot(hole.diameterMm, set);
    if (pilot) pilots.set(hole.drillId, pilot.label);
  }
  return pilots;
}

export type PrintableKit = { ok: true; plan: KitPlan } | { ok: false; code: 'TOO_MANY_HOLES' | 'NO_HOLES' | 'DOES_NOT_FIT'; message: string };

/**
 * planKit behind the refusals every caller needs, in the same words for the server's 422 and
 * the print screen: too many holes, nothing to drill, pieces that do not fit the paper or the
 * sheet cap.
 */
export function planPrintableKit(design: Design, layout: Layout, options: PrintOptions, meta: { version: string; date: string; printer?: PrinterScale }): PrintableKit {
  const tooMany = layout.findings.find((f) => f.rule === 'too-many-holes');
  if (tooMany) return { ok: false, code: 'TOO_MANY_HOLES', message: tooMany.message };
  if (layout.holes.length === 0) return { ok: false, code: 'NO_HOLES', message: 'This design has no holes to print yet: add a row round the wall or rings on the bottom.' };
  const problems = checkImposable(layout.pieces, options);
  if (problems.length) return { ok: false, code: 'DOES_NOT_FIT', message: problems.join(' ') };
  try {
    return { ok: true, plan: planKit(design, layout, options, meta) };
  } catch (error) {
    if (error instanceof ImpositionError) return { ok: false, code: 'DOES_NOT_FIT', message: error.message };
    throw error;
  }
}
