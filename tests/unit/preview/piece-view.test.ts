import { readFileSync } from 'node:fs';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { boundsOfCalls } from '../../../shared/drawing/drawing-bounds.ts';
import { RecordingContext } from '../../../shared/drawing/recording-context.ts';
import { layoutDocument, type Layout } from '../../../shared/layout/index.ts';
import type { DiscPiece, WrapStripPiece } from '../../../shared/layout/layout-types.ts';
import { kitText } from '../../../shared/print/kit-text.ts';
import { drawPieceView, fitView, flaggedHoleIds, locateHole, placeWholeDisc, placeWholeStrip } from '../../../src/features/preview/piece-view.ts';

function loadTemplate(name: string): Layout {
  const result = layoutDocument(JSON.parse(readFileSync(new URL(`../../../templates/${name}.json`, import.meta.url), 'utf8')));
  if (!result.ok) throw new Error(`${name} should lay out`);
  return result.layout;
}

const pint = loadTemplate('pint-can-stove');
const strip = pint.pieces.find((p): p is WrapStripPiece => p.kind === 'wrap-strip')!;
const disc = pint.pieces.find((p): p is DiscPiece => p.kind === 'disc')!;

describe('fitView', () => {
  it('fits a worked example: 200 x 50 mm in 420 x 300 px with 10 px padding', () => {
    // Worked arithmetic: min(400 / 200, 280 / 50) = 2 px/mm; centred: 210 - 2 x 100 = 10, 150 - 2 x 25 = 100.
    expect(fitView({ minX: 0, minY: 0, maxX: 200, maxY: 50 }, 420, 300, 10)).toEqual({ scale: 2, offsetX: 10, offsetY: 100 });
  });

  it('keeps the whole bounds inside the padded view, touching it on one axis', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -500, max: 500, noNaN: true }),
        fc.double({ min: -500, max: 500, noNaN: true }),
        fc.double({ min: 1, max: 2000, noNaN: true }),
        fc.double({ min: 1, max: 2000, noNaN: true }),
        fc.integer({ min: 60, max: 3000 }),
        fc.integer({ min: 60, max: 3000 }),
        fc.integer({ min: 0, max: 24 }),
        (x, y, w, h, widthPx, heightPx, pad) => {
          const view = fitView({ minX: x, minY: y, maxX: x + w, maxY: y + h }, widthPx, heightPx, pad);
          const left = x * view.scale + view.offsetX;
          const right = (x + w) * view.scale + view.offsetX;
          const top = y * view.scale + view.offsetY;
          const bottom = (y + h) * view.scale + view.offsetY;
          const eps = 1e-6 * Math.max(widthPx, heightPx);
          expect(left).toBeGreaterThanOrEqual(pad - eps);
          expect(right).toBeLessThanOrEqual(widthPx - pad + eps);
          expect(top).toBeGreaterThanOrEqual(pad - eps);
          expect(bottom).toBeLessThanOrEqual(heightPx - pad + eps);
          // Tight: the limiting axis fills the padded room (worked arithmetic).
          expect(Math.max((right - left) / (widthPx - 2 * pad), (bottom - top) / (heightPx - 2 * pad))).toBeCloseTo(1, 6);
        },
      ),
    );
  });
});

describe('whole-piece placements', () => {
  it('shows a whole strip, seam to the end of the tab, inside its box', () => {
    const placement = placeWholeStrip(strip);
    expect(placement.tile).toBeUndefined();
    const rec = new RecordingContext();
    drawPieceView(rec, pint, strip, placement, kitText('in'), new Set());
    const bounds = boundsOfCalls(rec.calls)!;
    const { x, y, width, height } = placement.rect;
    expect(bounds).toEqual({ minX: x, minY: y, maxX: x + width, maxY: y + height });
    // The seam line sits at strip x = 0 and the tab's far edge at length + tab (draw-strip.ts contract).
    const xs = rec.calls.flatMap((c) => (c.op === 'line' ? [c.x1, c.x2] : c.op === 'polyline' ? c.points.map(([px]) => px) : []));
    expect(xs).toContain(placement.originX);
    expect(Math.max(...xs)).toBeCloseTo(placement.originX + strip.lengthMm + strip.overlapTabMm, 9);
  });

  it('centres a disc in its square, cut circle at the true diameter', () => {
    const placement = placeWholeDisc(disc);
    expect(placement.originX).toBe(placement.rect.width / 2);
    expect(placement.originY).toBe(placement.rect.height / 2);
    const rec = new RecordingContext();
    drawPieceView(rec, pint, disc, placement, kitText('in'), new Set());
    const cut = rec.calls.find((c) => c.op === 'circle' && c.cx === placement.originX && c.r === disc.diameterMm / 2);
    expect(cut).toBeDefined();
  });

  it('locates each hole where the kit drawing put its circle', () => {
    for (const piece of [strip, disc]) {
      const placement = piece.kind === 'disc' ? placeWholeDisc(piece) : placeWholeStrip(piece);
      const rec = new RecordingContext();
      drawPieceView(rec, pint, piece, placement, kitText('mm'), new Set());
      for (const hole of pint.holes.filter((h) => h.pieceId === piece.id)) {
        const [hx, hy] = locateHole(piece, placement, hole);
        const circle = rec.calls.find((c) => c.op === 'circle' && c.r === hole.diameterMm / 2 && Math.abs(c.cx - hx) < 1e-9 && Math.abs(c.cy - hy) < 1e-9);
        expect(circle, hole.id).toBeDefined();
      }
    }
  });
});

describe('flaggedHoleIds', () => {
  it('collects holes of errors and warnings but not notes', () => {
    const sparse = loadTemplate('first-try-too-sparse');
    const flagged = flaggedHoleIds(sparse);
    const expected = new Set(sparse.findings.filter((f) => f.severity === 'error' || f.severity === 'warning').flatMap((f) => f.holeIds));
    expect(flagged).toEqual(expected);
    expect(flagged.size).toBeGreaterThan(0);
    // The metric tin stove carries one note and nothing else (templates.test.ts: no errors).
    expect(flaggedHoleIds(loadTemplate('metric-tin-stove')).size).toBe(0);
    // The pint stove's 16 jets sit pi x 80.9625 / 16 = 15.897 mm apart, just over the 5/8 in
    // (15.875 mm) warning: the warning names the two holes of the widest gap.
    expect(flaggedHoleIds(pint).size).toBe(2);
  });

  it('draws flagged holes in the accent colour', () => {
    const hole = pint.holes.find((h) => h.pieceId === strip.id)!;
    const rec = new RecordingContext();
    drawPieceView(rec, pint, strip, placeWholeStrip(strip), kitText('in'), new Set([hole.id]));
    const accents = rec.calls.filter((c) => c.op === 'circle' && c.style.stroke?.color === 'accent');
    expect(accents).toHaveLength(1);
  });
});
