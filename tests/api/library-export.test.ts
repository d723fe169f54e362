import { eq } from 'drizzle-orm';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { burnPhotos, burns, designs, printerProfiles, users } from '../../server/db/schema.ts';
import pintCanStove from '../../templates/pint-can-stove.json' with { type: 'json' };
import metricTinStove from '../../templates/metric-tin-stove.json' with { type: 'json' };
import { createUser, signedInClient } from '../helpers/factories.ts';
import { HttpClient } from '../helpers/http-client.ts';
import { photoStores, type OpenStore } from '../helpers/photo-stores.ts';
import { startTestServer, type TestServer } from '../helpers/test-server.ts';
import { declareSize, renameEntry, unzip, zipOf, zipOfEmptyEntries } from '../helpers/zip-files.ts';

/**
 * The whole library as one ZIP: out, into another account, and out again with the same content;
 * and the archives an import must refuse (unsafe names, too many entries, zip bombs, a foreign or
 * newer manifest, a tampered photo), each leaving the account exactly as it was.
 */

const jpeg = (width: number, height: number, colour: string) => sharp({ create: { width, height, channels: 3, background: colour } }).jpeg().toBuffer();
const translucentPng = () => sharp({ create: { width: 300, height: 200, channels: 4, background: { r: 20, g: 120, b: 40, alpha: 0.5 } } }).png().toBuffer();

/** A maker's library with something of every kind: two designs (one with two versions, tagged, printed), burns on both versions with photos, two printer profiles and preferences of their own. */
async function fillLibrary(http: HttpClient): Promise<void> {
  const first = await http.post('/api/designs', { document: structuredClone(pintCanStove), tags: ['pint', 'class'] });
  expect(first.status).toBe(201);
  expect((await http.post(`/api/designs/${first.body.id}/versions`, { document: { ...structuredClone(pintCanStove), notes: 'Jets opened up' }, note: 'wider jets' })).status).toBe(201);
  expect((await http.post(`/api/designs/${first.body.id}/printed`, {})).status).toBeLessThan(300);
  const second = await http.post('/api/designs', { document: structuredClone(metricTinStove), name: 'Tin stove' });
  expect(second.status).toBe(201);
  const early = await http.post(`/api/designs/${first.body.id}/burns`, { date: '2026-11-28T09:30:00Z', version: 1, fuelKind: 'pine twigs', fuelMassG: 85, wind: 'light', windscreen: false, timeToJetsS: 210, flameRing: 2, smoke: 'some', notes: 'Smoky start.\nRing broke in gusts.' });
  const late = await http.post(`/api/designs/${first.body.id}/burns`, { date: '2026-11-30T10:00:00Z', fuelMassG: 90, timeToJetsS: 140, timeToBoilS: 480, boilWaterL: 0.5, boilStartC: 12, burnTimeS: 1260, charG: 9, flameRing: 4 });
  const tin = await http.post(`/api/designs/${second.body.id}/burns`, { date: '2026-12-01T16:00:00Z', ambientC: -2, notes: 'cold evening' });
  for (const burn of [early, late, tin]) expect(burn.status).toBe(201);
  for (const [burn, bytes] of [
    [early, await jpeg(640, 480, '#a0522d')],
    [early, await translucentPng()],
    [late, await jpeg(400, 300, '#334455')],
  ] as const) {
    expect((await http.upload(`/api/burns/${burn.body.id}/photos`, 'photo', bytes, 'stove.jpg', 'image/jpeg')).status).toBe(201);
  }
  expect((await http.post('/api/printer-profiles', { name: 'Office laser', measuredXMm: 149.4, measuredYMm: 200.6 })).status).toBe(201);
  expect((await http.post('/api/printer-profiles', { name: 'Inkjet', measuredXMm: 150.5, measuredYMm: 199.8 })).status).toBe(201);
  expect((await http.patch('/api/account/preferences', { units: 'mm', defaultPaper: 'a4', drillSetIds: ['frac:1/4', 'frac:3/16'], massUnit: 'oz', temperatureUnit: 'F', volumeUnit: 'qt' })).status).toBe(200);
}

