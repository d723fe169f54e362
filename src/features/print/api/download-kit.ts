import type { DesignInput } from '../../../../shared/design/design-schema.ts';
import type { PrintOptions } from '../../../../shared/print/paper.ts';
import type { PrinterProfileInput } from '../../../../shared/print/printer-profile.ts';
import { ApiError, fetchRetryingWhenBusy } from '../../../lib/api-client.ts';

export type KitFormat = 'pdf' | 'svg' | 'csv';

export interface KitRequest {
  design: DesignInput;
  print: PrintOptions;
  printer?: Pick<PrinterProfileInput, 'measuredXMm' | 'measuredYMm'>;
  sheet?: number;
  /** Printed in each sheet's title block. */
  version?: string;
}

const paths: Record<KitFormat, string> = { pdf: '/api/render/pdf', svg: '/api/render/svg', csv: '/api/render/holes.csv' };

/** Asks the server for the kit file and hands it to the browser as a download. */
export async function downloadKit(format: KitFormat, request: KitRequest): Promise<{ fileName: string; sheets: number }> {
  const query = format === 'svg' ? `?sheet=${request.sheet ?? 1}` : '';
  // A busy server (every render thread taken) asks to wait a moment: the download tries again by itself.
  const response = await fetchRetryingWhenBusy(paths[format] + query, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ design: request.design, print: request.print, printer: request.printer, version: request.version }),
  });
  if (!response.ok) {
    const body = (await response.json().catch(() => undefined)) as { error?: { code?: string; message?: string } } | undefined;
    throw new ApiError(response.status, body?.error?.code ?? 'HTTP', body?.error?.message ?? `The server answered ${response.status}.`);
  }
  const fileName = /filename="([^"]+)"/.exec(response.headers.get('content-disposition') ?? '')?.[1] ?? `canwright.${format}`;
  const url = URL.createObjectURL(await response.blob());
  const link = Object.assign(document.createElement('a'), { href: url, download: fileName });
  document.body.append(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
  return { fileName, sheets: Number(response.headers.get('x-sheet-count') ?? 1) };
}
