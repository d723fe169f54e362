import { readFileSync } from 'node:fs';
import { beforeAll, describe, expect, it } from 'vitest';
import { prepareKit, renderHoleCsv, renderKitPdf, type RenderRequest } from '../../server/render/render-kit.ts';
import { RecordingContext } from '../../shared/drawing/recording-context.ts';
import type { Layout, WrapStripPiece } from '../../shared/layout/layout-types.ts';
import { HOLE_NUMBER_SIZE_MM } from '../../shared/print/draw-style.ts';
import type { KitPlan } from '../../shared/print/plan-kit.ts';
import { rasterizePdf, readPdfText, type RasterImage } from '../helpers/rasterize-pdf.ts';
import { listDrawnHoles, measureRunCentres } from './measure-kit.ts';

const DPI = 600;
/** The accuracy asked of the wrap check: 0.05 mm is 1.18 px at 600 dpi (600 / 25.4 px a mm, worked arithmetic). */
const TOL_MM = 0.05;
const TODAY = new Date('2026-12-01T12:00:00Z');
/** A printer 1.5 % long in X and 0.7 % short in Y: 152.25 / 150 and 198.6 / 200 (worked arithmetic). */
const PRINTER = { name: 'Hall laser', measuredXMm: 152.25, measuredYMm: 198.6 };

const template = (name: string): unknown => JSON.parse(readFileSync(new URL(`../../templates/${name}.json`, import.meta.url), 'utf8'));

interface Kit {
  request: RenderRequest;
  layout: Layout;
  plan: KitPlan;
  bytes: Uint8Array;
  fileName: string;
  pages: string[];
  raster(index: number): Promise<RasterImage>;
}

async function loadKit(name: string, paper: 'letter' | 'a4', printer?: typeof PRINTER): Promise<Kit> {
  const request: RenderRequest = { design: template(name), print: { paper, orientation: 'portrait' }, ...(printer ? { printer } : {}) };
  const { layout, plan } = prepareKit(request, TODAY);
  const { bytes, fileName } = await renderKitPdf(request, TODAY);
  const rasters = new Map<number, Promise<RasterImage>>();
  return {
    request,
    layout,
    plan,
    bytes,
    fileName,
    pages: await readPdfText(bytes),
    raster: (index) => {
      if (!rasters.has(index)) rasters.set(index, rasterizePdf(bytes, { dpi: DPI, page: index + 1 }));
      return rasters.get(index)!;
    },
  };
}

/** Rows of the hole CSV by header name; the names come last and may be quoted (RFC 4180). */
function parseCsv(csv: string): Record<string, string>[] {
  const [header, ...rows] = csv.trim().split('\r\n');
  const columns = header!.split(',');
  return rows.map((row) => {
    const fields: string[] = [];
    for (const match of row.matchAll(/("(?:[^"]|"")*"|[^,]*)(,|$)/g)) {
      if (match.index === row.length && match[0] === '') break;
      const raw = match[1]!;
      fields.push(raw.startsWith('"') ? raw.slice(1, -1).replace(/""/g, '"') : raw);
    }
    return Object.fromEntries(columns.map((c, i) => [c, fields[i] ?? '']));
  });
}

let pint: Kit;
let no10: Kit;

beforeAll(async () => {
  pint = await loadKit('pint-can-stove', 'letter');
  no10 = await loadKit('no10-can-stove', 'a4', PRINTER);
});

