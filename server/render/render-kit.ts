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
import { AppError } from '../http/app-error.ts';
import { createPdfDocument } from './pdf/pdf-writer.ts';
import { createSvgSheet } from './svg/svg-writer.ts';

/** What a render request carries: a design document, paper, and optionally a printer's measurements. */
export const renderRequestSchema = z.object({
  design: z.unknown(),
  print: printOptionsSchema.default(printOptionsSchema.parse({})),
  printer: z.object({ measuredXMm: z.number(), measuredYMm: z.number() }).optional(),
  version: z.string().trim().max(40).default('1'),
});
export type RenderRequest = z.input<typeof renderRequestSchema>;

interface PreparedKit {
  design: Design;
  layout: Layout;
  plan: KitPlan;
  print: PrintOptions;
}

/** Validates the design, lays it out and imposes it; bad input becomes a 400/422 with reasons. */
export function prepareKit(input: RenderRequest, today = new Date()): PreparedKit {
  const request = renderRequestSchema.parse(input);
  const design = validDesign(request.design);
  const layout = layoutDesign(design);
  const kit = planPrintableKit(design, layout, request.print, {
    version: request.version,
    date: today.toISOString().slice(0, 10),
    printer: request.printer ? printerScale(request.printer) : undefined,
  });
  if (!kit.ok) throw new AppError(422, kit.code, kit.message);
  return { design, layout, plan: kit.plan, print: request.print };
}

export async function renderKitPdf(input: RenderRequest, today?: Date): Promise<{ bytes: Uint8Array; sheets: number; fileName: string }> {
  const { design, plan, print } = prepareKit(input, today);
  const pdf = await createPdfDocument({ title: `${design.name}: drilling templates`, subject: 'Canwright kit', creationDate: today });
  plan.imposition.sheets.forEach((sheet, i) => plan.drawSheet(i, pdf.addSheet(sheet.widthMm, sheet.heightMm, plan.transform)));
  // The build sheet goes last, portrait on the same paper, so sheet n of the kit stays page n.
  const page = sheetSize(paperSizes[print.paper], 'portrait');
  plan.drawBuildSheet(pdf.addSheet(page.widthMm, page.heightMm), { widthMm: page.widthMm, marginMm: print.marginMm });
  return { bytes: await pdf.save(), sheets: plan.imposition.sheets.length, fileName: `${fileStem(design.name)}-kit.pdf` };
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
  plan.imposition.sheets.forEach((sheet, i) => plan.drawSheet(i, pdf.addSheet(sheet.widthMm, sheet.heightMm, plan.transform)));
  plan.drawBuildSheet(pdf.addSheet(page.widthMm, page.heightMm), { widthMm: page.widthMm, marginMm: print.marginMm });
  return { bytes: await pdf.save(), pages: 1 + signOffPages + plan.imposition.sheets.length + 1, fileName: `${fileStem(meta.title)}-class-pack.pdf` };
}

/** One SVG file per sheet. */
export function renderKitSvg(input: RenderRequest, today?: Date): { sheets: string[]; fileStem: string } {
  const { design, plan } = prepareKit(input, today);
  const sheets = plan.imposition.sheets.map((sheet, i) => {
    const svg = createSvgSheet(sheet.widthMm, sheet.heightMm, { title: `${design.name}: sheet ${i + 1} of ${plan.imposition.sheets.length}`, transform: plan.transform });
    plan.drawSheet(i, svg.context);
    return svg.toString();
  });
  return { sheets, fileStem: fileStem(design.name) };
}

/**
 * One sheet of the kit as SVG. The sheet is looked up in the plan before anything is drawn, so a
 * sheet that does not exist costs a layout, not a render.
 */
export function renderKitSvgSheet(input: RenderRequest, sheet: number, today?: Date): { svg: string; sheets: number; fileStem: string } {
  const { design, plan } = prepareKit(input, today);
  const count = plan.imposition.sheets.length;
  const found = plan.imposition.sheets[sheet - 1];
  if (!found) throw new AppError(404, 'NOT_FOUND', `This kit has ${count} sheet${count === 1 ? '' : 's'}; there is no sheet ${sheet}.`);
  const svg = createSvgSheet(found.widthMm, found.heightMm, { title: `${design.name}: sheet ${sheet} of ${count}`, transform: plan.transform });
  plan.drawSheet(sheet - 1, svg.context);
  return { svg: svg.toString(), sheets: count, fileStem: fileStem(design.name) };
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

function fileStem(name: string): string {
  return (
    name
      .toLowerCase()
      .replace(/[^a-z0-9]+/g, '-')
      .replace(/^-+|-+$/g, '')
      .slice(0, 60) || 'design'
  );
}
