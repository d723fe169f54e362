import { SVG, withWindow, type Dom } from '@svgdotjs/svg.js';
import { createSVGWindow } from 'svgdom';
import {
  FONT_FAMILY,
  type DrawingContext,
  type ShapeStyle,
  type Stroke,
  type TextStyle,
} from '../../../shared/drawing/drawing-context.ts';
import { cleanXmlText, formatColor, formatLength, formatNumber } from './svg-format.ts';

/**
 * A true-scale SVG sheet behind the shared DrawingContext. The root is sized in mm with a
 * viewBox of the same numbers, so one user unit is one mm and every coordinate is written as
 * given. Circles stay <circle> elements so cutters and drawing programs see real holes.
 */

export interface SvgSheetOptions {
  title?: string;
  /** Printer-profile pre-compensation: the whole drawing is scaled by these factors. */
  transform?: { scaleX: number; scaleY: number };
}

export interface SvgSheet {
  context: DrawingContext;
  /** The standalone SVG document so far, with its XML declaration. */
  toString(): string;
}

const XML_DECLARATION = '<?xml version="1.0" encoding="UTF-8"?>';
const SVG_FONT_FAMILY = `${FONT_FAMILY}, sans-serif`;
// IBM Plex Sans SemiBold; CSS font-weight 600 is "Semi Bold" (CSS Fonts Level 4, font-weight).
const BOLD_WEIGHT = '600';
const DEFAULT_TITLE = 'Canwright template';

type Attributes = Record<string, string>;

export function createSvgSheet(widthMm: number, heightMm: number, options: SvgSheetOptions = {}): SvgSheet {
  const width = formatPositive(widthMm, 'sheet width');
  const height = formatPositive(heightMm, 'sheet height');
  // A fresh window per sheet: sheets share no DOM state, and svg.js's global window is only
  // swapped in (withWindow) for the moment an element is made, so other users are unaffected.
  const window = createSVGWindow();
  const root = withWindow(window, () => SVG(window.document.documentElement));
  root.attr({ width: `${width}mm`, height: `${height}mm`, viewBox: `0 0 ${width} ${height}` });

  const add = (parent: Dom, name: string, attributes: Attributes): Dom =>
    withWindow(window, () => parent.element(name, attributes) as unknown as Dom);

  add(root, 'title', {}).words(cleanXmlText(options.title ?? DEFAULT_TITLE));
  const content = options.transform ? add(root, 'g', { transform: formatScale(options.transform) }) : root;

  const context: DrawingContext = {
    line(x1, y1, x2, y2, stroke) {
      add(content, 'line', {
        x1: formatNumber(x1),
        y1: formatNumber(y1),
        x2: formatNumber(x2),
        y2: formatNumber(y2),
        ...strokeAttributes(stroke),
      });
    },
    polyline(points, style) {
      const list = points.map(([x, y]) => `${formatNumber(x)},${formatNumber(y)}`).join(' ');
      add(content, style.closed ? 'polygon' : 'polyline', { points: list, ...shapeAttributes(style) });
    },
    rect(x, y, w, h, style) {
      // Canvas and PDF accept a negative size (drawn the other way); SVG does not, so normalise.
      add(content, 'rect', {
        x: formatNumber(Math.min(x, x + w)),
        y: formatNumber(Math.min(y, y + h)),
        width: formatNumber(Math.abs(w)),
        height: formatNumber(Math.abs(h)),
        ...shapeAttributes(style),
      });
    },
    circle(cx, cy, r, style) {
      add(content, 'circle', {
        cx: formatNumber(cx),
        cy: formatNumber(cy),
        r: formatLength(r, 'radius'),
        ...shapeAttributes(style),
      });
    },
    text(x, y, text, style) {
      add(content, 'text', textAttributes(x, y, style)).words(cleanXmlText(text));
    },
  };

  return {
    context,
    toString: () => `${XML_DECLARATION}\n${withWindow(window, () => root.svg())}\n`,
  };
}

function formatPositive(value: number, what: string): string {
  if (!(value > 0)) throw new RangeError(`SVG writer: ${what} ${value} must be positive`);
  return formatNumber(value);
}

function formatScale(transform: { scaleX: number; scaleY: number }): string {
  return `scale(${formatPositive(transform.scaleX, 'scaleX')} ${formatPositive(transform.scaleY, 'scaleY')})`;
}

function strokeAttributes(stroke: Stroke): Attributes {
  const attributes: Attributes = {
    stroke: formatColor(stroke.color ?? 'ink'),
    'stroke-width': formatLength(stroke.widthMm, 'stroke width'),
  };
  if (stroke.dashMm && stroke.dashMm.length > 0) {
    attributes['stroke-dasharray'] = stroke.dashMm.map((dash) => formatLength(dash, 'dash')).join(' ');
  }
  return attributes;
}

function shapeAttributes(style: ShapeStyle): Attributes {
  return {
    fill: style.fill ? formatColor(style.fill) : 'none',
    ...(style.stroke ? strokeAttributes(style.stroke) : {}),
  };
}

function textAttributes(x: number, y: number, style: TextStyle): Attributes {
  // font-size is unitless on purpose: in user units it is mm, whereas "3mm" would be CSS mm
  // (3.78 user units each) and come out 3.78 times too large under this viewBox.
  const attributes: Attributes = {
    x: formatNumber(x),
    y: formatNumber(y),
    'font-family': SVG_FONT_FAMILY,
    'font-size': formatLength(style.sizeMm, 'font size'),
    'text-anchor': style.anchor ?? 'start',
    fill: formatColor(style.color ?? 'ink'),
  };
  if (style.weight === 'bold') attributes['font-weight'] = BOLD_WEIGHT;
  // Counter-clockwise on paper is a negative angle in SVG's y-down frame (SVG 1.1, 7.6 rotate).
  if (style.rotateDeg) {
    attributes.transform = `rotate(${formatNumber(-style.rotateDeg)} ${formatNumber(x)} ${formatNumber(y)})`;
  }
  return attributes;
}
