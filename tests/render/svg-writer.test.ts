import { createDocument, HTMLParser } from 'svgdom';
import { describe, expect, it } from 'vitest';
import { createSvgSheet } from '../../server/render/svg/svg-writer.ts';

/** Parses with svgdom's strict XML parser (sax underneath); throws on malformed XML. */
function parseXml(xml: string): Document {
  const doc = createDocument(null, '', null);
  HTMLParser(xml, doc);
  return doc;
}

function rootOf(doc: Document): Element {
  const root = doc.documentElement;
  if (!root) throw new Error('no root element');
  return root;
}

function only(doc: Document, selector: string): Element {
  const found = doc.querySelectorAll(selector);
  expect(found.length).toBe(1);
  return found[0] as Element;
}

function numberAttr(element: Element, name: string): number {
  return Number(element.getAttribute(name));
}

const stroke = { widthMm: 0.25 };

describe('createSvgSheet: the sheet', () => {
  it.each([
    // ANSI/ASME Y14.1: Letter is 8.5 x 11 in = 215.9 x 279.4 mm (x 25.4, worked arithmetic)
    { name: 'Letter', width: 215.9, height: 279.4 },
    // ISO 216: A4 is 210 x 297 mm
    { name: 'A4', width: 210, height: 297 },
  ])('sizes $name in mm with a viewBox of one unit per mm', ({ width, height }) => {
    const xml = createSvgSheet(width, height).toString();
    expect(xml.startsWith('<?xml version="1.0" encoding="UTF-8"?>')).toBe(true);
    const root = rootOf(parseXml(xml));
    expect(root.localName).toBe('svg');
    expect(root.getAttribute('xmlns')).toBe('http://www.w3.org/2000/svg'); // SVG 1.1 namespace
    expect(root.getAttribute('width')).toBe(`${width}mm`);
    expect(root.getAttribute('height')).toBe(`${height}mm`);
    expect(root.getAttribute('viewBox')).toBe(`0 0 ${width} ${height}`);
  });

  it('has an escaped title as the first child', () => {
    const doc = parseXml(createSvgSheet(210, 297, { title: 'Kit <1> & 2' }).toString());
    const first = rootOf(doc).firstElementChild;
    expect(first?.localName).toBe('title');
    expect(first?.textContent).toBe('Kit <1> & 2');
  });

  it('wraps the drawing in the printer-profile scale, and only when asked', () => {
    const scaled = createSvgSheet(210, 297, { transform: { scaleX: 1.0125, scaleY: 0.9975 } });
    scaled.context.circle(10, 10, 1, { stroke });
    const group = only(parseXml(scaled.toString()), 'g');
    expect(group.getAttribute('transform')).toBe('scale(1.0125 0.9975)');
    expect(group.querySelectorAll('circle').length).toBe(1);

    const plain = createSvgSheet(210, 297);
    plain.context.circle(10, 10, 1, { stroke });
    expect(parseXml(plain.toString()).querySelectorAll('g').length).toBe(0);
  });

  it('refuses a sheet with no area', () => {
    expect(() => createSvgSheet(0, 297)).toThrow(RangeError);
    expect(() => createSvgSheet(210, Number.NaN)).toThrow(RangeError);
  });
});

describe('createSvgSheet: shapes', () => {
  it('writes a hole as a real circle with its exact centre and radius', () => {
    const sheet = createSvgSheet(210, 297);
    // 3/16 in drill: r = 3/32 in = 3 x 25.4 / 32 = 2.38125 mm (worked arithmetic)
    sheet.context.circle(37.5, 42.25, 2.38125, { stroke });
    const circle = only(parseXml(sheet.toString()), 'circle');
    expect(circle.getAttribute('cx')).toBe('37.5');
    expect(circle.getAttribute('cy')).toBe('42.25');
    const r = circle.getAttribute('r') ?? '';
    expect(r).toMatch(/^\d+\.\d{1,4}$/); // at most 4 decimals, as the brief asks
    // Rounding to 4 decimals moves a value by at most 0.00005 (worked arithmetic)
    expect(Math.abs(Number(r) - 2.38125)).toBeLessThanOrEqual(0.00005 + 1e-12);
    expect(circle.getAttribute('fill')).toBe('none');
    expect(circle.getAttribute('stroke-width')).toBe('0.25');
  });

  it('keeps the coordinates of lines, rects and polylines', () => {
    const sheet = createSvgSheet(210, 297);
    sheet.context.line(12.7, 25.4, 112.7, 25.4, { widthMm: 0.1, dashMm: [2, 1], color: 'guide' });
    sheet.context.rect(15, 20.5, 100, 50.25, { stroke, fill: 'paper' });
    sheet.context.polyline([[0, 0], [5, 2.5], [10, 0]], { stroke });
    sheet.context.polyline([[0, 0], [5, 2.5], [10, 0]], { stroke, closed: true });
    const doc = parseXml(sheet.toString());

    const line = only(doc, 'line');
    expect(['x1', 'y1', 'x2', 'y2'].map((name) => numberAttr(line, name))).toEqual([12.7, 25.4, 112.7, 25.4]);
    expect(line.getAttribute('stroke-dasharray')).toBe('2 1');
    const rect = only(doc, 'rect');
    expect(['x', 'y', 'width', 'height'].map((name) => numberAttr(rect, name))).toEqual([15, 20.5, 100, 50.25]);
    expect(only(doc, 'polyline').getAttribute('points')).toBe('0,0 5,2.5 10,0');
    expect(only(doc, 'polygon').getAttribute('points')).toBe('0,0 5,2.5 10,0');
  });

  it('maps palette colours to #rrggbb', () => {
    const sheet = createSvgSheet(210, 297);
    sheet.context.rect(0, 0, 10, 10, { fill: 'paper', stroke: { widthMm: 0.2, color: 'ink' } });
    const rect = only(parseXml(sheet.toString()), 'rect');
    expect(rect.getAttribute('fill')).toBe('#ffffff'); // palette paper 1 x 255 = 255 = ff
    expect(rect.getAttribute('stroke')).toBe('#1a1a1a'); // palette ink 0.1 x 255 = 25.5 -> 26 = 1a (worked arithmetic)
  });

  it('writes numbers with at most 4 decimals and never in exponent notation', () => {
    const sheet = createSvgSheet(210, 297);
    sheet.context.line(1e-7, -0.00001, 123456.789012, 1 / 3, stroke);
    const line = only(parseXml(sheet.toString()), 'line');
    // worked arithmetic: each value rounded to 4 decimals, trailing zeros dropped
    expect(['x1', 'y1', 'x2', 'y2'].map((name) => line.getAttribute(name))).toEqual(['0', '0', '123456.789', '0.3333']);
  });

  it('refuses a negative radius and non-finite coordinates', () => {
    const { context } = createSvgSheet(210, 297);
    expect(() => context.circle(10, 10, -1, { stroke })).toThrow(RangeError);
    expect(() => context.line(0, 0, Number.POSITIVE_INFINITY, 0, stroke)).toThrow(RangeError);
  });
});

