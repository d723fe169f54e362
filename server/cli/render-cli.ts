import { mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { parseArgs } from 'node:util';
import { ZodError } from 'zod';
import { AppError } from '../http/app-error.ts';
import { renderHoleCsv, renderKitPdf, renderKitSvg, type RenderRequest } from '../render/render-kit.ts';

/**
 * npm run render -- <design.json> [--paper letter|legal|tabloid|a4|a3] [--orientation portrait|landscape]
 *                   [--format pdf|svg|csv] [-o out] [--printer-x 151.2 --printer-y 199.4 [--printer-name "Office laser"]]
 * Writes the kit for batch use: a PDF, one SVG per sheet (out-sheet-N.svg), or the hole table.
 */
const usage =
  'Usage: npm run render -- <design.json> [--paper letter|legal|tabloid|a4|a3] [--orientation portrait|landscape] [--format pdf|svg|csv] [-o file] [--printer-x mm --printer-y mm [--printer-name name]]';

async function main(): Promise<number> {
  let args;
  try {
    args = parseArgs({
      allowPositionals: true,
      options: {
        paper: { type: 'string', default: 'letter' },
        orientation: { type: 'string', default: 'portrait' },
        format: { type: 'string', short: 'f', default: 'pdf' },
        out: { type: 'string', short: 'o' },
        'printer-x': { type: 'string' },
        'printer-name': { type: 'string' },
        'printer-y': { type: 'string' },
        help: { type: 'boolean', short: 'h' },
      },
    });
  } catch (error) {
    console.error(`${(error as Error).message}\n${usage}`);
    return 2;
  }
  const { values, positionals } = args;
  if (values.help) return console.log(usage), 0;
  const [file] = positionals;
  if (!file || !['pdf', 'svg', 'csv'].includes(values.format)) return console.error(usage), 2;

  let design: unknown;
  try {
    design = JSON.parse(readFileSync(file, 'utf8'));
  } catch (error) {
    console.error(`Cannot read ${file} as JSON: ${(error as Error).message}`);
    return 1;
  }
  const printer =
    values['printer-x'] && values['printer-y'] ? { measuredXMm: Number(values['printer-x']), measuredYMm: Number(values['printer-y']), ...(values['printer-name'] ? { name: values['printer-name'] } : {}) } : undefined;
  const request = { design, print: { paper: values.paper, orientation: values.orientation }, printer } as RenderRequest;
  const out = values.out ?? file.replace(/\.json$/i, '') + (values.format === 'csv' ? '-holes.csv' : values.format === 'pdf' ? '-kit.pdf' : '');
  try {
    if (values.format === 'pdf') {
      const { bytes, sheets } = await renderKitPdf(request);
      write(out, bytes);
      console.log(`${out}: ${sheets} sheets, ${bytes.length} bytes`);
    } else if (values.format === 'svg') {
      const { sheets } = renderKitSvg(request);
      const stem = out.replace(/\.svg$/i, '');
      sheets.forEach((svg, i) => write(`${stem}-sheet-${i + 1}.svg`, svg));
      console.log(`${stem}-sheet-1..${sheets.length}.svg written`);
    } else {
      write(out, renderHoleCsv(request).csv);
      console.log(`${out} written`);
    }
    return 0;
  } catch (error) {
    if (error instanceof AppError) {
      console.error(error.message);
      const fields = (error.details as { fields?: { path: string; message: string }[] } | undefined)?.fields ?? [];
      for (const field of fields) console.error(`  ${field.path}: ${field.message}`);
      return 1;
    }
    if (error instanceof ZodError) {
      for (const issue of error.issues) console.error(`  ${issue.path.join('.')}: ${issue.message}`);
      return 2;
    }
    throw error;
  }
}

function write(path: string, data: string | Uint8Array): void {
  mkdirSync(dirname(join(process.cwd(), path)), { recursive: true });
  writeFileSync(path, data);
}

process.exitCode = await main();
