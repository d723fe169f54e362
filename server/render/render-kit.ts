import { z } from 'zod';
import type { Design } from '../../shared/design/index.ts';
import { validateDesign } from '../../shared/design/index.ts';
import type { DrawingContext } from '../../shared/drawing/drawing-context.ts';
import { formatHoleCsv, layoutDesign, type Layout } from '../../shared/layout/index.ts';
import { classPackContent, drawClassPackCover, drawClassPackSignOff, signOffRows, type ClassPackMeta } from '../../shared/print/class-pack.ts';
import { drawCalibrationSheet } from '../../shared/print/draw-calibration.ts';
import { kitText } from '../../shared/print/kit-text.ts';
import { paperSizes, printOptionsSchema, sheetSize, type PrintOptions } from '../../shared/print/index.ts';
import { planPrintableKit, type KitPlan } from '../../shared/print/plan-kit.ts';
import { printerScale } from '../../shared/print/printer-profile.ts';
import { sheetMapItems } from '../../shared/print/sheet-map.ts';
import { AppError } from '../http/app-error.ts';
import { createPdfDocument, type PdfKit } from './pdf/pdf-writer.ts';
import { createSvgSheet } from './svg/svg-writer.ts';

/** What a render request carries: a design document, paper, and optionally a printer's measurements. */
export const renderRequestSchema = z.object({
  design: z.unknown(),
  print: printOptionsSchema.default(printOptionsSchema.parse({})),
  /** The printer profile the kit is scaled for; its name prints on every sheet and goes in the file name. */
  printer: z.object({ name: z.string().trim().min(1).max(80).optional(), measuredXMm: z.number(), measuredYMm: z.number() }).optional(),
  version: z.string().trim().max(40).default('1'),
});
export type RenderRequest = z.input<typeof renderRequestSchema>;

interface PreparedKit {
  design: Design;
  layout: Layout;
  plan: KitPlan;
  print: PrintOptions;
  /** The kit's file name without extension: the design's name and the printer it is scaled for. */
  kitStem: string;
}

/** Validates the design, lays it out and imposes it; bad input becomes a 400/422 with reasons. */
export function prepareKit(input: RenderRequest, today = new Date()): PreparedKit {
  const request = renderRequestSchema.parse(input);
  const design = validDesign(request.design);
  const layout = layoutDesign(design);
  const kit = planPrintableKit(design, layout, request.print, {
    version: request.version,
    date: today.toISOString().slice(0, 10),
    printer: request.printer ? { ...printerScale(request.printer), name: request.printer.name } : undefined,
  });
  if (!kit.ok) throw new AppError(422, kit.code, kit.message);
  return { design, layout, plan: kit.plan, print: request.print, kitStem: `${fileStem(design.name)}-kit-${printerStem(request.printer)}` };
}

export async function renderKitPdf(input: RenderRequest, today?: Date): Promise<{ bytes: Uint8Array; sheets: number; pages: number; fileName: string }> {
  const { design, plan, print, kitStem } = prepareKit(input, today);
  const pdf = await createPdfDocument({ title: `${design.name}: drilling templates`, subject: 'Canwright kit', creationDate: today });
  const pages = addKitPages(pdf, plan, print);
  return { bytes: await pdf.save(), sheets: plan.imposition.sheets.length, pages, fileName: `${kitStem}.pdf` };
}

/**
 * The kit's pages: the template sheets first, so sheet n of the kit stays page n; then the sheet
 * map (on as many pages as it takes) and the build sheet, portrait on the same paper. Answers the
 * number of pages added.
 */
function addKitPages(pdf: PdfKit, plan: KitPlan, print: PrintOptions): number {
  plan.imposition.sheets.forEach((sheet, i) => plan.drawSheet(i, pdf.addSheet(sheet.widthMm, sheet.heightMm, plan.transform)));
  const page = sheetSize(paperSizes[print.paper], 'portrait');
  const box = { widthMm: page.widthMm, heightMm: page.heightMm, marginMm: print.marginMm };
  const items = sheetMapItems(plan.sheetMap).length;
  let mapPages = 0;
  for (let item = 0; mapPages === 0 || item < items; mapPages++) {
    const next = plan.drawSheetMap(pdf.addSheet(page.widthMm, page.heightMm), box, item);
    if (next === item && mapPages > 0) throw new Error('A sheet map page fitted nothing');
    item = next;
  }
  plan.drawBuildSheet(pdf.addSheet(page.widthMm, page.heightMm), box);
  return plan.imposition.sheets.length + mapPages + 1;
}

/**
 * The instructor's class pack: a cover with the materials and tools for the group's builds, the
 * safety briefing with a sign-off line per person, then one kit (its sheets and build sheet).
 */
