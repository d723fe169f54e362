import { existsSync } from 'node:fs';
import { mkdir, readFile } from 'node:fs/promises';
import { join } from 'node:path';
import pixelmatch from 'pixelmatch';
import { PNG } from 'pngjs';
import { beforeAll, describe, expect, it } from 'vitest';
import { prepareKit, renderKitPdf, type RenderRequest } from '../../server/render/render-kit.ts';
import { RecordingContext, type DrawCall } from '../../shared/drawing/recording-context.ts';
import type { Layout, WrapStripPiece } from '../../shared/layout/layout-types.ts';
import type { Placement, Rect, Sheet } from '../../shared/print/imposition-types.ts';
import { rasterizePdf, savePng, type RasterImage } from '../helpers/rasterize-pdf.ts';
import { inkCentroid } from './measure-ink.ts';
import { listDrawnHoles, measureCrossCentre, measureRulerTicks } from './measure-kit.ts';

const DPI = 600;
/** The accuracy asked of every mark: 0.05 mm is 1.18 px at 600 dpi (600 / 25.4 px a mm, worked arithmetic). */
const TOL_MM = 0.05;
/** A fixed date for the title block, so the reference images do not change from day to day. */
const TODAY = new Date('2026-12-01T12:00:00Z');
/** A printer 1.5 % long in X and 0.7 % short in Y: 152.25 / 150 and 198.6 / 200 (worked arithmetic). */
const PRINTER = { measuredXMm: 152.25, measuredYMm: 198.6 };
const PRINTER_SCALE = { x: 1.015, y: 0.993 };
const REFERENCE_DIR = join(import.meta.dirname, 'reference');

interface Kit {
  layout: Layout;
  sheets: Sheet[];
  transform: { scaleX: number; scaleY: number };
  /** Page `index` (0-based) rasterised once per dpi, on first use. */
  page(index: number, dpi?: number): Promise<RasterImage>;
  /** What page `index` draws, as data: used only to find marks the contract does not place. */
  record(index: number): DrawCall[];
}

async function loadKit(template: string, paper: 'letter' | 'a4', printer?: typeof PRINTER): Promise<Kit> {
  const design: unknown = JSON.parse(await readFile(join(import.meta.dirname, '../../templates', `${template}.json`), 'utf8'));
  const request: RenderRequest = { design, print: { paper, orientation: 'portrait' }, printer };
  const { layout, plan } = prepareKit(request, TODAY);
  const { bytes } = await renderKitPdf(request, TODAY);
  const pages = new Map<string, Promise<RasterImage>>();
  const page = (index: number, dpi = DPI) => {
    const key = `${index}@${dpi}`;
    if (!pages.has(key)) pages.set(key, rasterizePdf(bytes, { dpi, page: index + 1 }));
    return pages.get(key)!;
  };
  const record = (index: number) => {
    const recorder = new RecordingContext();
    plan.drawSheet(index, recorder);
    return recorder.calls;
  };
  return { layout, sheets: plan.imposition.sheets, transform: plan.transform, page, record };
}

/** The sheets (0-based) showing a piece, in tile order, with its placement on each. */
function findPlacements(kit: Kit, pieceId: string): { index: number; placement: Placement }[] {
  return kit.sheets
    .flatMap((sheet, index) => sheet.placements.filter((p) => p.pieceId === pieceId).map((placement) => ({ index, placement })))
    .sort((a, b) => (a.placement.tile?.number ?? 0) - (b.placement.tile?.number ?? 0));
}

const firstSheet = (kit: Kit, pieceId: string): number => findPlacements(kit, pieceId)[0]?.index ?? -1;
/** Where a rect lands under a printer profile: the PDF writer scales each page about its top-left corner. */
const scaleRect = (r: Rect, t: Kit['transform']): Rect => ({ x: r.x * t.scaleX, y: r.y * t.scaleY, width: r.width * t.scaleX, height: r.height * t.scaleY });
const worstOf = (values: number[]): number => values.reduce((w, v) => (Number.isNaN(v) || Number.isNaN(w) ? NaN : Math.max(w, Math.abs(v))), 0);

let pint: Kit;
let pintCompensated: Kit;
let no10: Kit;

beforeAll(async () => {
  pint = await loadKit('pint-can-stove', 'letter');
  pintCompensated = await loadKit('pint-can-stove', 'letter', PRINTER);
  no10 = await loadKit('no10-can-stove', 'a4');
});

