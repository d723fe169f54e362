import type { PDFFont } from 'pdf-lib';
import { palette } from '../../../shared/drawing/drawing-context.ts';
import { isPrintableCharacter } from '../../../shared/print/printable-text.ts';
import type { DrawingContext, InkColor, ShapeStyle, Stroke, TextStyle } from '../../../shared/drawing/drawing-context.ts';
import { AsciiBuffer } from './ascii-buffer.ts';
import type { FontWeight, PlexFonts } from './fonts.ts';

/** 1 in = 72 pt = 25.4 mm (ISO 32000-1, 8.3.2.3: default user space unit is 1/72 in). */
export const PT_PER_MM = 72 / 25.4;

/** Bezier handle length for a quarter circle, 4/3 (sqrt 2 - 1) (common practice, worked arithmetic). */
const KAPPA = 0.5522847498;

/**
 * mm to at most 3 decimals (1 um: far below what prints, and short in the file). Built from
 * integers because double-to-string is the slowest step of writing a page (measured ~2x).
 */
export function fmt(n: number): string {
  // A NaN in a content stream would silently break the page: fail where it came from instead.
  if (!Number.isFinite(n)) throw new Error(`Cannot draw at ${n} mm`);
  const i = Math.round(n * 1000);
  if (i % 1000 === 0) return String(i / 1000);
  const abs = i < 0 ? -i : i;
  const whole = Math.floor(abs / 1000);
  let frac = abs - whole * 1000;
  let digits = 3;
  while (frac % 10 === 0) {
    frac /= 10;
    digits--;
  }
  return `${i < 0 ? '-' : ''}${whole}.${String(frac).padStart(digits, '0')}`;
}

const COLORS = Object.fromEntries(
  Object.entries(palette).map(([name, rgb]) => [name, rgb.map((c) => String(Math.round(c * 1000) / 1000)).join(' ')]),
) as Record<InkColor, string>;

/**
 * One page's drawing as raw PDF operators (ISO 32000-1, 8.5 paths, 9.4 text) in one buffer.
 * The page's first `cm` (see `pageMatrix`) maps sheet mm with y down to PDF points with y up, so
 * everything here is written in sheet mm as given; text matrices undo the flip for glyphs.
 */
export class PdfPageContext implements DrawingContext {
  private readonly content = new AsciiBuffer();
  private strokeColor = '';
  private fillColor = '';
  private lineWidth = -1;
  private dash = '[] 0';
  private readonly circlePaths = new Map<number, string>();
  /** The stroke of the line path being built, if any; it is stroked before anything else is drawn. */
  private openLines: Stroke | null = null;
  private lastStroke: Stroke | null = null;

  constructor(
    private readonly fonts: PlexFonts,
    /** Returns the page's resource name for a font, registering it on first use. */
    private readonly useFont: (font: PDFFont) => string,
    /** Operands of the page's `cm`, from `pageMatrix`. */
    matrix: string,
  ) {
    this.append(`q ${matrix} cm\n`);
  }

  line(x1: number, y1: number, x2: number, y2: number, stroke: Stroke): void {
    // Runs of lines in one style (ruler ticks, crosshairs) share one path and one S.
    if (this.openLines !== stroke) {
      this.flushLines();
      this.setStroke(stroke);
      this.openLines = stroke;
    }
    this.content.append(`${fmt(x1)} ${fmt(y1)} m ${fmt(x2)} ${fmt(y2)} l\n`);
  }

  polyline(points: readonly (readonly [number, number])[], style: ShapeStyle & { closed?: boolean }): void {
    const [first, ...rest] = points;
    if (!first) return;
    let path = `${fmt(first[0])} ${fmt(first[1])} m`;
    for (const [x, y] of rest) path += ` ${fmt(x)} ${fmt(y)} l`;
    this.paint(style.closed ? `${path} h` : path, style);
  }

