import { readFileSync } from 'node:fs';
import { renderKitPdf } from '../server/render/render-kit.ts';
import { report, type Stats } from './measure.ts';

/** PDF of the demo kit (the pint-can stove on Letter): time per render (median) and file size. Targets: <= 15 ms, <= 60 kB. */
export async function benchPdf(): Promise<void> {
  const design = JSON.parse(readFileSync(new URL('../templates/pint-can-stove.json', import.meta.url), 'utf8'));
  const request = { design, print: { paper: 'letter' as const, orientation: 'portrait' as const } };
  const first = await renderKitPdf(request);
  for (let i = 0; i < 20; i++) await renderKitPdf(request);
  const times: number[] = [];
  for (let i = 0; i < 100; i++) {
    const start = performance.now();
    await renderKitPdf(request);
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  const stats: Stats = { medianMs: times[50]!, p95Ms: times[95]!, minMs: times[0]!, runs: times.length };
  report(`PDF of the demo kit (${first.sheets} Letter sheets)`, stats, { targetMs: 15 });
  const kB = first.bytes.length / 1000;
  console.log(`PDF size of the demo kit: ${kB.toFixed(1)} kB  (target <= 60 kB: ${kB <= 60 ? 'met' : 'NOT met'})`);
}
