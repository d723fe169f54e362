import { FONT_FAMILY, palette, type DrawingContext, type InkColor, type ShapeStyle, type Stroke, type TextStyle } from '../../../shared/drawing/drawing-context.ts';
import { CIRCLE, LINE, POLY, RECT, replayOps, type Batch, type Canvas2D } from './path-ops.ts';
import type { ViewTransform } from './view-transform.ts';

export type { Canvas2D } from './path-ops.ts';

const hex = (c: number) => Math.round(c * 255).toString(16).padStart(2, '0');
/** Palette colours as CSS hex, the same RGB the PDF writer prints. */
export const cssColors = Object.fromEntries(Object.entries(palette).map(([name, [r, g, b]]) => [name, `#${hex(r)}${hex(g)}${hex(b)}`])) as Record<InkColor, string>;

/** Hairlines stay at least one device pixel wide on screen, or thin guides vanish when zoomed out. */
const MIN_LINE_DEVICE_PX = 1;
/** Glyphs are rasterised at least this big and scaled down, as tiny canvas font sizes may be clamped. */
const MIN_FONT_DEVICE_PX = 4;
/** Text smaller than this on screen is unreadable and skipped. */
const SKIP_TEXT_DEVICE_PX = 0.6;
const ALIGN = { start: 'left', middle: 'center', end: 'right' } as const;
const WEIGHT = { regular: 400, bold: 600 } as const; // 600 stands in for bold, as in the PDF and the app's CSS
const NO_DASH: number[] = [];

/**
 * DrawingContext over a 2D canvas. Sheet mm go through one setTransform (CSS px per mm times
 * devicePixelRatio), so widths, radii and dashes are given in mm as they are. Strokes and ink
 * fills are batched per style and painted in the order each style was first used; text and
 * paper fills (knock-outs) paint at once, after the batches before them. Call finish() at the end.
 */
export class CanvasDrawingContext implements DrawingContext {
  private k = 1;
  private e = 0;
  private f = 0;
  private visible = { minX: 0, minY: 0, maxX: 0, maxY: 0 };
  private readonly open: Batch[] = [];
  private readonly byStroke = new WeakMap<Stroke, Batch>();
  private readonly byKey = new Map<string, Batch>();
  private lastFont = '';
  private lastFontPx = -1;
  private lastWeight = -1;

  constructor(
    private readonly ctx: Canvas2D,
    view: ViewTransform,
    dpr = 1,
  ) {
    this.setView(view, dpr);
  }

  /** Applies a view (CSS px) at a device pixel ratio; canvas state is taken as reset. */
  setView(view: ViewTransform, dpr: number): void {
    this.k = view.scale * dpr;
    this.e = view.offsetX * dpr;
    this.f = view.offsetY * dpr;
    this.ctx.setTransform(this.k, 0, 0, this.k, this.e, this.f);
    // The sheet area on screen, with 2 mm to spare for stroke widths, for skipping what is off it.
    const { width, height } = this.ctx.canvas;
    this.visible = { minX: -this.e / this.k - 2, minY: -this.f / this.k - 2, maxX: (width - this.e) / this.k + 2, maxY: (height - this.f) / this.k + 2 };
    this.lastFont = '';
    this.lastFontPx = -1;
  }

  /** Fills the whole canvas (device pixels) with a CSS colour. */
  clear(color: string): void {
    this.ctx.setTransform(1, 0, 0, 1, 0, 0);
    this.ctx.fillStyle = color;
    this.ctx.fillRect(0, 0, this.ctx.canvas.width, this.ctx.canvas.height);
    this.ctx.setTransform(this.k, 0, 0, this.k, this.e, this.f);
  }

  line(x1: number, y1: number, x2: number, y2: number, stroke: Stroke): void {
    const v = this.visible;
    if (Math.max(x1, x2) < v.minX || Math.min(x1, x2) > v.maxX || Math.max(y1, y2) < v.minY || Math.min(y1, y2) > v.maxY) return;
    this.strokeBatch(stroke).ops.push(LINE, x1, y1, x2, y2);
  }

  polyline(points: readonly (readonly [number, number])[], style: ShapeStyle & { closed?: boolean }): void {
    if (points.length === 0) return;
    this.shape(style, (ops) => {
      ops.push(POLY, points.length, style.closed ? 1 : 0);
      for (const [x, y] of points) ops.push(x, y);
    });
  }

  rect(x: number, y: number, width: number, height: number, style: ShapeStyle): void {
    this.shape(style, (ops) => ops.push(RECT, x, y, width, height));
  }