describe('createSvgSheet: text', () => {
  it('escapes text so the output still parses', () => {
    const sheet = createSvgSheet(210, 297);
    sheet.context.text(20, 30, 'Join A & B <1>', { sizeMm: 3.5 });
    const xml = sheet.toString();
    expect(xml).toContain('Join A &amp; B &lt;1&gt;');
    expect(only(parseXml(xml), 'text').textContent).toBe('Join A & B <1>');
    // The parser is strict: the same text unescaped is rejected, so the check above means something.
    expect(() => parseXml('<svg xmlns="http://www.w3.org/2000/svg"><text>Join A & B <1></text></svg>')).toThrow();
  });

  it('drops characters XML 1.0 cannot carry', () => {
    const sheet = createSvgSheet(210, 297);
    sheet.context.text(0, 10, 'A\u0001B', { sizeMm: 3 }); // W3C XML 1.0, 2.2 Char: U+0001 is not allowed
    expect(only(parseXml(sheet.toString()), 'text').textContent).toBe('AB');
  });

  it('writes font, size in mm, anchor, weight and a counter-clockwise rotation', () => {
    const sheet = createSvgSheet(210, 297);
    sheet.context.text(40, 50, 'A', { sizeMm: 4.2, weight: 'bold', anchor: 'middle', color: 'accent', rotateDeg: 30 });
    sheet.context.text(40, 60, 'B', { sizeMm: 3 });
    const [bold, plain] = [...parseXml(sheet.toString()).querySelectorAll('text')];
    expect(bold?.getAttribute('x')).toBe('40');
    expect(bold?.getAttribute('y')).toBe('50');
    expect(bold?.getAttribute('font-family')).toBe('IBM Plex Sans, sans-serif');
    expect(bold?.getAttribute('font-size')).toBe('4.2'); // user units are mm under this viewBox
    expect(bold?.getAttribute('text-anchor')).toBe('middle');
    expect(bold?.getAttribute('font-weight')).toBe('600'); // CSS Fonts 4: 600 is Semi Bold
    // SVG 1.1, 7.6: rotate(a x y) turns clockwise on screen for positive a (y down), so CCW is negative
    expect(bold?.getAttribute('transform')).toBe('rotate(-30 40 50)');
    expect(bold?.getAttribute('fill')).toBe('#b34d1c'); // palette accent 0.7, 0.3, 0.11 x 255 -> b3 4d 1c (worked arithmetic)
    expect(plain?.getAttribute('text-anchor')).toBe('start');
    expect(plain?.hasAttribute('font-weight')).toBe(false);
    expect(plain?.hasAttribute('transform')).toBe(false);
  });
});

describe('createSvgSheet: many sheets and speed', () => {
  it('keeps 50 sheets apart', () => {
    const sheets = Array.from({ length: 50 }, (_, index) => {
      const sheet = createSvgSheet(210, 297, { title: `Sheet ${index + 1}` });
      sheet.context.circle(index, index, 1, { stroke });
      return sheet;
    });
    sheets.forEach((sheet, index) => {
      const doc = parseXml(sheet.toString());
      expect(only(doc, 'title').textContent).toBe(`Sheet ${index + 1}`);
      expect(only(doc, 'circle').getAttribute('cx')).toBe(String(index));
    });
  });

  it('draws and serialises 500 circles in under 500 ms', () => {
    const started = performance.now();
    const sheet = createSvgSheet(210, 297);
    for (let index = 0; index < 500; index++) {
      sheet.context.circle(10 + (index % 25) * 7.5, 10 + Math.floor(index / 25) * 12.5, 2.38125, { stroke });
    }
    const xml = sheet.toString();
    const elapsed = performance.now() - started;
    expect(elapsed, `500 circles took ${elapsed.toFixed(1)} ms`).toBeLessThan(500); // budget from the brief
    expect(parseXml(xml).querySelectorAll('circle').length).toBe(500);
  });
});
