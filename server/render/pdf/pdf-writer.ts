import { deflateSync } from 'node:zlib';
import { PDFDocument, PDFName, PrintScaling } from 'pdf-lib';
import type { PDFFont, PDFPage } from 'pdf-lib';
import type { DrawingContext } from '../../../shared/drawing/drawing-context.ts';
import { createPlexFonts } from './fonts.ts';
import { PdfPageContext, PT_PER_MM, pageMatrix } from './pdf-page-context.ts';

export interface PdfDocumentOptions {
  title: string;
  subject?: string;
  author?: string;
  /** Written as both creation and modification date; now by default. */
  creationDate?: Date;
}

/** Printer pre-compensation: the page's drawing is scaled about the sheet's top-left corner. */
export interface SheetTransform {
  scaleX: number;
  scaleY: number;
}

export interface PdfKit {
  /** A new page exactly the paper size; draw on it in sheet mm (origin top-left, y down). */
  addSheet(widthMm: number, heightMm: number, transform?: SheetTransform): DrawingContext;
  save(): Promise<Uint8Array>;
}

const PRODUCER = 'Canwright';

/** Points, rounded to 1e-4 pt so Letter is exactly 612 x 792 rather than 612.0000000001. */
function toPt(mm: number): number {
  return Math.round(mm * PT_PER_MM * 1e4) / 1e4;
}

interface SheetState {
  page: PDFPage;
  context: PdfPageContext;
}

/**
 * A PDF of true-scale sheets: every box of every page is exactly the paper, the viewer is asked
 * not to scale when printing, and each page's drawing is one flate-compressed content stream
 * of raw operators (several times faster than one pdf-lib draw call per mark).
 */
export async function createPdfDocument(options: PdfDocumentOptions): Promise<PdfKit> {
  const doc = await PDFDocument.create({ updateMetadata: false });
  // pdf-lib compresses font files with pako (JavaScript); Node's zlib makes the same deflate
  // stream at the same level natively, several times faster (font embedding was ~1.4 ms a kit).
  doc.context.flateStream = (contents, dict = {}) => doc.context.stream(deflateSync(contents, { level: 6 }), { ...dict, Filter: 'FlateDecode' });
  const date = options.creationDate ?? new Date();
  doc.setTitle(options.title, { showInWindowTitleBar: true });
  if (options.subject !== undefined) doc.setSubject(options.subject);
  if (options.author !== undefined) doc.setAuthor(options.author);
  doc.setProducer(PRODUCER);
  doc.setCreator(PRODUCER);
  doc.setCreationDate(date);
  doc.setModificationDate(date);
  // ISO 32000-1, 12.2 Table 150: PrintScaling None asks the print dialog to default to 100 %.
  doc.catalog.getOrCreateViewerPreferences().setPrintScaling(PrintScaling.None);

  const fonts = await createPlexFonts(doc);
  const usedFonts = new Set<PDFFont>();
  const sheets: SheetState[] = [];
  let saved = false;

  return {
    addSheet(widthMm, heightMm, transform = { scaleX: 1, scaleY: 1 }) {
      if (saved) throw new Error('The PDF was already saved');
      if (!(widthMm > 0 && heightMm > 0)) throw new Error(`Bad sheet size ${widthMm} x ${heightMm} mm`);
      if (!(transform.scaleX > 0 && transform.scaleY > 0)) throw new Error('Sheet scale must be positive');
      const widthPt = toPt(widthMm);
      const heightPt = toPt(heightMm);
      const page = doc.addPage([widthPt, heightPt]);
      // ISO 32000-1, 14.11.2: crop, bleed, trim and art boxes all equal the paper.
      page.setCropBox(0, 0, widthPt, heightPt);
      page.setBleedBox(0, 0, widthPt, heightPt);
      page.setTrimBox(0, 0, widthPt, heightPt);
      page.setArtBox(0, 0, widthPt, heightPt);
      const names = new Map<PDFFont, string>();
      const useFont = (font: PDFFont): string => {
        let name = names.get(font);
        if (name === undefined) {
          // One resource name a font on this page: F1, F2, ... in the order the page uses them.
          name = `F${names.size + 1}`;
          page.node.setFontDictionary(PDFName.of(name), font.ref);
          usedFonts.add(font);
          names.set(font, name);
        }
        return name;
      };
      const context = new PdfPageContext(fonts, useFont, pageMatrix(heightPt, transform.scaleX, transform.scaleY));
      sheets.push({ page, context });
      return context;
    },

    async save() {
      if (saved) throw new Error('The PDF was already saved');
      saved = true;
      for (const { page, context } of sheets) {
        // Level 3: page text is repetitive, so fast compression keeps most of the gain at a fraction of the time.
        const stream = doc.context.stream(deflateSync(context.finish(), { level: 3 }), { Filter: 'FlateDecode' });
        page.node.set(PDFName.of('Contents'), doc.context.register(stream));
      }
      for (const font of usedFonts) await font.embed();
      // Plain objects, no object streams (ISO 32000-1, 7.5.7, PDF 1.5): any printer's PDF reader
      // takes them, and saving is faster; the file is ~2 kB larger on a 3-page kit (measured).
      return doc.save({ objectsPerTick: Infinity, useObjectStreams: false });
    },
  };
}
