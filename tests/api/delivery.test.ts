import { mkdtempSync, mkdirSync, writeFileSync } from 'node:fs';
import { request as httpRequest } from 'node:http';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { brotliCompressSync, brotliDecompressSync, gunzipSync, gzipSync } from 'node:zlib';
import express from 'express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { serveClient } from '../../server/http/client-files.ts';
import { compressResponses } from '../../server/http/compress-responses.ts';

/** A raw GET (fetch would undo the Content-Encoding): status, headers and the bytes as sent. */
function get(port: number, path: string, acceptEncoding: string): Promise<{ status: number; headers: Record<string, string | string[] | undefined>; body: Buffer }> {
  return new Promise((resolve, reject) => {
    const req = httpRequest({ port, path, headers: { 'Accept-Encoding': acceptEncoding } }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, headers: res.headers, body: Buffer.concat(chunks) }));
    });
    req.on('error', reject);
    req.end();
  });
}

const script = 'export const words = "' + 'wrap strip and bottom disc, '.repeat(200) + '";\n';
const json = { holes: Array.from({ length: 200 }, (_, i) => ({ number: i + 1, xMm: i * 4.2 })) };
let server: ReturnType<express.Express['listen']>;
let port: number;

beforeAll(async () => {
  const dir = mkdtempSync(join(tmpdir(), 'canwright-delivery-'));
  mkdirSync(join(dir, 'assets'));
  writeFileSync(join(dir, 'index.html'), '<!doctype html><title>Canwright</title>');
  // What the build writes (vite-plugin-compression2): each asset and its .br and .gz beside it.
  writeFileSync(join(dir, 'assets', 'entry-abc123.js'), script);
  writeFileSync(join(dir, 'assets', 'entry-abc123.js.br'), brotliCompressSync(script));
  writeFileSync(join(dir, 'assets', 'entry-abc123.js.gz'), gzipSync(script));
  const app = express();
  app.use(compressResponses());
  app.get('/api/holes', (_req, res) => res.json(json));
  app.get('/api/kit.pdf', (_req, res) => res.type('application/pdf').send(Buffer.alloc(4096, 32)));
  serveClient(app, dir);
  await new Promise<void>((resolve) => (server = app.listen(0, '127.0.0.1', () => resolve())));
  port = (server.address() as AddressInfo).port;
});
afterAll(() => new Promise<void>((resolve) => server.close(() => resolve())));

describe('delivery: precompressed assets, compressed JSON, PDFs as they are', () => {
  it('sends the brotli file the build wrote, with a year-long immutable cache (RFC 9111; RFC 8246)', async () => {
    const res = await get(port, '/assets/entry-abc123.js', 'gzip, deflate, br');
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers['content-type']).toMatch(/javascript/);
    expect(res.headers['vary']).toMatch(/Accept-Encoding/i);
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(brotliDecompressSync(res.body).toString()).toBe(script);
    expect(res.body.length).toBeLessThan(script.length / 10);
  });

  it('falls back to gzip, then to the plain file, as the browser allows', async () => {
    const gz = await get(port, '/assets/entry-abc123.js', 'gzip');
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(gunzipSync(gz.body).toString()).toBe(script);
    const plain = await get(port, '/assets/entry-abc123.js', 'identity');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.body.toString()).toBe(script);
  });

  it('compresses JSON on the fly, leaves PDFs alone, and never caches index.html', async () => {
    const api = await get(port, '/api/holes', 'br');
    expect(api.headers['content-encoding']).toBe('br');
    expect(JSON.parse(brotliDecompressSync(api.body).toString())).toEqual(json);
    const pdf = await get(port, '/api/kit.pdf', 'gzip, br');
    expect(pdf.headers['content-encoding']).toBeUndefined();
    expect(pdf.body.length).toBe(4096);
    const page = await get(port, '/library', 'identity');
    expect(page.headers['cache-control']).toBe('no-cache');
  });
});