  rect(x: number, y: number, width: number, height: number, style: ShapeStyle): void {
    this.paint(`${fmt(x)} ${fmt(y)} ${fmt(width)} ${fmt(height)} re`, style);
  }

  circle(cx: number, cy: number, r: number, style: ShapeStyle): void {
    // Drawn about (0, 0) under a translation: a template's holes share a few radii, so the path
    // text repeats exactly and flate stores it once (about a third of the file size per hole).
    this.paint(`q 1 0 0 1 ${fmt(cx)} ${fmt(cy)} cm ${this.circlePath(r)}`, style, ' Q');
  }

  text(x: number, y: number, words: string, style: TextStyle): void {
    if (words.length === 0) return;
    // Composed (NFC): "S" + combining acute prints as the one glyph "Ś" the fonts carry, placed by
    // the font's designer rather than stacked by width. Kept as typed where composing finds no glyph.
    const composed = words.normalize('NFC');
    const text = composed === words || [...composed].every((char) => isPrintableCharacter(char)) ? composed : words;
    const runs = splitRuns(this.fonts, style.weight ?? 'regular', text);
    const size = style.sizeMm;
    const shift = style.anchor === 'middle' ? 0.5 : style.anchor === 'end' ? 1 : 0;
    const rad = ((style.rotateDeg ?? 0) * Math.PI) / 180;
    const cos = Math.cos(rad);
    const sin = Math.sin(rad);
    // The text runs along (cos, -sin) in y-down sheet space: counter-clockwise on paper.
    const back = shift === 0 ? 0 : runs.reduce((sum, run) => sum + measureText(run.font, run.text), 0) * size * shift;
    const ox = x - back * cos;
    const oy = y + back * sin;
    const matrix = [size * cos, -size * sin, -size * sin, -size * cos, ox, oy].map(fmt).join(' ');
    this.setFill(style.color);
    // ISO 32000-1, 9.4.3: each Tj moves the text position on by the run's widths, so the next
    // run in another font starts where this one ended.
    let operators = `BT ${matrix} Tm`;
    for (const run of runs) operators += ` /${this.useFont(run.font)} 1 Tf ${encodeText(run.font, run.text)} Tj`;
    this.append(`${operators} ET\n`);
  }

  /** Closes the page's graphics state and returns its content stream, uncompressed. */
  finish(): Uint8Array {
    this.append('Q\n');
    return this.content.view();
  }

  private append(operators: string): void {
    this.flushLines();
    this.content.append(operators);
  }

  private flushLines(): void {
    if (!this.openLines) return;
    this.openLines = null;
    this.content.append('S\n');
  }

  /** Colours and widths are set before `path`, which may open a `q` that `after` closes. */
  private paint(path: string, style: ShapeStyle, after = ''): void {
    const { stroke, fill } = style;
    if (!stroke && !fill) return;
    if (stroke) this.setStroke(stroke);
    if (fill) this.setFill(fill);
    // ISO 32000-1, 8.5.3.1: S strokes, f fills (non-zero winding), B fills then strokes.
    this.append(`${path} ${stroke && fill ? 'B' : stroke ? 'S' : 'f'}${after}\n`);
  }

  /** A circle of radius r about (0, 0): four quarter Beziers from the right-hand point. */
  private circlePath(r: number): string {
    let path = this.circlePaths.get(r);
    if (path === undefined) {
      const [a, b] = [fmt(r), fmt(r * KAPPA)];
      const [na, nb] = [fmt(-r), fmt(-r * KAPPA)];
      path =
        `${a} 0 m ${a} ${b} ${b} ${a} 0 ${a} c ${nb} ${a} ${na} ${b} ${na} 0 c ` +
        `${na} ${nb} ${nb} ${na} 0 ${na} c ${b} ${na} ${a} ${nb} ${a} 0 c h`;
      this.circlePaths.set(r, path);
    }
    return path;
  }

