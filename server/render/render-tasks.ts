import type { ClassPackMeta } from '../../shared/print/class-pack.ts';
import type { PrintOptions } from '../../shared/print/index.ts';
import { AppError } from '../http/app-error.ts';
import { renderCalibrationPdf, renderClassPackPdf, renderHoleCsv, renderKitPdf, renderKitSvgSheet, type RenderRequest } from './render-kit.ts';

/** A render the server hands to a worker thread: inputs already checked against their schemas. */
export type RenderTask =
  | { kind: 'pdf'; request: RenderRequest }
  | { kind: 'svg'; request: RenderRequest; sheet: number }
  | { kind: 'csv'; request: RenderRequest }
  | { kind: 'calibration'; options: PrintOptions }
  | { kind: 'class-pack'; request: RenderRequest; meta: ClassPackMeta };

export type RenderResult =
  | { kind: 'pdf'; bytes: Uint8Array; sheets: number; fileName: string }
  | { kind: 'svg'; svg: string; sheets: number; fileName: string }
  | { kind: 'csv'; csv: string; fileName: string }
  | { kind: 'calibration'; bytes: Uint8Array; fileName: string }
  | { kind: 'class-pack'; bytes: Uint8Array; pages: number; fileName: string };

/** A refusal travels back from the worker as data (an Error thrown across threads loses its class). */
export type RenderOutcome = { ok: true; result: RenderResult } | { ok: false; status: number; code: string; message: string; details?: unknown };

export async function runRenderTask(task: RenderTask): Promise<RenderOutcome> {
  try {
    return { ok: true, result: await render(task) };
  } catch (error) {
    if (error instanceof AppError) return { ok: false, status: error.status, code: error.code, message: error.message, details: error.details };
    throw error;
  }
}

async function render(task: RenderTask): Promise<RenderResult> {
  switch (task.kind) {
    case 'pdf': {
      const { bytes, sheets, fileName } = await renderKitPdf(task.request);
      return { kind: 'pdf', bytes, sheets, fileName };
    }
    case 'svg': {
      const { svg, sheets, fileStem } = renderKitSvgSheet(task.request, task.sheet);
      return { kind: 'svg', svg, sheets, fileName: `${fileStem}-sheet-${task.sheet}.svg` };
    }
    case 'csv': {
      const { csv, fileName } = renderHoleCsv(task.request);
      return { kind: 'csv', csv, fileName };
    }
    case 'calibration':
      return { kind: 'calibration', bytes: await renderCalibrationPdf(task.options), fileName: 'canwright-calibration.pdf' };
    case 'class-pack':
      return { kind: 'class-pack', ...(await renderClassPackPdf(task.request, task.meta)) };
  }
}
