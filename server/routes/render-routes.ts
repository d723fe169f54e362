import express, { Router } from 'express';
import { z } from 'zod';
import { printOptionsSchema } from '../../shared/print/index.ts';
import { parseInput } from '../http/validate.ts';
import { renderCalibrationPdf, renderHoleCsv, renderKitPdf, renderKitSvg, renderRequestSchema } from '../render/render-kit.ts';

/** A design document is small; anything far larger is refused with 413 before parsing. */
const RENDER_BODY_LIMIT = '256kb';
const sheetQuerySchema = z.object({ sheet: z.coerce.number().int().min(1).max(40).default(1) });
/** A query holds text only: the margin is read as a number, then checked as in a body. */
const calibrationQuerySchema = printOptionsSchema.extend({ marginMm: z.coerce.number().pipe(printOptionsSchema.shape.marginMm.unwrap()).optional() });

/**
 * Printing needs no account: a visitor can print a kit. Every body is validated with field
 * paths; a design that cannot be laid out or imposed gets 422 with the reason.
 */
export function renderRoutes(): Router {
  const router = Router();
  router.use(express.json({ limit: RENDER_BODY_LIMIT }));

  router.post('/pdf', async (req, res) => {
    const { bytes, fileName, sheets } = await renderKitPdf(parseInput(renderRequestSchema, req.body));
    res.set({ 'Content-Type': 'application/pdf', 'Content-Disposition': `attachment; filename="${fileName}"`, 'X-Sheet-Count': String(sheets), 'Cache-Control': 'no-store' });
    res.end(Buffer.from(bytes));
  });

  router.post('/svg', (req, res) => {
    const body = parseInput(renderRequestSchema, req.body);
    const sheet = parseInput(sheetQuerySchema, req.query).sheet;
    const { sheets, fileStem } = renderKitSvg(body);
    const svg = sheets[sheet - 1];
    if (!svg) {
      res.status(404).json({ error: { code: 'NOT_FOUND', message: `This kit has ${sheets.length} sheets; there is no sheet ${sheet}.` } });
      return;
    }
    res.set({ 'Content-Type': 'image/svg+xml; charset=utf-8', 'Content-Disposition': `attachment; filename="${fileStem}-sheet-${sheet}.svg"`, 'X-Sheet-Count': String(sheets.length) });
    res.send(svg);
  });

  router.post('/holes.csv', (req, res) => {
    const { csv, fileName } = renderHoleCsv(parseInput(renderRequestSchema, req.body));
    res.set({ 'Content-Type': 'text/csv; charset=utf-8', 'Content-Disposition': `attachment; filename="${fileName}"` });
    res.send(csv);
  });

  router.get('/calibration.pdf', async (req, res) => {
    const options = printOptionsSchema.parse(parseInput(calibrationQuerySchema, req.query));
    const bytes = await renderCalibrationPdf(options);
    res.set({ 'Content-Type': 'application/pdf', 'Content-Disposition': 'attachment; filename="canwright-calibration.pdf"' });
    res.end(Buffer.from(bytes));
  });
  return router;
}
