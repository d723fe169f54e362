import { afterEach, describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { ApiError, apiRequest, fetchRetryingWhenBusy } from '../../../src/lib/api-client.ts';

const answer = (status: number, body: unknown) => vi.fn(async () => new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } }));

describe('apiRequest', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('returns an answer that has the expected shape', async () => {
    vi.stubGlobal('fetch', answer(200, { id: 'd1', name: 'Pint stove' }));
    expect(await apiRequest('/api/designs/d1', z.object({ id: z.string(), name: z.string() }))).toEqual({ id: 'd1', name: 'Pint stove' });
  });

  it('says an answer of another shape plainly, never in the checker’s words', async () => {
    vi.stubGlobal('fetch', answer(200, { id: 42 }));
    vi.spyOn(console, 'error').mockImplementation(() => {});
    const failure = await apiRequest('/api/designs/d1', z.object({ id: z.string(), name: z.string() })).catch((e: unknown) => e);
    expect(failure).toBeInstanceOf(ApiError);
    expect((failure as ApiError).code).toBe('UNEXPECTED_ANSWER');
    expect((failure as ApiError).message).toBe('The server sent an answer this page does not understand. Reload the page; if it keeps happening, the server may be updating.');
    expect((failure as ApiError).message).not.toMatch(/expected|Invalid input|received/);
  });

  it('passes the server’s own message of an error answer on', async () => {
    vi.stubGlobal('fetch', answer(409, { error: { code: 'NO_CHANGE', message: 'Nothing changed since version 2.' } }));
    await expect(apiRequest('/api/designs/d1/versions', z.object({}), { method: 'POST', body: {} })).rejects.toMatchObject({ status: 409, code: 'NO_CHANGE', message: 'Nothing changed since version 2.' });
  });
});

describe('fetchRetryingWhenBusy', () => {
  afterEach(() => vi.unstubAllGlobals());
  const busy = () => new Response('{}', { status: 503, headers: { 'Retry-After': '2' } });

  it('asks again after the Retry-After a busy server gives (RFC 9110, 10.2.3), and returns the answer that came', async () => {
    const fetch = vi.fn().mockResolvedValueOnce(busy()).mockResolvedValueOnce(new Response('%PDF', { status: 200 }));
    vi.stubGlobal('fetch', fetch);
    const sleep = vi.fn(async () => undefined);
    const response = await fetchRetryingWhenBusy('/api/render/pdf', { method: 'POST' }, { sleep });
    expect(response.status).toBe(200);
    expect(sleep).toHaveBeenCalledWith(2000);
    expect(fetch).toHaveBeenCalledTimes(2);
  });

  it('gives up after its tries, and never waits on an answer that is not "busy"', async () => {
    vi.stubGlobal('fetch', vi.fn(async () => busy()));
    const sleep = vi.fn(async () => undefined);
    expect((await fetchRetryingWhenBusy('/x', {}, { tries: 3, sleep })).status).toBe(503);
    expect(sleep).toHaveBeenCalledTimes(2);
    vi.stubGlobal('fetch', vi.fn(async () => new Response('{}', { status: 503 })));
    const noWait = vi.fn(async () => undefined);
    expect((await fetchRetryingWhenBusy('/x', {}, { sleep: noWait })).status).toBe(503);
    expect(noWait).not.toHaveBeenCalled();
  });
});