describe('the wrap check on every strip', () => {
  it('puts its 0 tick at the nominal circumference and its other ticks pi x the step away, within 0.05 mm', async () => {
    // US can sizes: 303 = 3 3/16 in = 80.9625 mm, 401 = 4 1/16 in = 103.1875 mm across (whole
    // inches and sixteenths, from memory). Paper 0.1 mm (80 g/m2 copier paper, from memory; the
    // design default). The strip is the paper's centre line: pi x (D + t) (worked arithmetic).
    // Steps: 1/16 in of can diameter moves the meeting point pi x 1.5875 = 4.9873 mm (worked arithmetic).
    const cases = [
      { pieceId: 'chamber:wall', lengthMm: Math.PI * (80.9625 + 0.1), stepMm: Math.PI * 1.5875 },
      { pieceId: 'shell:wall', lengthMm: Math.PI * (103.1875 + 0.1), stepMm: Math.PI * 1.5875 },
    ];
    const errors: string[] = [];
    for (const { pieceId, lengthMm, stepMm } of cases) {
      const sheetIndex = pint.plan.imposition.sheets.findIndex((s) => s.placements.some((p) => p.pieceId === pieceId && (p.tile?.toXMm ?? Infinity) >= lengthMm));
      const placement = pint.plan.imposition.sheets[sheetIndex]!.placements.find((p) => p.pieceId === pieceId && (p.tile?.toXMm ?? Infinity) >= lengthMm)!;
      const piece = pint.layout.pieces.find((p): p is WrapStripPiece => p.id === pieceId)!;
      const image = await pint.raster(sheetIndex);
      const top = placement.originY - piece.heightMm;
      const end = placement.originX + lengthMm;
      // The 0 tick is 5 mm long and the others 3 mm: 3.6-4.4 mm under the top edge only the 0 shows.
      const zero = measureRunCentres(image, DPI, { x: end - 0.6, y: top + 3.6, width: 1.2, height: 0.8 }, 'x');
      expect(zero, pieceId).toHaveLength(1);
      if (Math.abs(zero[0]! - end) > TOL_MM) errors.push(`${pieceId} 0 tick at ${zero[0]} mm, expected ${end} mm`);
      // 1.0-2.0 mm under the top edge all five ticks show, pi x 1/16 in apart.
      const all = measureRunCentres(image, DPI, { x: end - 2 * stepMm - 1.5, y: top + 1, width: 4 * stepMm + 3, height: 1 }, 'x');
      expect(all, pieceId).toHaveLength(5);
      all.forEach((x, k) => {
        const expected = end + (k - 2) * stepMm;
        if (Math.abs(x - expected) > TOL_MM) errors.push(`${pieceId} tick ${k - 2} at ${x.toFixed(4)} mm, expected ${expected.toFixed(4)} mm`);
      });
    }
    expect(errors).toEqual([]);
  });

  it('states the strip length, the can it was made for and which way is up', () => {
    const strips = pint.pages.slice(0, pint.plan.imposition.sheets.length).join('\n');
    // pi x 81.0625 = 254.67 mm (worked arithmetic above); 3 3/16 in = 80.96 mm across.
    expect(strips).toMatch(/254\.67 mm/);
    expect(strips).toContain('80.96 mm');
    expect(strips).toContain('This way up, towards the rim');
    expect(strips).toContain('Wrap check: the start edge meets 0');
  });
});

describe('hole numbers', () => {
  it('are the same on the templates, in the build sheet and in the CSV, inner parts first', () => {
    for (const kit of [pint, no10]) {
      const rows = parseCsv(renderHoleCsv(kit.request).csv);
      expect(rows.map((r) => Number(r.number))).toEqual(rows.map((_, i) => i + 1));
      // Inner parts first: every chamber hole is numbered before any shell or collar hole.
      const roleOf = new Map(kit.layout.pieces.map((p) => [p.id, p.role]));
      const lastChamber = Math.max(...rows.filter((r) => roleOf.get(r.piece!) === 'burn-chamber').map((r) => Number(r.number)));
      const firstOther = Math.min(...rows.filter((r) => roleOf.get(r.piece!) !== 'burn-chamber').map((r) => Number(r.number)));
      expect(lastChamber).toBeLessThan(firstOther);
      // The CSV names each row as its template does; each row's numbers are the build sheet's range.
      const labels = new Set(kit.layout.marks.flatMap((m) => ('label' in m ? [m.label] : [])));
      for (const row of rows) expect(labels.has(row.row!), row.row).toBe(true);
      const groups = kit.plan.buildSheet.holes.flatMap((p) => p.groups);
      for (const group of groups) {
        const numbers = rows.filter((r) => r.row === group.label).map((r) => Number(r.number));
        const [low, high] = group.numbers.split('–').map(Number);
        expect(numbers.length, group.label).toBeGreaterThanOrEqual(group.count);
        expect(rows.filter((r) => Number(r.number) >= low! && Number(r.number) <= (high ?? low!)).every((r) => r.row === group.label), group.label).toBe(true);
      }
      expect(groups.reduce((n, g) => n + g.count, 0)).toBe(rows.length);

      // Every number drawn on a sheet sits beside the hole the CSV gives that number.
      const byNumber = new Map(rows.map((r) => [Number(r.number), r]));
      let drawn = 0;
      kit.plan.imposition.sheets.forEach((sheet, index) => {
        const recorder = new RecordingContext();
        kit.plan.drawSheet(index, recorder);
        const holes = listDrawnHoles(kit.layout, sheet);
        for (const call of recorder.calls) {
          if (call.op !== 'text' || call.style.sizeMm !== HOLE_NUMBER_SIZE_MM || call.style.anchor !== 'middle' || !/^\d+$/.test(call.text)) continue;
          const row = byNumber.get(Number(call.text))!;
          // A hole in the band two tiles share is drawn on both: the nearer drawing is the one numbered.
          const hole = holes
            .filter((h) => h.hole.pieceId === row.piece && h.hole.index === Number(row.index) && h.hole.group === row.group && Math.abs(h.hole.xMm - Number(row.x_mm)) < 1e-3 && Math.abs(h.hole.yMm - Number(row.y_mm)) < 1e-3)
            .sort((a, b) => Math.hypot(call.x - a.x, call.y - a.y) - Math.hypot(call.x - b.x, call.y - b.y))[0];
          expect(hole, `number ${call.text} on sheet ${index + 1}`).toBeDefined();
          // Within the mark's reach (radius + 2 mm) and a number's size of its centre.
          const distance = Math.hypot(call.x - hole!.x, call.y - hole!.y);
          expect(distance, `number ${call.text}`).toBeLessThan(hole!.hole.diameterMm / 2 + 2 + 2 * HOLE_NUMBER_SIZE_MM + 1.5);
          drawn++;
        }
      });
      // Most holes carry their number; a tight row may show every other one.
      expect(drawn).toBeGreaterThan(rows.length / 2);
    }
  });
});

