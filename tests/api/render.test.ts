import { readFileSync } from 'node:fs';
import { PDFDocument, PDFName } from 'pdf-lib';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { HttpClient } from '../helpers/http-client.ts';
import { startTestServer, type TestServer } from '../helpers/test-server.ts';

const pint = JSON.parse(readFileSync(new URL('../../templates/pint-can-stove.json', import.meta.url), 'utf8'));
const PT_PER_MM = 72 / 25.4;

let server: TestServer;
let http: HttpClient;
beforeAll(async () => {
  server = await startTestServer();
  http = new HttpClient(server.url);
});
afterAll(() => server.close());

async function post(path: string, body: unknown) {
  return fetch(new URL(path, server.url), { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify(body) });
}

describe('POST /api/render/pdf', () => {
  it('names the design and the printer profile in the file name, other scripts sent as RFC 6266 filename*', async () => {
    const design = { ...pint, name: 'Śliwka Ζήτα Жаровня' };
    const response = await post('/api/render/pdf', { design, print: { paper: 'letter' }, printer: { name: 'Hall laser', measuredXMm: 152.25, measuredYMm: 198.6 } });
    expect(response.status).toBe(200);
    const header = response.headers.get('content-disposition') ?? '';
    // RFC 6266 section 4.3: an ASCII filename for old clients, the UTF-8 name in filename* (RFC 8187 percent-encoding).
    expect(header).toMatch(/^attachment; filename="[^"]*-kit-for-hall-laser\.pdf"; filename\*=UTF-8''/);
    expect(decodeURIComponent(/filename\*=UTF-8''(.+)$/.exec(header)![1]!)).toBe('sliwka-ζητα-жаровня-kit-for-hall-laser.pdf');
  });

  it('returns a PDF whose pages are exactly A4 (ISO 216: 210 x 297 mm) with print scaling off, without sign-in', async () => {
    const response = await post('/api/render/pdf', { design: pint, print: { paper: 'a4' } });
    expect(response.status).toBe(200);
    expect(response.headers.get('content-type')).toBe('application/pdf');
    const bytes = new Uint8Array(await response.arrayBuffer());
    expect(new TextDecoder().decode(bytes.slice(0, 5))).toBe('%PDF-');
    const doc = await PDFDocument.load(bytes);
    // The template sheets, then the sheet map (one page for this kit) and the build sheet.
    expect(doc.getPageCount()).toBe(Number(response.headers.get('x-sheet-count')) + 2);
    // The printer profile the kit is for goes in the file name (none here).
    expect(response.headers.get('content-disposition')).toMatch(/^attachment; filename="?[a-z0-9-]+-kit-no-printer-profile\.pdf"?$/);
    for (const page of doc.getPages()) {
      expect(page.getMediaBox().width).toBeCloseTo(210 * PT_PER_MM, 2);
      expect(page.getMediaBox().height).toBeCloseTo(297 * PT_PER_MM, 2);
    }
    const prefs = doc.catalog.lookup(PDFName.of('ViewerPreferences'));
    expect(String(prefs)).toContain('/PrintScaling /None');
  });

  it('answers 400 with field paths for a bad design and bad paper', async () => {
    const response = await post('/api/render/pdf', { design: { ...pint, parts: [{ ...pint.parts[0], sideRows: [{ ...pint.parts[0].sideRows[0], count: 0 }] }] }, print: { paper: 'b5' } });
    expect(response.status).toBe(400);
    const body = await response.json();
    const paths = body.error.details.fields.map((f: { path: string }) => f.path);
    expect(paths).toContain('print.paper');
  });

  it('answers 400 naming design fields when only the design is wrong', async () => {
    const bad = structuredClone(pint);
    bad.parts[0].sideRows[0].count = 0;
    const body = await (await post('/api/render/pdf', { design: bad })).json();
    expect(body.error.details.fields.map((f: { path: string }) => f.path)).toContain('design.parts.0.sideRows.0.count');
  });

  it('answers 413 for a body over the limit and 422 for a kit that cannot be made', async () => {
    expect((await post('/api/render/pdf', { design: pint, padding: 'x'.repeat(300_000) })).status).toBe(413);
    const crowded = structuredClone(pint);
    crowded.parts[0].endPatterns = [{ id: 'e', group: 'primary', drillId: 'mm:1', rings: { strategy: 'equal-pitch', ringCount: 20, targetPitchMm: 0.5, firstRadiusMm: 1, ringSpacingMm: 1.5 } }];
    const tooMany = await post('/api/render/pdf', { design: crowded });
    expect(tooMany.status).toBe(422);
    expect((await tooMany.json()).error.code).toBe('TOO_MANY_HOLES');
    const bare = structuredClone(pint);
    for (const part of bare.parts) Object.assign(part, { sideRows: [], endPatterns: [] });
    const nothing = await post('/api/render/pdf', { design: bare });
    expect(nothing.status).toBe(422);
    expect((await nothing.json()).error.code).toBe('NO_HOLES');
  });
});

describe('POST /api/render/svg and /holes.csv, GET /api/render/calibration.pdf', () => {
  it('returns one sheet as SVG in mm with a mm viewBox (Letter, ANSI: 215.9 x 279.4 mm)', async () => {
    const response = await post('/api/render/svg?sheet=1', { design: pint, print: { paper: 'letter' } });
    expect(response.status).toBe(200);
    const svg = await response.text();
    expect(svg).toMatch(/<svg[^>]* width="215\.9mm"/);
    expect(svg).toMatch(/<svg[^>]* height="279\.4mm"/);
    expect(svg).toMatch(/viewBox="0 0 215\.9 279\.4"/);
    const count = Number(response.headers.get('x-sheet-count'));
    expect((await post(`/api/render/svg?sheet=${count + 1}`, { design: pint })).status).toBe(404);
  });

  it('returns the hole table as CSV', async () => {
    const response = await post('/api/render/holes.csv', { design: pint });
    expect(response.headers.get('content-type')).toContain('text/csv');
    expect((await response.text()).split('\r\n')[0]).toBe('number,piece,group,index,x_mm,y_mm,diameter_mm,drill,piece_name,row');
  });

  it('returns the calibration sheet', async () => {
    const response = await http.get('/api/render/calibration.pdf?paper=a4');
    expect(response.status).toBe(200);
    expect(response.headers.get('content-type')).toBe('application/pdf');
  });

  it('reads the calibration sheet’s margin from the query as a number, and refuses one outside 12.7-40 mm', async () => {
    // 20 mm: inside the margins the print screen offers (MIN_MARGIN_MM 12.7 = 1/2 in, MAX_MARGIN_MM 40).
    expect((await http.get('/api/render/calibration.pdf?paper=letter&marginMm=20')).status).toBe(200);
    const tooSmall = await http.get('/api/render/calibration.pdf?marginMm=3');
    expect(tooSmall.status).toBe(400);
    expect(tooSmall.body.error.details.fields[0].path).toBe('marginMm');
    expect((await http.get('/api/render/calibration.pdf?marginMm=wide')).status).toBe(400);
  });
});
