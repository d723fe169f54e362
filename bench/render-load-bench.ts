import { spawn } from 'node:child_process';
import { createInterface } from 'node:readline';
import { fileURLToPath } from 'node:url';
import { wallOfHoles } from '../src/features/preview/demo-designs.ts';

const CLIENTS = 16;
const SECONDS = 20;
/** The largest kit a design may ask for: 2,000 holes, the design schema's cap. */
const body = JSON.stringify({ design: wallOfHoles(10, 200), print: { paper: 'letter' } });

/**
 * 16 clients render the largest kit in a loop for 20 s while one client asks /api/health every
 * 20 ms. Each client sends its next render as soon as the last is answered; after a 503 it waits
 * the Retry-After the server gave, as Canwright's own print screen does. Goals: the health check's
 * p99 under 100 ms, and every render answered 200 or 503, never a reset connection.
 */
export async function benchRenderLoad(): Promise<void> {
  const child = spawn(process.execPath, ['--import', 'tsx', fileURLToPath(new URL('./render-load-server.ts', import.meta.url))], { stdio: ['ignore', 'pipe', 'inherit'] });
  try {
    const url = await new Promise<string>((resolve, reject) => {
      child.once('exit', (code) => reject(new Error(`the bench server exited (${code})`)));
      createInterface({ input: child.stdout! }).on('line', (line) => line.startsWith('LISTENING ') && resolve(line.slice(10)));
    });
    const until = Date.now() + SECONDS * 1000;
    const statuses = new Map<string, number>();
    const count = (key: string) => statuses.set(key, (statuses.get(key) ?? 0) + 1);
    const renderLoop = async () => {
      while (Date.now() < until) {
        try {
          const response = await fetch(`${url}/api/render/pdf`, { method: 'POST', headers: { 'Content-Type': 'application/json', Origin: url }, body });
          await response.arrayBuffer();
          count(String(response.status));
          const wait = Number(response.headers.get('retry-after'));
          if (response.status === 503 && wait > 0) await new Promise((resolve) => setTimeout(resolve, Math.min(wait * 1000, until - Date.now())));
        } catch (error) {
          count(`failed (${(error as Error).cause ? String((error as { cause: { code?: string } }).cause.code) : (error as Error).message})`);
        }
      }
    };
    const health: number[] = [];
    const healthLoop = async () => {
      while (Date.now() < until) {
        const started = performance.now();
        const response = await fetch(`${url}/api/health`);
        await response.arrayBuffer();
        health.push(performance.now() - started);
        await new Promise((resolve) => setTimeout(resolve, 20));
      }
    };
    await Promise.all([...Array.from({ length: CLIENTS }, renderLoop), healthLoop()]);
    health.sort((a, b) => a - b);
    const at = (q: number) => health[Math.min(health.length - 1, Math.floor(health.length * q))]!;
    const p99 = at(0.99);
    const answered = [...statuses].map(([status, n]) => `${status}: ${n}`).join(', ');
    const onlyAnswers = [...statuses.keys()].every((status) => status === '200' || status === '503');
    console.log(
      `/api/health while ${CLIENTS} clients render the largest kit for ${SECONDS} s: median ${at(0.5).toFixed(1)} ms, p99 ${p99.toFixed(1)} ms over ${health.length} checks  (goal p99 < 100 ms: ${p99 < 100 ? 'met' : 'NOT met'})`,
    );
    console.log(`renders answered (a client waits Retry-After after a 503): ${answered}  (goal: every one 200 or 503: ${onlyAnswers ? 'met' : 'NOT met'}); ${((statuses.get('200') ?? 0) / SECONDS).toFixed(1)} kits/s`);
  } finally {
    child.kill('SIGTERM');
  }
}
