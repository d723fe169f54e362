import { readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { prepareKit, renderKitPdf, type RenderRequest } from '../../server/render/render-kit.ts';
import { MARK_REACH_PAST_HOLE_MM } from '../../shared/layout/build-pieces.ts';
import type { Layout } from '../../shared/layout/layout-types.ts';
import { FLAG_SIDE_MM } from '../../shared/print/draw-hole.ts';
import type { Sheet } from '../../shared/print/imposition-types.ts';
import { rasterizePdf, readPdfText, type RasterImage } from '../helpers/rasterize-pdf.ts';
import { listDrawnHoles } from './measure-kit.ts';
import { inkAt, pxPerMm } from './measure-ink.ts';

/**
 * A printed kit never hides a check: the two-part pint stove (a chamber in a shell) has jets a
 * check flags (they stand 15.9 mm apart against the 15.875 mm rule, common practice, no source).
 * Every page is rasterised and read as grey only (the mean of R, G and B, what a black-and-white
 * printer keeps): the flag triangle must still be there beside each flagged hole and nowhere else.
 */
const DPI = 150;
const TODAY = new Date('2026-12-04T10:00:00Z');

let layout: Layout;
let sheets: Sheet[];
let bytes: Uint8Array;
let text: string[];
const pages = new Map<number, Promise<RasterImage>>();
const page = (index: number) => {
  if (!pages.has(index)) pages.set(index, rasterizePdf(bytes, { dpi: DPI, page: index + 1 }));
  return pages.get(index)!;
};

beforeAll(async () => {
  const design: unknown = JSON.parse(await readFile(join(import.meta.dirname, '../../templates/pint-can-stove.json'), 'utf8'));
  const request: RenderRequest = { design, print: { paper: 'letter', orientation: 'portrait' } };
  const kit = prepareKit(request, TODAY);
  layout = kit.layout;
  sheets = kit.plan.imposition.sheets;
  ({ bytes } = await renderKitPdf(request, TODAY));
  text = await readPdfText(bytes);
});

/** Mean ink (1 - grey) of the pixels whose centres fall in a rect, sheet mm. */
function meanInk(image: RasterImage, x: number, y: number, width: number, height: number): number {
  const s = pxPerMm(DPI);
  let sum = 0;
  let count = 0;
  for (let row = Math.ceil(y * s - 0.5); (row + 0.5) / s <= y + height; row++) {
    for (let col = Math.ceil(x * s - 0.5); (col + 0.5) / s <= x + width; col++) {
      sum += inkAt(image, col, row);
      count++;
    }
  }
  return count ? sum / count : 0;
}

describe('holes a check flagged, printed in grey only', () => {
  it('carry a dark triangle below and right of their crosshair; unflagged holes have none', async () => {
    const flagged = new Set(layout.findings.filter((f) => f.severity !== 'note').flatMap((f) => f.holeIds));
    expect(flagged.size).toBeGreaterThan(0);
    let seenFlagged = 0;
    for (const [index, sheet] of sheets.entries()) {
      const image = await page(index);
      for (const { hole, x, y } of listDrawnHoles(layout, sheet)) {
        // The triangle's centre: the crosshair's reach (radius + 2 mm) along the 45 degree diagonal.
        const reach = hole.diameterMm / 2 + MARK_REACH_PAST_HOLE_MM;
        const cx = x + reach * Math.SQRT1_2;
        const cy = y + reach * Math.SQRT1_2;
        // A 1 mm square inside the 3 mm triangle (its inscribed circle is 3 / (2 sqrt 3) = 0.87 mm across).
        const ink = meanInk(image, cx - 0.4, cy - 0.3, 0.8, 0.6);
        if (flagged.has(hole.id)) {
          seenFlagged++;
          expect(ink, `flag beside ${hole.id} on sheet ${index + 1}`).toBeGreaterThan(0.6);
        } else expect(ink, `no flag beside ${hole.id} on sheet ${index + 1}`).toBeLessThan(0.3);
      }
    }
    // A hole in the band two tiles share is drawn on both, so at least every flagged hole once.
    expect(seenFlagged).toBeGreaterThanOrEqual(flagged.size);
    expect(FLAG_SIDE_MM).toBe(3);
  });

  it('are explained in the drill legend of every sheet that shows one, and only there', () => {
    const flagged = new Set(layout.findings.filter((f) => f.severity !== 'note').flatMap((f) => f.holeIds));
    for (const [index, sheet] of sheets.entries()) {
      const shows = listDrawnHoles(layout, sheet).some((d) => flagged.has(d.hole.id));
      expect(text[index]!.includes('a check flagged this hole'), `legend on sheet ${index + 1}`).toBe(shows);
    }
  });
});

describe('the build sheet of the kit', () => {
  it('lists every check still open and the air ratio', () => {
    const buildSheet = text.slice(sheets.length).join(' ');
    expect(buildSheet).toContain('Checks still open');
    // 1,425 mm² primary : 285 mm² secondary in the example's airflow summary: 5 : 1.
    expect(buildSheet).toMatch(/Primary : secondary open area 5 : 1 \(target 5 : 1\)/);
    const open = layout.findings.filter((f) => f.severity !== 'note');
    expect(open.length).toBeGreaterThan(0);
    for (const finding of open) {
      // Long messages wrap; the first words are on one line.
      expect(buildSheet).toContain(`${finding.severity === 'error' ? 'Error' : 'Warning'}: ${finding.message.split(' ').slice(0, 6).join(' ')}`);
    }
  });
});
