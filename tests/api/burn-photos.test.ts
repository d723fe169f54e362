import { readdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, relative } from 'node:path';
import exifr from 'exifr';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import pintCanStove from '../../templates/pint-can-stove.json' with { type: 'json' };
import { startFakeS3 } from '../helpers/fake-s3.ts';
import { createUser, signedInClient } from '../helpers/factories.ts';
import type { HttpClient } from '../helpers/http-client.ts';
import { startTestServer, type TestServer } from '../helpers/test-server.ts';

/**
 * Photos of a burn, on both stores (files under a folder, and S3 through a fake S3 server):
 * the content decides what a file is (never its name), metadata never survives (EXIF, GPS), and a
 * refused upload leaves nothing stored.
 */

/** A camera JPEG: EXIF with the camera's make and model, and GPS (Exif 2.3, tags 0x010F, 0x0110 and the GPS IFD). */
async function cameraJpeg(): Promise<Buffer> {
  return sharp({ create: { width: 640, height: 480, channels: 3, background: '#a0522d' } })
    .jpeg()
    .withExif({
      IFD0: { Make: 'Alder Optics', Model: 'Field Camera 7', Software: 'firmware 1.2' },
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '47/1 36/1 0/1', GPSLongitudeRef: 'W', GPSLongitude: '122/1 19/1 0/1' },
    })
    .toBuffer();
}

const stores = [
  {
    name: 'files in a folder',
    async open() {
      const dir = mkdtempSync(join(tmpdir(), 'canwright-photos-'));
      const list = (at: string): string[] => readdirSync(at, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? list(join(at, e.name)) : [relative(dir, join(at, e.name))]));
      return { target: { kind: 'disk' as const, dir }, keys: async () => list(dir).sort(), close: async () => rmSync(dir, { recursive: true, force: true }) };
    },
  },
  { name: 'S3 (a fake S3 server on loopback)', open: startFakeS3 },
];

