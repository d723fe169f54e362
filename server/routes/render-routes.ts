import express, { Router, type Response } from 'express';
import { z } from 'zod';
import { printOptionsSchema } from '../../shared/print/index.ts';
import { parseInput } from '../http/validate.ts';
import { renderRequestSchema } from '../render/render-kit.ts';
import { busy, type RenderPool } from '../render/render-pool.ts';

/** A design document is small; anything far larger is refused with 413 before parsing. */
const RENDER_BODY_LIMIT = '256kb';
const sheetQuerySchema = z.object({ sheet: z.coerce.number().int().min(1).max(40).default(1) });
/** A query holds text only: the margin is read as a number, then checked as in a body. */
const calibrationQuerySchema = printOptionsSchema.extend({ marginMm: z.coerce.number().pipe(printOptionsSchema.shape.marginMm.unwrap()).optional() });

/**
 * Printing needs no account: a visitor can print a kit. The request (body, sheet, paper) is
 * checked here before any work; the layout and the drawing run in the render pool's threads.
 * A design that cannot be laid out or imposed gets 422 with the reason, a full pool 503.
 */
export function renderRoutes(pool: RenderPool): Router {
  const router = Router();
  // A full pool refuses before the body is even read.
  router.use((_req, _res, next) => next(pool.full ? busy() : undefined));
  router.use(express.json({ limit: RENDER_BODY_LIMIT }));

  router.post('/pdf', async (req, res) => {
    const result = await pool.run({ kind: 'pdf', request: parseInput(renderRequestSchema, req.body) }, abandonedWith(res));
    if (result.kind !== 'pdf') return;
    res.attachment(result.fileName).set({ 'Content-Type': 'application/pdf', 'X-Sheet-Count': String(result.sheets), 'Cache-Control': 'no-store' });
    res.end(Buffer.from(result.bytes));
  });

  router.post('/svg', async (req, res) => {
    const request = parseInput(renderRequestSchema, req.body);
    const { sheet } = parseInput(sheetQuerySchema, req.query);
    const result = await pool.run({ kind: 'svg', request, sheet }, abandonedWith(res));
    if (result.kind !== 'svg') return;
    res.attachment(result.fileName).set({ 'Content-Type': 'image/svg+xml; charset=utf-8', 'X-Sheet-Count': String(result.sheets) });
    res.send(result.svg);
  });

  router.post('/holes.csv', async (req, res) => {
    const result = await pool.run({ kind: 'csv', request: parseInput(renderRequestSchema, req.body) }, abandonedWith(res));
    if (result.kind !== 'csv') return;
    res.attachment(result.fileName).set({ 'Content-Type': 'text/csv; charset=utf-8' });
    res.send(result.csv);
  });

  router.get('/calibration.pdf', async (req, res) => {
    const options = printOptionsSchema.parse(parseInput(calibrationQuerySchema, req.query));
    const result = await pool.run({ kind: 'calibration', options }, abandonedWith(res));
    if (result.kind !== 'calibration') return;
    res.attachment(result.fileName).set({ 'Content-Type': 'application/pdf' });
    res.end(Buffer.from(result.bytes));
  });
  return router;
}

/** A signal that fires when the client goes away before its answer: its render leaves the queue. */
function abandonedWith(res: Response): AbortSignal {
  const controller = new AbortController();
  res.on('close', () => {
    if (!res.writableFinished) controller.abort();
  });
  return controller.signal;
}
