import { describe, expect, it } from 'vitest';
import { formatFraction, formatInches, formatLength, formatMm, nearestFraction } from './format-length.ts';
import { MM_PER_INCH } from './length.ts';
import { parseLength } from './parse-length.ts';

// Inch equivalents follow from 1 in = 25.4 mm exactly (NIST SP 811, appendix B).
describe('formatInches', () => {
  it.each([
    [4.7625, '3/16 in'], // 3/16 in, NIST SP 811
    [41.275, '1 5/8 in'], // 1 5/8 in
    [50.8, '2 in'],
    [0.396875, '1/64 in'], // 1/64 in
    [25.4, '1 in'],
    [12.7, '1/2 in'],
    [0.19, '0 in'], // under 1/128 in rounds to zero
    [0, '0 in'],
    [4.8, '3/16 in'], // 0.18898 in; nearest 64th is 12/64
    [-0.396875, '-1/64 in'], // signed, for over/under amounts
    [-0.1, '0 in'],
  ])('%s mm -> %s', (mm, text) => {
    expect(formatInches(mm)).toBe(text);
  });
});

describe('formatMm', () => {
  it.each([
    [4.7625, '4.76 mm'],
    [5, '5 mm'],
    [4.8, '4.8 mm'],
    [10, '10 mm'],
    [100.5, '100.5 mm'],
    [0.004, '0 mm'],
    [-0.001, '0 mm'],
    [-0.4, '-0.4 mm'],
  ])('%s mm -> %s', (mm, text) => {
    expect(formatMm(mm)).toBe(text);
  });
});

describe('formatLength', () => {
  it('writes the unit the maker chose', () => {
    expect(formatLength(4.7625, 'in')).toBe('3/16 in');
    expect(formatLength(4.7625, 'mm')).toBe('4.76 mm');
  });
});

describe('nearestFraction', () => {
  it('reduces to lowest terms', () => {
    expect(nearestFraction(0.1875)).toEqual({ whole: 0, numerator: 3, denominator: 16 });
    expect(nearestFraction(1.625)).toEqual({ whole: 1, numerator: 5, denominator: 8 });
    expect(nearestFraction(2)).toEqual({ whole: 2, numerator: 0, denominator: 1 });
  });

  it('rounds to the denominator asked for', () => {
    expect(nearestFraction(0.19, 16)).toEqual({ whole: 0, numerator: 3, denominator: 16 });
    expect(nearestFraction(0.99, 8)).toEqual({ whole: 1, numerator: 0, denominator: 1 });
  });

  it('carries a sign on both parts', () => {
    expect(nearestFraction(-1.625)).toEqual({ whole: -1, numerator: -5, denominator: 8 });
    expect(formatFraction(nearestFraction(-1.625))).toBe('-1 5/8');
  });
});

describe('round trips', () => {
  // Every 0.37 mm from 0.4 to 60 mm: an uneven step so the samples fall between 64ths.
  const samples = Array.from({ length: 162 }, (_, i) => 0.4 + i * 0.37);

  it('parse(formatInches(x)) is within 1/128 in of x', () => {
    for (const mm of samples) {
      const result = parseLength(formatInches(mm), 'mm');
      expect(result.ok).toBe(true);
      if (result.ok) expect(Math.abs(result.mm - mm)).toBeLessThanOrEqual(MM_PER_INCH / 128 + 1e-9);
    }
  });

  it('parse(formatMm(x)) is within 0.005 mm of x', () => {
    for (const mm of samples) {
      const result = parseLength(formatMm(mm), 'in');
      expect(result.ok).toBe(true);
      if (result.ok) expect(Math.abs(result.mm - mm)).toBeLessThanOrEqual(0.005 + 1e-9);
    }
  });

  it('every 64th from 1/64 to 4 in survives formatting and parsing exactly', () => {
    for (let k = 1; k <= 256; k += 1) {
      const mm = (k * MM_PER_INCH) / 64;
      const result = parseLength(formatInches(mm), 'mm');
      expect(result.ok && result.mm).toBeCloseTo(mm, 9);
    }
  });
});
