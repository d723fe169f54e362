import { z } from 'zod';
import type { Orientation, PaperId, PaperSize } from './imposition-types.ts';

/** 1 in = 25.4 mm exactly (NIST SP 811, appendix B). */
const IN = 25.4;

/** Portrait sizes of the papers a kit can print on. */
export const paperSizes: Record<PaperId, PaperSize> = {
  // ANSI/ASME Y14.1 size A: 8.5 x 11 in.
  letter: { id: 'letter', name: 'Letter', widthMm: 8.5 * IN, heightMm: 11 * IN },
  // North American legal, 8.5 x 14 in (not in the ANSI series; from memory).
  legal: { id: 'legal', name: 'Legal', widthMm: 8.5 * IN, heightMm: 14 * IN },
  // ANSI/ASME Y14.1 size B: 11 x 17 in.
  tabloid: { id: 'tabloid', name: 'Tabloid', widthMm: 11 * IN, heightMm: 17 * IN },
  // ISO 216: A4 is 210 x 297 mm, A3 297 x 420 mm.
  a4: { id: 'a4', name: 'A4', widthMm: 210, heightMm: 297 },
  a3: { id: 'a3', name: 'A3', widthMm: 297, heightMm: 420 },
};

/** Home printers cannot print closer to the edge than about half an inch (common practice, no source). */
export const MIN_MARGIN_MM = 12.7;
/** Past this the furniture crowds out the pieces on the smaller papers. */
export const MAX_MARGIN_MM = 40;

export const paperIds = ['letter', 'legal', 'tabloid', 'a4', 'a3'] as const satisfies readonly PaperId[];
// Compile-time guard: paperIds lists every PaperId.
type MissingPaper = Exclude<PaperId, (typeof paperIds)[number]>;
const _everyPaperListed: [MissingPaper] extends [never] ? true : never = true;

export const paperIdSchema = z.enum(paperIds);
export const orientationSchema = z.enum(['portrait', 'landscape'] as const satisfies readonly Orientation[]);

/** What the maker picks in the print dialog. */
export const printOptionsSchema = z.object({
  paper: paperIdSchema.default('letter'),
  orientation: orientationSchema.default('portrait'),
  marginMm: z.number().min(MIN_MARGIN_MM).max(MAX_MARGIN_MM).default(MIN_MARGIN_MM),
});
export type PrintOptions = z.infer<typeof printOptionsSchema>;
export type PrintOptionsInput = z.input<typeof printOptionsSchema>;

/** The sheet as it goes through the printer: landscape swaps width and height. */
export function sheetSize(paper: PaperId | PaperSize, orientation: Orientation): { widthMm: number; heightMm: number } {
  const size = typeof paper === 'string' ? paperSizes[paper] : paper;
  return orientation === 'portrait'
    ? { widthMm: size.widthMm, heightMm: size.heightMm }
    : { widthMm: size.heightMm, heightMm: size.widthMm };
}

/** "Letter portrait", for messages. */
export function describeSheet(paper: PaperId | PaperSize, orientation: Orientation): string {
  const size = typeof paper === 'string' ? paperSizes[paper] : paper;
  return `${size.name} ${orientation}`;
}
