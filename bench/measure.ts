/** A tiny timing harness: warm up, run many times, report the median and spread. */
export interface Stats {
  medianMs: number;
  p95Ms: number;
  minMs: number;
  runs: number;
}

export function measure(run: () => unknown, { warmup = 50, runs = 500 } = {}): Stats {
  for (let i = 0; i < warmup; i++) run();
  const times: number[] = [];
  for (let i = 0; i < runs; i++) {
    const start = performance.now();
    run();
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  return { medianMs: times[Math.floor(runs / 2)]!, p95Ms: times[Math.floor(runs * 0.95)]!, minMs: times[0]!, runs };
}

export function report(name: string, stats: Stats, { targetMs }: { targetMs?: number } = {}): void {
  const verdict = targetMs === undefined ? '' : stats.medianMs <= targetMs ? `  (target <= ${targetMs} ms: met)` : `  (target <= ${targetMs} ms: NOT met)`;
  console.log(`${name}: median ${stats.medianMs.toFixed(3)} ms, p95 ${stats.p95Ms.toFixed(3)} ms, min ${stats.minMs.toFixed(3)} ms over ${stats.runs} runs${verdict}`);
}
