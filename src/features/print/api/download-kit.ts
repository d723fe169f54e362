import type { DesignInput } from '../../../../shared/design/design-schema.ts';
import type { PrintOptions } from '../../../../shared/print/paper.ts';
import type { PrinterProfileInput } from '../../../../shared/print/printer-profile.ts';
import { ApiError, fetchRetryingWhenBusy } from '../../../lib/api-client.ts';

export type KitFormat = 'pdf' | 'svg' | 'csv';

export interface KitRequest {
  design: DesignInput;
  print: PrintOptions;
  /** The profile the kit is scaled for: its name prints on every sheet and goes in the file name. */
  printer?: Pick<PrinterProfileInput, 'name' | 'measuredXMm' | 'measuredYMm'>;
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
  const fileName = fileNameOf(response.headers.get('content-disposition')) ?? `canwright.${format}`;
  const url = URL.createObjectURL(await response.blob());
  const link = Object.assign(document.createElement('a'), { href: url, download: fileName });
  document.body.append(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
  return { fileName, sheets: Number(response.headers.get('x-sheet-count') ?? 1) };
}

/** The file name of a Content-Disposition header: RFC 6266's UTF-8 filename* when given, else filename. */
export function fileNameOf(header: string | null): string | undefined {
  if (!header) return undefined;
  const extended = /filename\*\s*=\s*UTF-8''([^;\s]+)/i.exec(header)?.[1];
  if (extended) {
    try {
      return decodeURIComponent(extended);
    } catch {
      // A malformed escape: fall back to the plain name.
    }
  }
  // Quoted, or a bare token when the name needs no quotes (RFC 6266, section 4.1).
  const plain = /filename\s*=\s*(?:"([^"]+)"|([^;\s]+))/i.exec(header);
  return plain?.[1] ?? plain?.[2];
}