export async function renderClassPackPdf(input: RenderRequest, meta: ClassPackMeta, today?: Date): Promise<{ bytes: Uint8Array; pages: number; fileName: string }> {
  const { design, layout, plan, print } = prepareKit(input, today);
  const content = classPackContent(design, layout, plan.info.pilots, kitText(design.units), meta);
  const pdf = await createPdfDocument({ title: content.title, subject: 'Canwright class pack', creationDate: today });
  const page = sheetSize(paperSizes[print.paper], 'portrait');
  drawClassPackCover(pdf.addSheet(page.widthMm, page.heightMm), content, { widthMm: page.widthMm, marginMm: print.marginMm });
  // The sign-off list runs on over as many pages as the roster needs (a continuation page always fits rows).
  const rows = signOffRows(content).length;
  let signOffPages = 0;
  for (let row = 0; signOffPages === 0 || row < rows; signOffPages++) {
    const next = drawClassPackSignOff(pdf.addSheet(page.widthMm, page.heightMm), content, { widthMm: page.widthMm, heightMm: page.heightMm, marginMm: print.marginMm }, row);
    if (next === row && signOffPages > 0) throw new Error('A sign-off page fitted no row');
    row = next;
  }
  const kitPages = addKitPages(pdf, plan, print);
  return { bytes: await pdf.save(), pages: 1 + signOffPages + kitPages, fileName: `${fileStem(meta.title, 'workshop')}-class-pack.pdf` };
}

/** One SVG file per sheet. */
export function renderKitSvg(input: RenderRequest, today?: Date): { sheets: string[]; fileStem: string } {
  const { design, plan, kitStem } = prepareKit(input, today);
  const sheets = plan.imposition.sheets.map((sheet, i) => {
    const svg = createSvgSheet(sheet.widthMm, sheet.heightMm, { title: `${design.name}: sheet ${i + 1} of ${plan.imposition.sheets.length}`, transform: plan.transform });
    plan.drawSheet(i, svg.context);
    return svg.toString();
  });
  return { sheets, fileStem: kitStem };
}

/**
 * One sheet of the kit as SVG. The sheet is looked up in the plan before anything is drawn, so a
 * sheet that does not exist costs a layout, not a render.
 */
export function renderKitSvgSheet(input: RenderRequest, sheet: number, today?: Date): { svg: string; sheets: number; fileStem: string } {
  const { design, plan, kitStem } = prepareKit(input, today);
  const count = plan.imposition.sheets.length;
  const found = plan.imposition.sheets[sheet - 1];
  if (!found) throw new AppError(404, 'NOT_FOUND', `This kit has ${count} sheet${count === 1 ? '' : 's'}; there is no sheet ${sheet}.`);
  const svg = createSvgSheet(found.widthMm, found.heightMm, { title: `${design.name}: sheet ${sheet} of ${count}`, transform: plan.transform });
  plan.drawSheet(sheet - 1, svg.context);
  return { svg: svg.toString(), sheets: count, fileStem: kitStem };
}

export function renderHoleCsv(input: RenderRequest): { csv: string; fileName: string } {
  const design = validDesign(renderRequestSchema.parse(input).design);
  return { csv: formatHoleCsv(layoutDesign(design)), fileName: `${fileStem(design.name)}-holes.csv` };
}

/** The calibration sheet on its own, portrait on the chosen paper. */
export async function renderCalibrationPdf(options: PrintOptions, draw: (ctx: DrawingContext, marginMm: number) => void = drawCalibrationSheet): Promise<Uint8Array> {
  const { widthMm, heightMm } = sheetSize(paperSizes[options.paper], 'portrait');
  const pdf = await createPdfDocument({ title: 'Canwright printer calibration' });
  draw(pdf.addSheet(widthMm, heightMm), options.marginMm);
  return pdf.save();
}

/** The design, or a 400 listing each bad field under "design.". */
function validDesign(input: unknown): Design {
  const validation = validateDesign(input);
  if (validation.ok) return validation.design;
  throw new AppError(400, 'INVALID_DESIGN', 'The design is not valid.', { fields: validation.problems.map((p) => ({ path: `design.${p.path}`, message: p.message })) });
}

/**
 * A file name from a design's or workshop's name: lower case, accents kept as their letters
 * ("Śliwka" -> "sliwka"), other scripts kept as they are, anything else a hyphen. The routes
 * send it with an RFC 6266 filename* beside an ASCII fallback.
 */
export function fileStem(name: string, fallback = 'design'): string {
  return (
    name
      .normalize('NFKD')
      .replace(/\p{M}+/gu, '')
      .toLowerCase()
      .replace(/[^\p{L}\p{N}]+/gu, '-')
      .replace(/^-+|-+$/g, '')
      .slice(0, 60)
      .replace(/-+$/, '') || fallback
  );
}

/** The printer profile a kit was scaled for, in its file name: "office-laser", or "no-printer-profile". */
function printerStem(printer: z.infer<typeof renderRequestSchema>['printer']): string {
  return printer?.name ? `for-${fileStem(printer.name, 'printer')}` : 'no-printer-profile';
}
