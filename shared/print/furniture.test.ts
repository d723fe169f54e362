import { describe, expect, it } from 'vitest';
import { FURNITURE_GAP_MM, layoutFurniture, RULER_LENGTH_MM } from './furniture.ts';
import type { Rect } from './imposition-types.ts';
import { MAX_MARGIN_MM, MIN_MARGIN_MM, paperIds, sheetSize } from './paper.ts';

const EPS = 1e-9;
const right = (r: Rect) => r.x + r.width;
const bottom = (r: Rect) => r.y + r.height;
/** True if a and b come closer than gap (touching edges do not count at gap 0). */
const near = (a: Rect, b: Rect, gap = 0) => a.x < right(b) + gap - EPS && b.x < right(a) + gap - EPS && a.y < bottom(b) + gap - EPS && b.y < bottom(a) + gap - EPS;
const inside = (o: Rect, i: Rect) => i.x >= o.x - EPS && i.y >= o.y - EPS && right(i) <= right(o) + EPS && bottom(i) <= bottom(o) + EPS;

const cases = paperIds.flatMap((paper) =>
  (['portrait', 'landscape'] as const).flatMap((orientation) => [MIN_MARGIN_MM, 25, MAX_MARGIN_MM].map((margin) => [paper, orientation, margin] as const)),
);

describe.each(cases)('layoutFurniture on %s %s, %s mm margin', (paper, orientation, margin) => {
  const { widthMm, heightMm } = sheetSize(paper, orientation);
  const { furniture, content } = layoutFurniture(widthMm, heightMm, margin);
  const printable = { x: margin, y: margin, width: widthMm - 2 * margin, height: heightMm - 2 * margin };
  const items = Object.entries(furniture);

  it('keeps every rect in the printable area, apart, and 3 mm clear of the content', () => {
    expect(inside(printable, content)).toBe(true);
    for (const [name, r] of items) {
      expect(inside(printable, r), name).toBe(true);
      expect(near(r, content, FURNITURE_GAP_MM), name).toBe(false);
    }
    for (const [i, [a, ra]] of items.entries()) for (const [b, rb] of items.slice(i + 1)) expect(near(ra, rb), `${a} / ${b}`).toBe(false);
  });

  it('sizes the rulers for 100 mm and 4 in', () => {
    // 4 in = 101.6 mm (NIST SP 811); the brief asks for at least 104 mm and about 12 mm.
    expect(furniture.rulerX.width).toBeGreaterThanOrEqual(104);
    expect(furniture.rulerX.height).toBeCloseTo(12, 9);
    expect(furniture.rulerY.height).toBeGreaterThanOrEqual(104);
    expect(furniture.rulerY.width).toBeCloseTo(12, 9);
    // The ruler drawing starts 4 mm in (room for the unit names): 4 + 101.6 must fit.
    expect(RULER_LENGTH_MM).toBeGreaterThan(4 + 101.6);
  });

  it('puts the rulers along the bottom and the left, the check squares in the bottom band', () => {
    expect(bottom(furniture.rulerX)).toBeCloseTo(bottom(printable), 9);
    expect(furniture.rulerY.x).toBeCloseTo(printable.x, 9);
    expect(furniture.rulerY.x).toBeLessThan(content.x);
    const { checkSquares: c, rulerX: r } = furniture;
    expect(c.width).toBe(60); // a 25.4 mm and a 25 mm square side by side, with labels
    expect(c.height).toBe(28);
    const beside = c.x >= right(r) && bottom(c) === bottom(r);
    const above = bottom(c) <= r.y && c.x === r.x;
    expect(beside || above).toBe(true);
    expect(c.y).toBeGreaterThanOrEqual(bottom(content));
  });

  it('puts the title block, legend and notes above the content, the notes across the top', () => {
    for (const r of [furniture.titleBlock, furniture.drillLegend, furniture.notes]) expect(bottom(r)).toBeLessThanOrEqual(content.y);
    for (const key of ['x', 'y', 'width'] as const) expect(furniture.notes[key]).toBeCloseTo(printable[key], 9);
    expect(furniture.notes.height).toBe(10);
    expect(furniture.titleBlock).toMatchObject({ width: 70, height: 24 });
    expect(furniture.drillLegend).toMatchObject({ width: 60, height: 24 });
  });
});

describe('layoutFurniture content', () => {
  it.each(['letter', 'a4'] as const)('leaves at least 120 x 120 mm on %s portrait', (paper) => {
    const { widthMm, heightMm } = sheetSize(paper, 'portrait');
    const { content } = layoutFurniture(widthMm, heightMm, MIN_MARGIN_MM);
    expect(content.width).toBeGreaterThanOrEqual(120);
    expect(content.height).toBeGreaterThanOrEqual(120);
  });

  it('on Letter portrait is the printable area less the bands (worked arithmetic)', () => {
    // 215.9 - 2 x 12.7 = 190.5 wide less the 12 mm ruler and 3 mm gap = 175.5;
    // 279.4 - 25.4 = 254 tall less notes 10 + 3 + title 24 + 3 on top and 3 + check squares 28 below = 183.
    const { content } = layoutFurniture(215.9, 279.4, 12.7);
    expect(content.width).toBeCloseTo(175.5, 9);
    expect(content.height).toBeCloseTo(183, 9);
  });

  it('refuses a sheet too small for the furniture', () => {
    expect(() => layoutFurniture(100, 100, 12.7)).toThrow(RangeError);
    expect(() => layoutFurniture(Number.NaN, 100, 12.7)).toThrow(RangeError);
  });
});
