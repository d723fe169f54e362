import { describe, expect, it } from 'vitest';
import { drawHoleMark } from '../../../shared/print/draw-hole.ts';
import { strokes } from '../../../shared/print/draw-style.ts';
import { CanvasDrawingContext, cssColors } from '../../../src/features/preview/canvas-context.ts';
import { FakeCanvas } from './fake-canvas.ts';

describe('CanvasDrawingContext', () => {
  it('maps mm to device pixels through one transform: scale x devicePixelRatio, offset x devicePixelRatio', () => {
    const fake = new FakeCanvas(2000, 1000);
    const ctx = new CanvasDrawingContext(fake, { scale: 3, offsetX: 10, offsetY: 20 }, 2);
    ctx.line(5, 7, 105, 7, strokes.cut);
    ctx.finish();
    const [start, end] = fake.paints[0]!.points;
    // Worked arithmetic: device x = 2 * (3 * 5 + 10) = 50 and 2 * (3 * 105 + 10) = 650; y = 2 * (3 * 7 + 20) = 82.
    expect(start![0]).toBeCloseTo(50, 9);
    expect(end![0]).toBeCloseTo(650, 9);
    expect(start![1]).toBeCloseTo(82, 9);
    // Worked arithmetic: a 100 mm line at 3 px/mm and dpr 2 spans 200 * 3 = 600 device px.
    expect(end![0] - start![0]).toBeCloseTo(200 * 3, 9);
  });

  it('sets the view with a single setTransform and keeps it for shapes', () => {
    const fake = new FakeCanvas();
    const ctx = new CanvasDrawingContext(fake, { scale: 2.5, offsetX: 0, offsetY: 0 }, 1);
    ctx.circle(10, 10, 2, { stroke: strokes.hole });
    ctx.line(0, 0, 10, 0, strokes.cut);
    ctx.finish();
    expect(fake.transforms).toEqual([[2.5, 0, 0, 2.5, 0, 0]]);
  });

  it('draws circles with arc() at the true radius: a 3/16 in hole is 4.7625 mm across', () => {
    const fake = new FakeCanvas();
    const ctx = new CanvasDrawingContext(fake, { scale: 4, offsetX: 0, offsetY: 0 }, 2);
    // ASME B94.11M fractional drills: 3/16 in = 4.7625 mm (1 in = 25.4 mm exactly).
    drawHoleMark(ctx, 30, 40, 4.7625);
    ctx.finish();
    const arcs = fake.paints.flatMap((p) => p.arcs);
    const hole = arcs.find((a) => a.rUser > 1)!;
    expect(hole.rUser).toBe(4.7625 / 2);
    // Worked arithmetic: radius 2.38125 mm x 4 px/mm x dpr 2 = 19.05 device px, centred at (240, 320).
    expect(hole.r).toBeCloseTo(19.05, 9);
    expect([hole.cx, hole.cy]).toEqual([240, 320]);
  });

  it('gives dashes and widths in mm, so they scale with the zoom', () => {
    for (const scale of [2, 8]) {
      const fake = new FakeCanvas();
      const ctx = new CanvasDrawingContext(fake, { scale, offsetX: 0, offsetY: 0 }, 2);
      ctx.line(0, 10, 100, 10, strokes.guide);
      ctx.line(0, 20, 100, 20, strokes.edge);
      ctx.finish();
      const [guide, edge] = fake.paints;
      // Worked arithmetic: the guide's 1.5 mm dash and 1 mm gap (draw-style.ts) times scale x dpr 2.
      expect(guide!.dashPx).toEqual([1.5 * scale * 2, 1 * scale * 2]);
      expect(edge!.dashPx).toEqual([]);
      // Worked arithmetic: the 0.5 mm edge line is 0.5 x scale x 2 device px.
      expect(edge!.lineWidthPx).toBeCloseTo(0.5 * scale * 2, 9);
    }
  });

  it('keeps hairlines at least one device pixel wide when zoomed far out', () => {
    const fake = new FakeCanvas();
    const ctx = new CanvasDrawingContext(fake, { scale: 0.5, offsetX: 0, offsetY: 0 }, 1);
    ctx.line(0, 0, 100, 0, strokes.cross);
    ctx.finish();
    // Worked arithmetic: 0.15 mm x 0.5 px/mm = 0.075 px, raised to the 1 px floor.
    expect(fake.paints[0]!.lineWidthPx).toBeCloseTo(1, 9);
  });

  it('sets text in IBM Plex Sans at the mm size in device pixels, turned counter-clockwise', () => {
    const fake = new FakeCanvas();
    const ctx = new CanvasDrawingContext(fake, { scale: 3, offsetX: 5, offsetY: 0 }, 2);
    ctx.text(10, 20, 'Start at the seam', { sizeMm: 2.5, weight: 'bold', anchor: 'middle', rotateDeg: 90 });
    const text = fake.texts[0]!;
    // Worked arithmetic: 2.5 mm x 3 px/mm x dpr 2 = 15 device px; bold is drawn at 600 as in the PDF.
    expect(text.font).toBe("600 15px 'IBM Plex Sans', sans-serif");
    expect(text.align).toBe('center');
    const [a, b, c, d, e, f] = text.matrix;
    // Turned 90 degrees counter-clockwise on a y-down screen the baseline runs up: (0, -1).
    expect([a, b, c, d].map((n) => Math.round(n * 1e9) / 1e9 + 0)).toEqual([0, -1, 1, 0]);
    // Worked arithmetic: the anchor lands at 2 x (3 x 10 + 5) = 70, 2 x 3 x 20 = 120.
    expect([e, f]).toEqual([70, 120]);
    // The view transform is back in place for the next shape.
    expect(fake.transforms.at(-1)).toEqual([6, 0, 0, 6, 10, 0]);
  });

  it('draws text smaller than 4 device px at 4 px under a local scale, and skips what no one could read', () => {
    const fake = new FakeCanvas();
    const ctx = new CanvasDrawingContext(fake, { scale: 1, offsetX: 0, offsetY: 0 }, 1);
    ctx.text(0, 10, 'tiny', { sizeMm: 2 });
    ctx.text(0, 10, 'gone', { sizeMm: 0.4 });
    expect(fake.texts.map((t) => t.text)).toEqual(['tiny']);
    expect(fake.texts[0]!.font).toBe("400 4px 'IBM Plex Sans', sans-serif");
    // Worked arithmetic: 2 mm at 1 px/mm is 2 px, so 4 px glyphs are scaled by 2 / 4 = 0.5.
    expect(fake.texts[0]!.matrix[0]).toBeCloseTo(0.5, 9);
  });

  it('changes the font when only the weight changes', () => {
    const fake = new FakeCanvas();
    const ctx = new CanvasDrawingContext(fake, { scale: 1, offsetX: 0, offsetY: 0 }, 1);
    ctx.text(0, 10, 'a', { sizeMm: 5.2 });
    ctx.text(0, 10, 'b', { sizeMm: 5, weight: 'bold' });
    expect(fake.texts.map((t) => t.font)).toEqual(["400 5.2px 'IBM Plex Sans', sans-serif", "600 5px 'IBM Plex Sans', sans-serif"]);
  });

  it('uses the palette colours, the same RGB as the PDF', () => {
    // drawing-context.ts palette: ink 0.1 -> round(25.5) = 26 = 0x1a; accent 0.7, 0.3, 0.11 -> 179, 77, 28.
    expect(cssColors.ink).toBe('#1a1a1a');
    expect(cssColors.accent).toBe('#b34d1c');
    expect(cssColors.paper).toBe('#ffffff');
  });

  it('batches by style in the order each was first used, and paints batches before text', () => {
    const fake = new FakeCanvas();
    const ctx = new CanvasDrawingContext(fake, { scale: 2, offsetX: 0, offsetY: 0 }, 1);
    ctx.line(0, 5, 100, 5, strokes.guide);
    for (let i = 0; i < 10; i++) drawHoleMark(ctx, 10 + i * 8, 5, 3);
    ctx.text(0, 20, 'Row 1', { sizeMm: 2.8 });
    ctx.finish();
    // One guide stroke, one hole-circle stroke, one crosshair stroke, one dot fill: 4 paints, not 41.
    expect(fake.paints.map((p) => `${p.kind} ${p.arcs.length}`)).toEqual(['stroke 0', 'stroke 10', 'stroke 0', 'fill 10']);
    expect(fake.texts).toHaveLength(1);
  });

  it('leaves out circles and lines wholly off the canvas', () => {
    const fake = new FakeCanvas(200, 100);
    const ctx = new CanvasDrawingContext(fake, { scale: 1, offsetX: 0, offsetY: 0 }, 1);
    ctx.circle(50, 50, 3, { stroke: strokes.hole });
    ctx.circle(500, 50, 3, { stroke: strokes.hole });
    ctx.line(-50, -50, -40, -40, strokes.cut);
    ctx.finish();
    expect(fake.paints.flatMap((p) => p.arcs)).toHaveLength(1);
    expect(fake.paints.flatMap((p) => p.points)).toHaveLength(1);
  });

  it('paints paper fills at once, over what came before', () => {
    const fake = new FakeCanvas();
    const ctx = new CanvasDrawingContext(fake, { scale: 1, offsetX: 0, offsetY: 0 }, 1);
    ctx.line(0, 5, 50, 5, strokes.cut);
    ctx.rect(0, 0, 20, 20, { fill: 'paper', stroke: strokes.frame });
    ctx.finish();
    expect(fake.paints.map((p) => `${p.kind} ${p.style}`)).toEqual([`stroke ${cssColors.ink}`, `fill ${cssColors.paper}`, `stroke ${cssColors.soft}`]);
  });
});
