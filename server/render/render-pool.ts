import { availableParallelism } from 'node:os';
import { Piscina } from 'piscina';
import { AppError } from '../http/app-error.ts';
import type { RenderOutcome, RenderResult, RenderTask } from './render-tasks.ts';

export interface RenderPoolOptions {
  /** Worker threads; by default one fewer than the CPUs (at least one), so the server's own thread keeps a core. */
  threads?: number;
  /** Renders that may wait for a thread; one more is answered 503 with Retry-After. */
  maxQueue?: number;
}

export interface RenderPool {
  /** Renders in a worker thread. An aborted signal takes a waiting render off the queue (or stops a running one). */
  run(task: RenderTask, signal?: AbortSignal): Promise<RenderResult>;
  readonly threads: number;
  readonly maxQueue: number;
  /** True while a new render would be refused: every thread busy and the queue full. */
  readonly full: boolean;
  /** Renders the threads have finished (abandoned ones taken off the queue are not among them). */
  readonly completed: number;
  close(): Promise<void>;
}

const workerFile = new URL('./render-worker.mjs', import.meta.url).href;
/** Seconds a client is asked to wait when every thread is busy and the queue is full. */
export const BUSY_RETRY_AFTER_SECONDS = 2;

export const busy = () =>
  new AppError(503, 'BUSY', 'The server is busy printing other kits. Try again in a few seconds.', undefined, { 'Retry-After': String(BUSY_RETRY_AFTER_SECONDS) });

/**
 * Kits are drawn in a pool of worker threads (piscina), so that a burst of renders never holds up
 * the server's own event loop (sign-in, saving, the health check). The queue is bounded: past it,
 * a render is refused at once rather than left to wait without end.
 */
export function createRenderPool(options: RenderPoolOptions = {}): RenderPool {
  const threads = options.threads ?? Math.max(1, availableParallelism() - 1);
  const maxQueue = options.maxQueue ?? threads * 4;
  const pool = new Piscina<RenderTask, RenderOutcome>({
    filename: workerFile,
    minThreads: 1,
    maxThreads: threads,
    maxQueue,
    // An idle thread is let go after a while; one stays ready for the next render.
    idleTimeout: 60_000,
  });
  return {
    threads,
    maxQueue,
    get completed() {
      return pool.completed;
    },
    get full() {
      return pool.queueSize >= maxQueue;
    },
    async run(task, signal) {
      if (signal?.aborted) throw new AppError(499, 'ABANDONED', 'The request was abandoned.');
      if (this.full) throw busy();
      let outcome: RenderOutcome;
      try {
        outcome = await pool.run(task, { signal });
      } catch (error) {
        if ((error as Error).name === 'AbortError') throw new AppError(499, 'ABANDONED', 'The request was abandoned.');
        if (/queue is at limit/i.test((error as Error).message)) throw busy();
        throw error;
      }
      if (!outcome.ok) throw new AppError(outcome.status, outcome.code, outcome.message, outcome.details);
      return outcome.result;
    },
    close: () => pool.destroy(),
  };
}