describe('the sheet map and the printer profile', () => {
  it('lists every sheet in build order and tells how each tiled strip joins, A onto A', () => {
    for (const kit of [pint, no10]) {
      const sheets = kit.plan.imposition.sheets;
      const mapText = kit.pages.slice(sheets.length, -1).join('\n');
      expect(mapText).toContain('sheet map');
      for (const sheet of sheets) expect(mapText).toMatch(new RegExp(`Sheet ${sheet.number}: `));
      for (const sheet of sheets) for (const p of sheet.placements) {
        const tile = p.tile;
        if (tile?.joinRight) expect(mapText).toContain(`Join ${tile.joinRight} onto ${tile.joinRight}: lay the left end of part ${tile.number + 1}`);
      }
      // Inner parts first: the sheets holding the chamber come before any holding only the shell.
      const roleOf = new Map(kit.layout.pieces.map((p) => [p.id, p.role]));
      const firstSheetOf = (role: string) => sheets.findIndex((s) => s.placements.some((p) => roleOf.get(p.pieceId) === role));
      expect(firstSheetOf('burn-chamber')).toBe(0);
      expect(firstSheetOf('burn-chamber')).toBeLessThan(firstSheetOf('shell'));
    }
  });

  it('names the printer profile on every sheet and in the file name', () => {
    const sheets = no10.plan.imposition.sheets.length;
    for (const page of no10.pages.slice(0, sheets)) expect(page).toContain('Printer: “Hall laser”');
    // 150 / 152.25 = 98.52 % and 200 / 198.6 = 100.70 % (worked arithmetic).
    expect(no10.pages[0]).toContain('98.52 % × 100.70 %');
    expect(no10.fileName).toBe('alder-street-no-10-group-cooker-kit-for-hall-laser.pdf');
    for (const page of pint.pages.slice(0, pint.plan.imposition.sheets.length)) expect(page).toContain('Printer: no profile, drawn at 100 %');
    expect(pint.fileName).toBe('alder-street-pint-can-stove-kit-no-printer-profile.pdf');
  });

  it('keeps letters of other scripts in the file name, accents dropped to their letters', async () => {
    const design = { ...(template('pint-can-stove') as object), name: 'Śliwka Ζήτα Жаровня' };
    const { fileName } = await renderKitPdf({ design, print: { paper: 'letter' }, printer: { name: 'Büro-Laser', measuredXMm: 150, measuredYMm: 200 } });
    expect(fileName).toBe('sliwka-ζητα-жаровня-kit-for-buro-laser.pdf');
  });
});
