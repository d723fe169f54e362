import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { developmentLimits } from '../../server/http/rate-limits.ts';
import { createRenderPool } from '../../server/render/render-pool.ts';
import type * as SvgWriter from '../../server/render/svg/svg-writer.ts';
import { wallOfHoles } from '../../src/features/preview/demo-designs.ts';
import { HttpClient } from '../helpers/http-client.ts';
import { startTestServer, type TestServer } from '../helpers/test-server.ts';

/** The largest kit a design may ask for: 2,000 holes, the cap of the design schema (MAX_HOLES). */
const largestKit = { design: wallOfHoles(10, 200), print: { paper: 'letter' as const } };
const pdfTask = { kind: 'pdf' as const, request: largestKit };

describe('the render pool', () => {
  it('refuses at once with 503 and Retry-After when every thread is busy and the queue is full', async () => {
    const pool = createRenderPool({ threads: 1, maxQueue: 2 });
    try {
      const outcomes = await Promise.allSettled(Array.from({ length: 6 }, () => pool.run(pdfTask)));
      const done = outcomes.filter((o) => o.status === 'fulfilled');
      const refused = outcomes.flatMap((o) => (o.status === 'rejected' ? [o.reason as { status: number; headers?: Record<string, string> }] : []));
      expect(done.length).toBeGreaterThanOrEqual(1);
      expect(done.length).toBeLessThanOrEqual(1 + 2);
      expect(refused.length).toBe(6 - done.length);
      for (const error of refused) {
        expect(error.status).toBe(503);
        expect(Number(error.headers?.['Retry-After'])).toBeGreaterThan(0);
      }
    } finally {
      await pool.close();
    }
  });

  it('takes a render off the queue when its request is abandoned: it is never drawn', async () => {
    const pool = createRenderPool({ threads: 1, maxQueue: 8 });
    try {
      const controllers = [0, 1, 2, 3].map(() => new AbortController());
      const runs = controllers.map((controller) => pool.run(pdfTask, controller.signal));
      controllers[1]!.abort();
      controllers[2]!.abort();
      const outcomes = await Promise.allSettled(runs);
      expect(outcomes.map((o) => o.status)).toEqual(['fulfilled', 'rejected', 'rejected', 'fulfilled']);
      expect(pool.completed).toBe(2);
    } finally {
      await pool.close();
    }
  });
});

describe('a request for a sheet the kit does not have', () => {
  it('is answered 404 from the plan, before anything is drawn', async () => {
    vi.resetModules();
    const drawn = vi.fn();
    vi.doMock('../../server/render/svg/svg-writer.ts', async (original) => {
      const real = await original<typeof SvgWriter>();
      return { ...real, createSvgSheet: (...args: Parameters<typeof real.createSvgSheet>) => (drawn(), real.createSvgSheet(...args)) };
    });
    const { runRenderTask } = await import('../../server/render/render-tasks.ts');
    const missing = await runRenderTask({ kind: 'svg', request: largestKit, sheet: 40 });
    expect(missing).toMatchObject({ ok: false, status: 404, message: expect.stringMatching(/^This kit has \d+ sheets; there is no sheet 40\.$/) });
    expect(drawn).not.toHaveBeenCalled();
    const present = await runRenderTask({ kind: 'svg', request: largestKit, sheet: 1 });
    expect(present.ok).toBe(true);
    expect(drawn).toHaveBeenCalledTimes(1);
    vi.doUnmock('../../server/render/svg/svg-writer.ts');
  });
});

describe('renders over HTTP do not hold up the server', () => {
  let server: TestServer;
  beforeAll(async () => {
    // Renders are rate-limited per address too (their own test: rate-limits); here the pool alone is tried.
    server = await startTestServer({ renderPool: { threads: 1, maxQueue: 3 }, rateLimits: { ...developmentLimits, rendersPerAddress: 1_000_000 } });
  });
  afterAll(() => server.close());

  it('answers every render 200 or 503 (with Retry-After) while 8 clients render the largest kit, and the health check stays quick', async () => {
    const statuses = new Map<number, number>();
    let busy: { retryAfter: string | null; body: unknown } | undefined;
    const until = Date.now() + 3000;
    const client = async () => {
      const http = new HttpClient(server.url);
      while (Date.now() < until) {
        const response = await http.post('/api/render/pdf', largestKit);
        statuses.set(response.status, (statuses.get(response.status) ?? 0) + 1);
        if (response.status === 503) busy ??= { retryAfter: response.headers.get('retry-after'), body: response.body };
      }
    };
    const health: number[] = [];
    const probe = async () => {
      const http = new HttpClient(server.url);
      while (Date.now() < until) {
        const started = performance.now();
        expect((await http.get('/api/health')).status).toBe(200);
        health.push(performance.now() - started);
        await new Promise((resolve) => setTimeout(resolve, 50));
      }
    };
    await Promise.all([...Array.from({ length: 8 }, client), probe()]);
    expect([...statuses.keys()].sort()).toEqual([200, 503]);
    expect(busy).toMatchObject({ retryAfter: '2', body: { error: { code: 'BUSY', message: 'The server is busy printing other kits. Try again in a few seconds.' } } });
    // A coarse guard only (the figure is measured in npm run bench): on the one event loop, the
    // health check waited seconds behind renders like these.
    const sorted = [...health].sort((a, b) => a - b);
    expect(sorted[Math.floor(sorted.length / 2)]).toBeLessThan(500);
  });
});