  circle(cx: number, cy: number, r: number, style: ShapeStyle): void {
    const v = this.visible;
    if (cx + r < v.minX || cx - r > v.maxX || cy + r < v.minY || cy - r > v.maxY) return;
    if (style.fill && !style.stroke && style.fill !== 'paper') this.fillBatch(style.fill).ops.push(CIRCLE, cx, cy, r);
    else if (style.stroke && !style.fill) this.strokeBatch(style.stroke).ops.push(CIRCLE, cx, cy, r);
    else this.shape(style, (ops) => ops.push(CIRCLE, cx, cy, r));
  }

  text(x: number, y: number, text: string, style: TextStyle): void {
    const sizePx = style.sizeMm * this.k;
    if (text.length === 0 || sizePx < SKIP_TEXT_DEVICE_PX) return;
    this.flush();
    const drawn = Math.max(sizePx, MIN_FONT_DEVICE_PX);
    const weight = WEIGHT[style.weight ?? 'regular'];
    // Glyphs are set in device pixels under a local transform: rotated counter-clockwise on
    // screen (y down), and scaled down when drawn bigger than asked.
    const s = sizePx / drawn;
    const rad = ((style.rotateDeg ?? 0) * Math.PI) / 180;
    const cos = Math.cos(rad) * s;
    const sin = Math.sin(rad) * s;
    const ctx = this.ctx;
    ctx.setTransform(cos, -sin, sin, cos, this.k * x + this.e, this.k * y + this.f);
    if (drawn !== this.lastFontPx || weight !== this.lastWeight) {
      this.lastFontPx = drawn;
      this.lastWeight = weight;
      this.lastFont = `${weight} ${drawn}px '${FONT_FAMILY}', sans-serif`;
    }
    ctx.font = this.lastFont;
    ctx.textAlign = ALIGN[style.anchor ?? 'start'];
    ctx.fillStyle = cssColors[style.color ?? 'ink'];
    ctx.fillText(text, 0, 0);
    ctx.setTransform(this.k, 0, 0, this.k, this.e, this.f);
  }

  /** Paints every batched call; the drawing is complete on the canvas after this. */
  finish(): void {
    this.flush();
  }

  private flush(): void {
    for (const batch of this.open) {
      this.paint(batch);
      batch.ops.length = 0;
    }
    this.open.length = 0;
  }

  private paint(batch: Batch): void {
    const ctx = this.ctx;
    ctx.beginPath();
    replayOps(ctx, batch.ops);
    if (batch.fill) {
      ctx.fillStyle = batch.color;
      ctx.fill();
    } else {
      ctx.strokeStyle = batch.color;
      ctx.lineWidth = Math.max(batch.widthMm, MIN_LINE_DEVICE_PX / this.k);
      ctx.setLineDash(batch.dash);
      ctx.stroke();
    }
  }

  /** A shape with both paints, or a paper knock-out: painted now, in order. */
  private shape(style: ShapeStyle, trace: (ops: number[]) => void): void {
    if (style.fill && !style.stroke && style.fill !== 'paper') return trace(this.fillBatch(style.fill).ops);
    if (style.stroke && !style.fill) return trace(this.strokeBatch(style.stroke).ops);
    if (!style.fill && !style.stroke) return;
    this.flush();
    const ops: number[] = [];
    trace(ops);
    if (style.fill) this.paint({ fill: true, color: cssColors[style.fill], widthMm: 0, dash: NO_DASH, ops });
    if (style.stroke) this.paint(this.describeStroke(style.stroke, ops));
  }

  private strokeBatch(stroke: Stroke): Batch {
    let batch = this.byStroke.get(stroke);
    if (!batch) {
      const key = `s ${stroke.color ?? 'ink'} ${stroke.widthMm} ${stroke.dashMm?.join(' ') ?? ''}`;
      batch = this.byKey.get(key) ?? this.describeStroke(stroke, []);
      this.byKey.set(key, batch);
      this.byStroke.set(stroke, batch);
    }
    if (batch.ops.length === 0) this.open.push(batch);
    return batch;
  }

  private fillBatch(color: InkColor): Batch {
    const key = `f ${color}`;
    let batch = this.byKey.get(key);
    if (!batch) this.byKey.set(key, (batch = { fill: true, color: cssColors[color], widthMm: 0, dash: NO_DASH, ops: [] }));
    if (batch.ops.length === 0) this.open.push(batch);
    return batch;
  }

  private describeStroke(stroke: Stroke, ops: number[]): Batch {
    const dash = stroke.dashMm?.some((d) => d > 0) ? [...stroke.dashMm] : NO_DASH;
    return { fill: false, color: cssColors[stroke.color ?? 'ink'], widthMm: stroke.widthMm, dash, ops };
  }
}