/** The archive's JSON files (manifest's export time aside) and its photos. */
async function contentOf(zip: Uint8Array) {
  const files = await unzip(zip);
  const json = (name: string) => JSON.parse(files.get(name)!.toString('utf8'));
  const { exportedAt, ...manifest } = json('manifest.json');
  expect(Date.parse(exportedAt)).not.toBeNaN();
  const photos = Object.fromEntries([...files].filter(([name]) => name.startsWith('photos/')).map(([name, bytes]) => [name, bytes.toString('base64')]));
  return { names: [...files.keys()].sort(), manifest, designs: json('designs.json'), burns: json('burns.json'), profiles: json('printer-profiles.json'), preferences: json('preferences.json'), photos };
}

describe.each(photoStores)('library export and import: $name', ({ open }) => {
  let server: TestServer;
  let store: OpenStore;
  let maker: HttpClient;
  let exported: Uint8Array;

  /** What an account holds, in the database and in the store: a refused import must leave all of it as it was. */
  async function holdings(userId: string) {
    const db = server.database.db;
    const [user] = await db.select().from(users).where(eq(users.id, userId));
    return {
      designs: await db.select().from(designs).where(eq(designs.ownerId, userId)),
      burns: (await db.select().from(burns).where(eq(burns.ownerId, userId))).length,
      photos: (await db.select().from(burnPhotos).where(eq(burnPhotos.ownerId, userId))).length,
      profiles: await db.select().from(printerProfiles).where(eq(printerProfiles.userId, userId)),
      preferences: [user?.units, user?.defaultPaper, user?.drillSetIds, user?.massUnit, user?.temperatureUnit, user?.volumeUnit],
      files: await store.keys(),
    };
  }

  beforeAll(async () => {
    store = await open();
    server = await startTestServer({ storage: store.target });
    maker = await signedInClient(server, await createUser(server));
    await fillLibrary(maker);
    const answer = await maker.bytes('/api/library/export');
    expect(answer.status).toBe(200);
    exported = answer.bytes;
  });
  afterAll(async () => {
    await server.close();
    await store.close();
  });

  it('exports one ZIP with a manifest, the designs with every version, burns, photos, printer profiles and preferences', async () => {
    const answer = await maker.bytes('/api/library/export');
    expect(answer.headers.get('content-type')).toBe('application/zip');
    expect(answer.headers.get('content-disposition')).toBe(`attachment; filename="canwright-library-${new Date().toISOString().slice(0, 10)}.zip"`);
    // A ZIP starts with a local file header, "PK\3\4" (PKWARE APPNOTE.TXT 4.3.7).
    expect(Buffer.from(answer.bytes.subarray(0, 4)).toString('latin1')).toBe('PK\u0003\u0004');
    const content = await contentOf(answer.bytes);
    expect(content.manifest).toEqual({ format: 'canwright-library', schemaVersion: 1, writtenBy: expect.stringMatching(/^Canwright /), counts: { designs: 2, versions: 3, burns: 3, photos: 3, printerProfiles: 2 } });
    expect(content.designs.designs.map((d: any) => [d.key, d.name, d.tags, d.versions.length, d.lastPrintedAt !== null])).toEqual([
      ['d1', pintCanStove.name, ['pint', 'class'], 2, true],
      ['d2', 'Tin stove', [], 1, false],
    ]);
    expect(content.designs.designs[0].versions[1]).toMatchObject({ number: 2, note: 'wider jets', document: { notes: 'Jets opened up' } });
    expect(content.burns.burns.map((b: any) => [b.design, b.version, b.photos.length])).toEqual([
      ['d1', 1, 2],
      ['d1', 2, 1],
      ['d2', 1, 0],
    ]);
    expect(content.burns.burns[0]).toMatchObject({ fuelKind: 'pine twigs', fuelMassG: 85, wind: 'light', windscreen: false, notes: 'Smoky start.\nRing broke in gusts.', starter: null });
    expect(content.burns.burns[0].photos.map((p: any) => p.contentType)).toEqual(['image/jpeg', 'image/webp']);
    expect(content.names).toEqual(['burns.json', 'designs.json', 'manifest.json', 'photos/1-1-thumb.jpg', 'photos/1-1.jpg', 'photos/1-2-thumb.webp', 'photos/1-2.webp', 'photos/2-1-thumb.jpg', 'photos/2-1.jpg', 'preferences.json', 'printer-profiles.json']);
    expect(content.profiles.profiles.map((p: any) => [p.name, p.isDefault])).toEqual([
      ['Office laser', true],
      ['Inkjet', false],
    ]);
    expect(content.preferences.preferences).toEqual({ units: 'mm', defaultPaper: 'a4', drillSetIds: ['frac:1/4', 'frac:3/16'], massUnit: 'oz', temperatureUnit: 'F', volumeUnit: 'qt' });
    // The photos in the archive are the very bytes the app serves.
    const burn = (await maker.get('/api/designs')).body.designs.find((d: any) => d.name === pintCanStove.name);
    const [newest, oldest] = (await maker.get(`/api/designs/${burn.id}/burns`)).body.burns;
    expect(newest.version).toBe(2);
    const served = await maker.bytes(oldest.photos[0].url);
    expect(Buffer.from(served.bytes).equals((await unzip(answer.bytes)).get('photos/1-1.jpg')!)).toBe(true);
  });

  it('imports into a fresh account, and that account exports the same content with byte-identical photos', async () => {
    const fresh = await createUser(server);
    const http = await signedInClient(server, fresh);
    const before = await store.keys();
    const imported = await http.upload('/api/library/import', 'archive', exported, 'library.zip', 'application/zip', { preferences: 'take' });
    expect(imported.status).toBe(201);
    expect(imported.body).toEqual({ designs: 2, versions: 3, burns: 3, photos: 3, printerProfiles: 2, preferences: 'taken' });
    expect((await store.keys()).length).toBe(before.length + 6);

    const again = await http.bytes('/api/library/export');
    expect(await contentOf(again.bytes)).toEqual(await contentOf(exported));
    // New ids: nothing of the first maker's is shared or moved.
    const mine = (await http.get('/api/designs')).body.designs.map((d: any) => d.id);
    const theirs = (await maker.get('/api/designs')).body.designs.map((d: any) => d.id);
    expect(mine.filter((id: string) => theirs.includes(id))).toEqual([]);
    // Through the API as well: the burns keep their versions, and the photos are served.
    const pint = (await http.get('/api/designs')).body.designs.find((d: any) => d.name === pintCanStove.name);
    expect(pint).toMatchObject({ currentVersion: 2, tags: ['pint', 'class'], shared: false });
    const list = (await http.get(`/api/designs/${pint.id}/burns`)).body.burns;
    expect(list.map((b: any) => b.version)).toEqual([2, 1]);
    const photo = await http.bytes(list[1].photos[1].thumbnailUrl);
    expect(photo.status).toBe(200);
    expect(photo.headers.get('content-type')).toBe('image/webp');
    expect((await http.get(`/api/designs/${pint.id}/versions`)).body.versions[0].summary.holes).toBeGreaterThan(0);
    expect((await http.get('/api/account')).body).toMatchObject({ units: 'mm', massUnit: 'oz' });
  });

  it('adds to a library that has things of its own, keeps its preferences unless asked, and keeps one default printer', async () => {
    const other = await createUser(server);
    const http = await signedInClient(server, other);
    const own = await http.post('/api/designs', { document: structuredClone(pintCanStove) });
    await http.post('/api/printer-profiles', { name: 'My printer', measuredXMm: 150, measuredYMm: 200 });
    const imported = await http.upload('/api/library/import', 'archive', exported, 'library.zip', 'application/zip');
    expect(imported.status).toBe(201);
    expect(imported.body.preferences).toBe('kept');
    const names = (await http.get('/api/designs?sort=name')).body.designs.map((d: any) => d.name);
    // Names need not be unique in a library, so both stoves keep their own name.
    expect(names.sort()).toEqual([pintCanStove.name, pintCanStove.name, 'Tin stove'].sort());
    expect((await http.get(`/api/designs/${own.body.id}`)).status).toBe(200);
    const profiles = (await http.get('/api/printer-profiles')).body.profiles;
    expect(profiles.filter((p: any) => p.isDefault).map((p: any) => p.name)).toEqual(['My printer']);
    expect(profiles).toHaveLength(3);
    expect((await http.get('/api/account')).body).toMatchObject({ units: 'in', defaultPaper: 'letter', drillSetIds: [] });
  });

  describe('refuses, with a plain message and nothing written,', () => {
    let http: HttpClient;
    let userId: string;
    beforeAll(async () => {
      const user = await createUser(server);
      userId = user.id;
      http = await signedInClient(server, user);
      await http.post('/api/designs', { document: structuredClone(pintCanStove), name: 'Already here' });
    });

    async function refused(zip: Buffer, status: number, message: RegExp) {
      const before = await holdings(userId);
      const answer = await http.upload('/api/library/import', 'archive', zip, 'library.zip', 'application/zip', { preferences: 'take' });
      expect(answer.status, JSON.stringify(answer.body)).toBe(status);
      expect(answer.body.error.message).toMatch(message);
      expect(answer.body.error.message).toMatch(/nothing was imported|Choose the \.zip file/i);
      expect(await holdings(userId)).toEqual(before);
      return answer;
    }

    /** The exported archive with one more entry, for names the writer itself would not write. */
    const withExtra = async (name: string) => {
      const files = await unzip(exported);
      return zipOf([...[...files].map(([n, bytes]) => ({ name: n, bytes })), { name, bytes: Buffer.from('owned') }]);
    };

    it('a ZIP whose names climb out of the archive (../, an absolute path, a backslash)', async () => {
      await refused(renameEntry(await withExtra('xx/evil.txt'), 'xx/evil.txt', '../evil.txt'), 400, /"\.\.\/evil\.txt", a name that points outside the archive/);
      await refused(renameEntry(await withExtra('etc/passwdx'), 'etc/passwdx', '/etc/passwd'), 400, /points outside the archive/);
      await refused(renameEntry(await withExtra('photos/x.txt'), 'photos/x.txt', 'photos\\x.txt'), 400, /points outside the archive/);
      await refused(await withExtra('notes/readme.txt'), 400, /"notes\/readme\.txt", a file Canwright does not write/);
    });

    it('a ZIP of 100,000 entries, from its central directory before reading any', async () => {
      const zip = zipOfEmptyEntries(100_000);
      // A well-formed archive, as a reader other than the app's sees it.
      expect((await unzip(zip)).size).toBe(100_000);
      const answer = await refused(zip, 413, /holds 100,000 files, more than the 10,000/);
      expect(answer.body.error.code).toBe('ARCHIVE_TOO_MANY_FILES');
    });

    it('zip bombs: a huge declared size, and a small declared size with huge real bytes', async () => {
      // Declared: designs.json says it unpacks to 4 GB (the archive itself is a few kB).
      await refused(declareSize(Buffer.from(exported), 'designs.json', 0xfffffff0), 413, /unpacks to more than 1024 MB/);
      // Real: 200 MB of spaces deflate to about 200 kB, and the directory says 1,000 bytes.
      const files = await unzip(exported);
      const bomb = await zipOf([
        { name: 'manifest.json', bytes: files.get('manifest.json')! },
        { name: 'designs.json', bytes: Buffer.alloc(200 * 1024 * 1024, 0x20) },
      ]);
      expect(bomb.length).toBeLessThan(1024 * 1024);
      await refused(declareSize(bomb, 'designs.json', 1000), 413, /"designs\.json" in this archive unpacks to more than it says/);
    });

    it('a foreign manifest, no manifest, a newer schema version, and a file that is not a ZIP', async () => {
      const files = await unzip(exported);
      const rest = [...files].filter(([name]) => name !== 'manifest.json').map(([name, bytes]) => ({ name, bytes }));
      const manifest = (value: unknown) => ({ name: 'manifest.json', bytes: Buffer.from(JSON.stringify(value)) });
      const own = JSON.parse(files.get('manifest.json')!.toString());
      await refused(await zipOf([manifest({ ...own, format: 'some-other-stove-app' }), ...rest]), 400, /is not a Canwright library: its manifest\.json is not that of a Canwright library/);
      await refused(await zipOf(rest), 400, /it has no manifest\.json/);
      await refused(await zipOf([manifest({ ...own, schemaVersion: 2 }), ...rest]), 400, /newer Canwright \(archive version 2\)/);
      await refused(Buffer.from('<html>not a zip</html>'), 400, /This file is not a ZIP archive/);
    });

    it('an archive whose content breaks the rules: a bad design, a count that does not add up, a photo carrying GPS', async () => {
      const files = await unzip(exported);
      const swap = (name: string, bytes: Buffer) => zipOf([...files].map(([n, b]) => ({ name: n, bytes: n === name ? bytes : b })));
      const designsJson = JSON.parse(files.get('designs.json')!.toString());
      designsJson.designs[1].versions[0].document.parts = [];
      const bad = await refused(await swap('designs.json', Buffer.from(JSON.stringify(designsJson))), 422, /designs\.json does not hold what Canwright writes there \(designs\.json designs\.1\.versions\.0\.document\.parts: /);
      expect(bad.body.error.details.fields[0].path).toBe('designs.json designs.1.versions.0.document.parts');

      const manifest = JSON.parse(files.get('manifest.json')!.toString());
      await refused(await swap('manifest.json', Buffer.from(JSON.stringify({ ...manifest, counts: { ...manifest.counts, burns: 4 } }))), 422, /counts 4 burn entries but the archive holds 3/);

      // The last photo (stored after the others) carries camera EXIF and GPS: the ones stored before it are deleted again.
      const tagged = await sharp({ create: { width: 400, height: 300, channels: 3, background: '#334455' } })
        .jpeg()
        .withExif({ IFD0: { Make: 'Alder Optics' }, IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '47/1 36/1 0/1' } })
        .toBuffer();
      await refused(await swap('photos/2-1.jpg', tagged), 422, /The photo "photos\/2-1\.jpg" in this archive carries metadata/);
      // And an HTML file where a photo should be.
      await refused(await swap('photos/1-1.jpg', Buffer.from('<!doctype html><script>alert(1)</script>')), 422, /is not the JPEG picture burns\.json says it is/);
    });

    it('an upload without the archive, or in another field', async () => {
      const before = await holdings(userId);
      const wrongField = await http.upload('/api/library/import', 'file', exported, 'library.zip', 'application/zip');
      expect(wrongField.status).toBe(400);
      expect(wrongField.body.error.message).toBe('Send one .zip file, in the form field named "archive".');
      const noFile = await http.request('POST', '/api/library/import', {});
      expect(noFile.status).toBe(400);
      expect(noFile.body.error.message).toBe('Send the library as a .zip file in the form field named "archive".');
      const badOption = await http.upload('/api/library/import', 'archive', exported, 'library.zip', 'application/zip', { preferences: 'overwrite' });
      expect(badOption.status).toBe(400);
      expect(badOption.body.error.details.fields[0]).toEqual({ path: 'preferences', message: 'must be one of: take or keep' });
      expect(await holdings(userId)).toEqual(before);
    });
  });

  it("exports only the caller's own library, and asks a visitor to sign in", async () => {
    const stranger = await signedInClient(server, await createUser(server));
    const theirs = await contentOf((await stranger.bytes('/api/library/export')).bytes);
    expect(theirs.manifest.counts).toEqual({ designs: 0, versions: 0, burns: 0, photos: 0, printerProfiles: 0 });
    expect(theirs.photos).toEqual({});
    const visitor = new HttpClient(server.url);
    expect((await visitor.bytes('/api/library/export')).status).toBe(401);
    expect((await visitor.upload('/api/library/import', 'archive', exported, 'library.zip')).status).toBe(401);
  });
});
