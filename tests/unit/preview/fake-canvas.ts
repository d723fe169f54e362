import type { Canvas2D } from '../../../src/features/preview/canvas-context.ts';

type Matrix = [number, number, number, number, number, number];

/** What one stroke or fill painted: its subpaths in device pixels and the state it used. */
export interface Paint {
  kind: 'stroke' | 'fill';
  style: string;
  /** Line width and dashes as the canvas applies them: user units times the transform's scale. */
  lineWidthPx: number;
  dashPx: number[];
  points: [number, number][];
  arcs: { cx: number; cy: number; r: number; rUser: number }[];
}

export interface TextPaint {
  text: string;
  font: string;
  align: CanvasTextAlign;
  style: string;
  matrix: Matrix;
}

/**
 * A stand-in 2D context that keeps what reaches the screen: points go through the current
 * transform as the canvas spec says (HTML, 4.12.5.1.7: path coordinates are transformed when
 * added), and widths and dashes are scaled at paint time.
 */
export class FakeCanvas implements Canvas2D {
  readonly canvas: { width: number; height: number };
  strokeStyle: Canvas2D['strokeStyle'] = '#000000';
  fillStyle: Canvas2D['fillStyle'] = '#000000';
  lineWidth = 1;
  font = '10px sans-serif';
  textAlign: CanvasTextAlign = 'start';
  readonly paints: Paint[] = [];
  readonly texts: TextPaint[] = [];
  readonly transforms: Matrix[] = [];
  readonly filledRects: { x: number; y: number; w: number; h: number; style: string }[] = [];
  private m: Matrix = [1, 0, 0, 1, 0, 0];
  private dash: number[] = [];
  private points: [number, number][] = [];
  private arcs: Paint['arcs'] = [];

  constructor(width = 800, height = 600) {
    this.canvas = { width, height };
  }

  setTransform(a: number | DOMMatrix2DInit = 1, b = 0, c = 0, d = 1, e = 0, f = 0): void {
    if (typeof a !== 'number') throw new Error('the writer passes numbers');
    this.m = [a, b, c, d, e, f];
    this.transforms.push(this.m);
  }
  beginPath(): void {
    this.points = [];
    this.arcs = [];
  }
  moveTo(x: number, y: number): void {
    this.points.push(this.apply(x, y));
  }
  lineTo(x: number, y: number): void {
    this.points.push(this.apply(x, y));
  }
  arc(x: number, y: number, r: number): void {
    const [cx, cy] = this.apply(x, y);
    this.arcs.push({ cx, cy, r: r * this.scale(), rUser: r });
  }
  rect(x: number, y: number, w: number, h: number): void {
    this.points.push(this.apply(x, y), this.apply(x + w, y + h));
  }
  closePath(): void {}
  setLineDash(segments: Iterable<number>): void {
    this.dash = [...segments];
  }
  stroke(): void {
    this.paint('stroke', String(this.strokeStyle));
  }
  fill(): void {
    this.paint('fill', String(this.fillStyle));
  }
  fillRect(x: number, y: number, w: number, h: number): void {
    this.filledRects.push({ x, y, w, h, style: String(this.fillStyle) });
  }
  fillText(text: string): void {
    this.texts.push({ text, font: this.font, align: this.textAlign, style: String(this.fillStyle), matrix: this.m });
  }

  private paint(kind: Paint['kind'], style: string): void {
    const s = this.scale();
    this.paints.push({ kind, style, lineWidthPx: this.lineWidth * s, dashPx: this.dash.map((d) => d * s), points: this.points, arcs: this.arcs });
  }
  private apply(x: number, y: number): [number, number] {
    const [a, b, c, d, e, f] = this.m;
    return [a * x + c * y + e, b * x + d * y + f];
  }
  private scale(): number {
    return Math.hypot(this.m[0], this.m[1]);
  }
}