  private setStroke(stroke: Stroke): void {
    // Kit styles are shared constants: the same object means the same state.
    if (stroke === this.lastStroke) return;
    this.lastStroke = stroke;
    const color = COLORS[stroke.color ?? 'ink'];
    if (color !== this.strokeColor) {
      this.strokeColor = color;
      this.append(`${color} RG\n`);
    }
    if (stroke.widthMm !== this.lineWidth) {
      this.lineWidth = stroke.widthMm;
      this.append(`${fmt(stroke.widthMm)} w\n`);
    }
    const dashMm = stroke.dashMm ?? [];
    // ISO 32000-1, 8.4.3.6: an all-zero dash array is an error; treat it as solid.
    const dash = dashMm.some((d) => d > 0) ? `[${dashMm.map(fmt).join(' ')}] 0` : '[] 0';
    if (dash !== this.dash) {
      this.dash = dash;
      this.append(`${dash} d\n`);
    }
  }

  private setFill(fill: InkColor | undefined): void {
    const color = COLORS[fill ?? 'ink'];
    if (color !== this.fillColor) {
      this.fillColor = color;
      this.append(`${color} rg\n`);
    }
  }
}

/**
 * The `cm` operands that turn sheet mm (origin top-left, y down) into PDF points (origin
 * bottom-left, y up): pdfY = pageHeight - y. scaleX/scaleY stretch the drawing about the sheet's
 * top-left corner (printer pre-compensation), so circles become the ellipses the printer undoes.
 */
export function pageMatrix(heightPt: number, scaleX: number, scaleY: number): string {
  const f = (n: number): string => String(Math.round(n * 1e6) / 1e6);
  return `${f(PT_PER_MM * scaleX)} 0 0 ${f(-PT_PER_MM * scaleY)} 0 ${f(heightPt)}`;
}

/**
 * A string as runs of characters in one font each: every character goes to the first font that
 * prints it (a Greek or Cyrillic word inside a Latin label switches font and back), so each run's
 * glyphs and widths come from the font that draws them.
 */
function splitRuns(fonts: PlexFonts, weight: FontWeight, text: string): { font: PDFFont; text: string }[] {
  const runs: { font: PDFFont; text: string }[] = [];
  let last: { font: PDFFont; text: string } | undefined;
  for (const char of text) {
    const font = fonts.fontFor(weight, char);
    if (last && last.font === font) last.text += char;
    else runs.push((last = { font, text: char }));
  }
  return runs;
}

/**
 * Kits print the same short strings again and again (ruler numbers, drill labels), and fontkit's
 * glyph lookup is the costly part of text. Shaping is off (fonts.ts), so a string's glyphs are
 * exactly its characters' glyphs: each font encodes and measures a character once, and a string
 * is the concatenation of its characters (which also registers every glyph in the subset).
 */
const encoded = new WeakMap<PDFFont, Map<string, { hex: string; widthAt1: number }>>();

function lookupChar(font: PDFFont, cache: Map<string, { hex: string; widthAt1: number }>, char: string) {
  let entry = cache.get(char);
  if (!entry) {
    const hex = font.encodeText(char).toString();
    entry = { hex: hex.slice(1, -1), widthAt1: font.widthOfTextAtSize(char, 1) };
    cache.set(char, entry);
  }
  return entry;
}

function lookup(font: PDFFont, text: string): { hex: string; widthAt1: number } {
  let cache = encoded.get(font);
  if (!cache) encoded.set(font, (cache = new Map()));
  let hex = '';
  let widthAt1 = 0;
  for (const char of text) {
    const entry = lookupChar(font, cache, char);
    hex += entry.hex;
    widthAt1 += entry.widthAt1;
  }
  return { hex: `<${hex}>`, widthAt1 };
}

const encodeText = (font: PDFFont, text: string) => lookup(font, text).hex;
const measureText = (font: PDFFont, text: string) => lookup(font, text).widthAt1;
