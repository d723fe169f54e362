import { palette, type InkColor } from '../../../shared/drawing/drawing-context.ts';

/**
 * How numbers, colours and text are written into SVG: at most 4 decimals (0.0001 mm, far finer
 * than any printer), never in exponent notation, and only characters XML 1.0 allows.
 */

/** A coordinate or length in mm, e.g. 2.38125 -> "2.3813", 10 -> "10", -0.00001 -> "0". */
export function formatNumber(value: number): string {
  // toFixed switches to exponent notation from 1e21 (ECMA-262 Number.prototype.toFixed).
  if (!Number.isFinite(value) || Math.abs(value) >= 1e21) {
    throw new RangeError(`SVG writer: ${value} is not a finite drawing number`);
  }
  const fixed = value.toFixed(4);
  const trimmed = fixed.replace(/0+$/, '').replace(/\.$/, '');
  return trimmed === '-0' ? '0' : trimmed;
}

/** A length that may not be negative (SVG treats a negative radius, width or dash as an error). */
export function formatLength(value: number, what: string): string {
  if (value < 0) throw new RangeError(`SVG writer: ${what} ${value} is negative`);
  return formatNumber(value);
}

/** A palette colour as #rrggbb. */
export function formatColor(color: InkColor): string {
  const channels = palette[color].map((channel) => {
    const byte = Math.round(Math.min(1, Math.max(0, channel)) * 255);
    return byte.toString(16).padStart(2, '0');
  });
  return `#${channels.join('')}`;
}

// Characters outside the XML 1.0 Char production (W3C XML 1.0, section 2.2) cannot even be
// escaped, so they are dropped; & < > are escaped by svgdom's serialiser.
const NOT_XML_CHAR = /[^\t\n\r\u0020-\uD7FF\uE000-\uFFFD\u{10000}-\u{10FFFF}]/gu;

/** Text safe to put in an XML text node. */
export function cleanXmlText(text: string): string {
  return text.replace(NOT_XML_CHAR, '');
}