describe.each(stores)('burn photos: $name', ({ open }) => {
  let server: TestServer;
  let store: Awaited<ReturnType<typeof open>>;
  let http: HttpClient;
  let burnId: string;

  beforeAll(async () => {
    store = await open();
    server = await startTestServer({ storage: store.target });
    http = await signedInClient(server, await createUser(server));
    const design = await http.post('/api/designs', { document: structuredClone(pintCanStove) });
    burnId = (await http.post(`/api/designs/${design.body.id}/burns`, { date: '2026-11-30T10:00:00Z' })).body.id;
  });
  afterAll(async () => {
    await server.close();
    await store.close();
  });

  it('stores a camera JPEG and serves it and its thumbnail with no metadata at all', async () => {
    const original = await cameraJpeg();
    // The fixture does carry what must be dropped (read back with exifr, a general EXIF reader).
    expect(await exifr.parse(original, { gps: true })).toMatchObject({ Make: 'Alder Optics', Model: 'Field Camera 7' });
    expect((await exifr.gps(original))?.latitude).toBeCloseTo(47.6, 1);

    const uploaded = await http.upload(`/api/burns/${burnId}/photos`, 'photo', original, 'IMG_0042.JPG', 'image/jpeg');
    expect(uploaded.status).toBe(201);
    expect(uploaded.body).toMatchObject({ id: expect.any(String), width: 640, height: 480, contentType: 'image/jpeg' });

    for (const path of [uploaded.body.url, uploaded.body.thumbnailUrl]) {
      const served = await http.bytes(path);
      expect(served.status).toBe(200);
      expect(served.headers.get('content-type')).toBe('image/jpeg');
      expect(served.headers.get('x-content-type-options')).toBe('nosniff');
      expect(served.headers.get('cache-control')).toBe('private, max-age=31536000, immutable');
      expect(await exifr.parse(Buffer.from(served.bytes), { tiff: true, gps: true, xmp: true, icc: true, iptc: true })).toBeUndefined();
      const meta = await sharp(served.bytes).metadata();
      expect(meta.exif).toBeUndefined();
      expect(meta.xmp).toBeUndefined();
    }
    const thumb = await sharp((await http.bytes(uploaded.body.thumbnailUrl)).bytes).metadata();
    expect(Math.max(thumb.width!, thumb.height!)).toBe(320);
    expect((await http.get(`/api/burns/${burnId}`)).body.photos.map((p: { id: string }) => p.id)).toEqual([uploaded.body.id]);
  });

  it('takes a PNG named .jpg as the PNG it is: the content decides, never the name', async () => {
    const png = await sharp({ create: { width: 300, height: 200, channels: 4, background: { r: 20, g: 120, b: 40, alpha: 0.5 } } })
      .png()
      .toBuffer();
    const uploaded = await http.upload(`/api/burns/${burnId}/photos`, 'photo', png, 'stove.jpg', 'image/jpeg');
    expect(uploaded.status).toBe(201);
    // A PNG with transparency is re-encoded as WebP (JPEG has no transparency).
    expect(uploaded.body.contentType).toBe('image/webp');
    expect((await sharp((await http.bytes(uploaded.body.url)).bytes).metadata()).format).toBe('webp');
  });

  it('refuses an HTML file named .jpg, a 16 MB file and a 60-megapixel picture, and stores nothing', async () => {
    const before = await store.keys();
    const html = Buffer.from('<!doctype html><html><script>alert(1)</script></html>');
    const fake = await http.upload(`/api/burns/${burnId}/photos`, 'photo', html, 'holiday.jpg', 'image/jpeg');
    expect(fake.status).toBe(415);
    expect(fake.body.error.message).toBe('This file is not a photo Canwright can take: send a JPEG, PNG or WebP picture.');

    const huge = Buffer.concat([await cameraJpeg(), Buffer.alloc(16 * 1024 * 1024)]);
    const big = await http.upload(`/api/burns/${burnId}/photos`, 'photo', huge, 'big.jpg', 'image/jpeg');
    expect(big.status).toBe(413);
    expect(big.body.error.message).toBe('This file is larger than 15 MB. Save a smaller copy of the picture and send that.');

    // 8,000 x 7,500 pixels of one colour: a small file that would decode to 180 MB.
    const bomb = await sharp({ create: { width: 8000, height: 7500, channels: 3, background: '#ffffff' }, limitInputPixels: false })
      .png({ compressionLevel: 9 })
      .toBuffer();
    expect(bomb.length).toBeLessThan(2 * 1024 * 1024);
    const pixels = await http.upload(`/api/burns/${burnId}/photos`, 'photo', bomb, 'panorama.png', 'image/png');
    expect(pixels.status).toBe(413);
    expect(pixels.body.error.message).toBe('This picture is too large: at most 50 megapixels. Save a smaller copy and send that.');

    const wrongField = await http.upload(`/api/burns/${burnId}/photos`, 'picture', await cameraJpeg(), 'a.jpg', 'image/jpeg');
    expect(wrongField.status).toBe(400);
    expect(wrongField.body.error.message).toBe('Send one picture, in the form field named "photo".');

    expect(await store.keys()).toEqual(before);
  });

  it('is served to its owner only, and deleting the photo, the entry or the design deletes its files', async () => {
    const photo = (await http.upload(`/api/burns/${burnId}/photos`, 'photo', await cameraJpeg(), 'a.jpg', 'image/jpeg')).body;
    const other = await signedInClient(server, await createUser(server));
    for (const path of [photo.url, photo.thumbnailUrl]) expect((await other.bytes(path)).status).toBe(404);
    expect((await other.request('DELETE', photo.url)).status).toBe(404);
    expect((await other.upload(`/api/burns/${burnId}/photos`, 'photo', await cameraJpeg(), 'a.jpg', 'image/jpeg')).status).toBe(404);

    const keysWith = await store.keys();
    expect((await http.request('DELETE', photo.url)).status).toBe(204);
    expect((await store.keys()).length).toBe(keysWith.length - 2);

    // A new design with an entry and a photo: deleting the design takes the files too.
    const design = await http.post('/api/designs', { document: structuredClone(pintCanStove) });
    const entry = (await http.post(`/api/designs/${design.body.id}/burns`, { date: '2026-12-01T10:00:00Z' })).body.id;
    const before = await store.keys();
    expect((await http.upload(`/api/burns/${entry}/photos`, 'photo', await cameraJpeg(), 'b.jpg', 'image/jpeg')).status).toBe(201);
    expect((await store.keys()).length).toBe(before.length + 2);
    expect((await http.request('DELETE', `/api/designs/${design.body.id}`)).status).toBe(204);
    expect(await store.keys()).toEqual(before);

    // And deleting the entry takes its photos' files.
    const all = await http.get(`/api/burns/${burnId}`);
    expect(all.body.photos.length).toBeGreaterThan(0);
    expect((await http.request('DELETE', `/api/burns/${burnId}`)).status).toBe(204);
    for (const p of all.body.photos) expect((await http.bytes(p.url)).status).toBe(404);
    expect((await store.keys()).filter((key) => all.body.photos.some((p: { id: string }) => key.includes(p.id)))).toEqual([]);
  });
});

describe('photos on one entry', () => {
  it('stop at 12, with a clear message, and the thirteenth leaves nothing stored', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'canwright-photos-'));
    const server = await startTestServer({ storage: { kind: 'disk', dir } });
    try {
      const http = await signedInClient(server, await createUser(server));
      const design = await http.post('/api/designs', { document: structuredClone(pintCanStove) });
      const burnId = (await http.post(`/api/designs/${design.body.id}/burns`, { date: '2026-11-30T10:00:00Z' })).body.id;
      const small = await sharp({ create: { width: 40, height: 30, channels: 3, background: '#333' } }).jpeg().toBuffer();
      const statuses = [];
      for (let i = 0; i < 12; i++) statuses.push((await http.upload(`/api/burns/${burnId}/photos`, 'photo', small, `${i}.jpg`)).status);
      expect(statuses.every((s) => s === 201)).toBe(true);
      const files = readdirSync(dir, { recursive: true }).filter((name) => String(name).endsWith('.jpg')).length;
      const thirteenth = await http.upload(`/api/burns/${burnId}/photos`, 'photo', small, '13.jpg');
      expect(thirteenth.status).toBe(409);
      expect(thirteenth.body.error.message).toBe('An entry holds at most 12 photos. Delete one to add another.');
      expect(readdirSync(dir, { recursive: true }).filter((name) => String(name).endsWith('.jpg')).length).toBe(files);
    } finally {
      await server.close();
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