describe('Kit accuracy: whole kits rendered by pdf.js at 600 dpi and measured', () => {
  it('puts every ruler tick within 0.05 mm of nominal, from the zero tick and from the ruler rect', async () => {
    const errors: number[] = [];
    for (const [kit, index] of [[pint, firstSheet(pint, 'chamber:bottom')], [no10, 0]] as const) {
      const sheet = kit.sheets[index]!;
      const image = await kit.page(index);
      for (const axis of ['x', 'y'] as const) {
        const rect = axis === 'x' ? sheet.furniture.rulerX : sheet.furniture.rulerY;
        const { mm, inch } = measureRulerTicks(image, DPI, rect, axis);
        // drawRuler: ticks at 0..100 mm and 0..64 sixteenths of an inch (worked arithmetic: 101 and 65).
        expect(mm).toHaveLength(101);
        expect(inch).toHaveLength(65);
        // The zero sits 4 mm into the rect (drawRuler); 1/16 in = 1.5875 mm (25.4 mm an inch, ISO 31-1).
        const zero = (axis === 'x' ? rect.x : rect.y) + 4;
        errors.push(mm[0]! - zero, inch[0]! - zero, ...mm.map((c, k) => c - mm[0]! - k), ...inch.map((c, k) => c - inch[0]! - (k * 25.4) / 16));
      }
    }
    console.info(`ruler ticks: worst error ${worstOf(errors).toFixed(4)} mm over ${errors.length} checks`);
    expect(worstOf(errors)).toBeLessThan(TOL_MM);
  });

  it('centres every hole mark within 0.05 mm of its place in the layout', async () => {
    const misses: string[] = [];
    const seen = new Set<string>();
    const errors: number[] = [];
    const pages = [...pint.sheets.map((_, index) => [pint, index] as const), [no10, 0] as const];
    for (const [kit, index] of pages) {
      const image = await kit.page(index);
      for (const { hole, x, y } of listDrawnHoles(kit.layout, kit.sheets[index]!)) {
        const r = hole.diameterMm / 2;
        // Crosshair arms reach 2 mm past the circle (drawHoleMark); measure them 0.5-1.8 mm past it.
        const centre = measureCrossCentre(image, DPI, x, y, { inner: r + 0.5, outer: r + 1.8 });
        const error = Math.hypot(centre.x - x, centre.y - y);
        errors.push(error);
        if (kit === pint) seen.add(hole.id);
        if (!(error < TOL_MM)) misses.push(`${kit.layout.designName} sheet ${index + 1} ${hole.id}: off by ${error.toFixed(3)} mm`);
      }
    }
    console.info(`hole centres: worst error ${worstOf(errors).toFixed(4)} mm over ${errors.length} marks`);
    expect(misses).toEqual([]);
    expect([...seen].sort()).toEqual(pint.layout.holes.map((h) => h.id).sort());
  });

  it('joins a tiled wall strip at its marks to pi x (D + paper), within 0.1 mm', async () => {
    // US can sizes give the diameter in whole inches and sixteenths: 303 = 3 3/16 in = 80.9625 mm,
    // 401 = 4 1/16 in = 103.1875 mm. Paper 0.1 mm (80 g/m2 copier paper, from memory; the design default).
    // pi x 81.0625 = 254.6654 mm and pi x 103.2875 = 324.4873 mm (worked arithmetic).
    const cases = [
      { pieceId: 'chamber:wall', expected: Math.PI * (80.9625 + 0.1) },
      { pieceId: 'shell:wall', expected: Math.PI * (103.1875 + 0.1) },
    ];
    for (const { pieceId, expected } of cases) {
      const piece = pint.layout.pieces.find((p): p is WrapStripPiece => p.id === pieceId && p.kind === 'wrap-strip')!;
      const tiles = findPlacements(pint, pieceId);
      expect(tiles.length).toBeGreaterThan(1);
      let joined = 0;
      for (const { index, placement } of tiles) {
        const image = await pint.page(index);
        const tile = placement.tile!;
        const sx = (x: number) => placement.originX + x;
        // Join marks: crosshairs (circle r 1.5 mm, arms 3 mm) at the band's middle x; their heights
        // on the strip are the drawing's choice, so they are looked up in what the sheet draws.
        const calls = pint.record(index);
        const joinX = (x: number) => {
          const ys = calls.flatMap((c) => (c.op === 'circle' && c.r === 1.5 && Math.abs(c.cx - x) < 0.6 && c.cy >= placement.rect.y && c.cy <= placement.rect.y + placement.rect.height ? [c.cy] : []));
          expect(ys.length).toBeGreaterThan(0);
          return ys.map((y) => measureCrossCentre(image, DPI, x, y, { inner: 2, outer: 2.8 }).x).reduce((a, b) => a + b) / ys.length;
        };
        // The seam line (x = 0) and the strip end (x = L), in the middle fifth of the strip's height.
        const lineX = (x: number) => inkCentroid(image, DPI, { x: x - 0.8, y: placement.originY - 0.6 * piece.heightMm, width: 1.6, height: 0.2 * piece.heightMm }).x;
        const left = tile.joinLeft ? joinX(sx(tile.fromXMm + tile.overlapMm / 2)) : lineX(sx(0));
        const right = tile.joinRight ? joinX(sx(tile.toXMm - tile.overlapMm / 2)) : lineX(sx(piece.lengthMm));
        joined += right - left;
      }
      console.info(`${pieceId}: ${tiles.length} tiles join to ${joined.toFixed(4)} mm, expected ${expected.toFixed(4)} mm`);
      expect(Math.abs(joined - expected)).toBeLessThan(0.1);
    }
  });

  it('prints true to 0.1 % through a printer profile, and 1.5 % long in X without it', async () => {
    /** Relative errors of rulers and hole spans on a sheet as the mis-scaling printer would print it. */
    const measurePrinted = async (kit: Kit, index: number): Promise<{ x: number[]; y: number[] }> => {
      const image = await kit.page(index);
      const t = kit.transform;
      const sheet = kit.sheets[index]!;
      const x = measureRulerTicks(image, DPI, scaleRect(sheet.furniture.rulerX, t), 'x');
      const y = measureRulerTicks(image, DPI, scaleRect(sheet.furniture.rulerY, t), 'y');
      // 100 mm and 4 in = 101.6 mm (ISO 31-1: 25.4 mm an inch).
      const span = (ticks: number[], nominal: number, scale: number) => ((ticks[ticks.length - 1]! - ticks[0]!) * scale) / nominal - 1;
      const relX = [span(x.mm, 100, PRINTER_SCALE.x), span(x.inch, 101.6, PRINTER_SCALE.x)];
      const relY = [span(y.mm, 100, PRINTER_SCALE.y), span(y.inch, 101.6, PRINTER_SCALE.y)];
      // The two holes farthest apart on each axis: their printed distance against the layout's.
      const holes = listDrawnHoles(kit.layout, sheet);
      for (const axis of ['x', 'y'] as const) {
        const sorted = [...holes].sort((a, b) => a[axis] - b[axis]);
        const [a, b] = [sorted[0]!, sorted[sorted.length - 1]!];
        const printed = [a, b].map((h) => {
          const c = measureCrossCentre(image, DPI, h.x * t.scaleX, h.y * t.scaleY, { inner: h.hole.diameterMm / 2 + 0.5, outer: h.hole.diameterMm / 2 + 1.8 });
          return axis === 'x' ? c.x * PRINTER_SCALE.x : c.y * PRINTER_SCALE.y;
        });
        (axis === 'x' ? relX : relY).push((printed[1]! - printed[0]!) / (b[axis] - a[axis]) - 1);
      }
      return { x: relX, y: relY };
    };
    const indices = [firstSheet(pint, 'chamber:bottom'), firstSheet(pint, 'chamber:wall')];
    const withProfile = await Promise.all(indices.map((i) => measurePrinted(pintCompensated, i)));
    const without = await Promise.all(indices.map((i) => measurePrinted(pint, i)));
    const compensated = worstOf(withProfile.flatMap((m) => [...m.x, ...m.y]));
    console.info(`printer profile: worst printed error ${(compensated * 100).toFixed(4)} %; without it X ${without.map((m) => m.x.map((e) => (e * 100).toFixed(3)))} %, Y ${without.map((m) => m.y.map((e) => (e * 100).toFixed(3)))} %`);
    // 0.1 % of 100 mm is 0.1 mm (worked arithmetic).
    expect(compensated).toBeLessThan(0.001);
    // Uncompensated the printer's own error shows: +1.5 % in X, -0.7 % in Y (worked arithmetic).
    for (const m of without) {
      for (const e of m.x) expect(e).toBeGreaterThan(0.01);
      for (const e of m.y) expect(e).toBeLessThan(-0.005);
    }
  });
});

describe('Kit sheets: visual regression against committed references', () => {
  it('renders the pint disc sheet and first wall tile as they were (pixelmatch at 100 dpi)', async () => {
    const sheets = [
      ['pint-can-stove-letter-disc', firstSheet(pint, 'chamber:bottom')],
      ['pint-can-stove-letter-wall-tile-1', firstSheet(pint, 'chamber:wall')],
    ] as const;
    for (const [name, index] of sheets) {
      const image = await pint.page(index, 100);
      const path = join(REFERENCE_DIR, `${name}.png`);
      if (process.env.UPDATE_REFERENCES === '1' || !existsSync(path)) {
        await mkdir(REFERENCE_DIR, { recursive: true });
        await savePng(image, path);
        console.info(`Wrote reference image ${path}: check it by eye, then commit it.`);
        continue;
      }
      const reference = PNG.sync.read(await readFile(path));
      expect([reference.width, reference.height]).toEqual([image.width, image.height]);
      const differing = pixelmatch(reference.data, image.data, undefined, image.width, image.height, { threshold: 0.1 });
      // At most 0.5 % of the pixels may differ (anti-aliasing and font rasterising vary a little).
      expect(differing / (image.width * image.height)).toBeLessThanOrEqual(0.005);
    }
  });
});
