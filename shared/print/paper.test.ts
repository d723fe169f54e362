import { describe, expect, it } from 'vitest';
import { describeSheet, MAX_MARGIN_MM, MIN_MARGIN_MM, paperIds, paperSizes, printOptionsSchema, sheetSize } from './paper.ts';

describe('paperSizes', () => {
  it.each([
    ['letter', 215.9, 279.4], // ANSI/ASME Y14.1 size A: 8.5 x 11 in at 25.4 mm/in (NIST SP 811)
    ['legal', 215.9, 355.6], // North American legal: 8.5 x 14 in (from memory)
    ['tabloid', 279.4, 431.8], // ANSI/ASME Y14.1 size B: 11 x 17 in
    ['a4', 210, 297], // ISO 216: A4 is 210 x 297 mm
    ['a3', 297, 420], // ISO 216: A3 is 297 x 420 mm
  ] as const)('%s is %s x %s mm portrait', (id, width, height) => {
    expect(paperSizes[id].id).toBe(id);
    expect(paperSizes[id].widthMm).toBeCloseTo(width, 9);
    expect(paperSizes[id].heightMm).toBeCloseTo(height, 9);
  });

  it('lists every paper once', () => {
    expect([...paperIds].sort()).toEqual(Object.keys(paperSizes).sort());
  });
});

describe('sheetSize', () => {
  it('keeps portrait and swaps for landscape', () => {
    expect(sheetSize('a4', 'portrait')).toEqual({ widthMm: 210, heightMm: 297 }); // ISO 216
    expect(sheetSize('a4', 'landscape')).toEqual({ widthMm: 297, heightMm: 210 });
    expect(sheetSize(paperSizes.tabloid, 'landscape').widthMm).toBeCloseTo(431.8, 9); // 17 in, ANSI B
  });

  it('names the sheet for messages', () => {
    expect(describeSheet('letter', 'landscape')).toBe('Letter landscape');
  });
});

describe('printOptionsSchema', () => {
  it('defaults to Letter portrait at the smallest margin', () => {
    expect(printOptionsSchema.parse({})).toEqual({ paper: 'letter', orientation: 'portrait', marginMm: 12.7 });
  });

  it('holds the margin between half an inch and 40 mm', () => {
    expect(MIN_MARGIN_MM).toBe(12.7); // half an inch (common practice, no source)
    expect(printOptionsSchema.safeParse({ marginMm: 12.6 }).success).toBe(false);
    expect(printOptionsSchema.safeParse({ marginMm: MAX_MARGIN_MM }).success).toBe(true);
    expect(printOptionsSchema.safeParse({ marginMm: 40.1 }).success).toBe(false);
  });

  it('refuses unknown papers and orientations', () => {
    expect(printOptionsSchema.safeParse({ paper: 'b5' }).success).toBe(false);
    expect(printOptionsSchema.safeParse({ orientation: 'sideways' }).success).toBe(false);
  });
});
