import { describe, expect, it } from 'vitest';
import { parseLength } from './parse-length.ts';

// Expected millimetres follow from 1 in = 25.4 mm exactly (NIST SP 811, appendix B).
const readMm = (text: string, unit: 'in' | 'mm' = 'in'): number => {
  const result = parseLength(text, unit);
  if (!result.ok) throw new Error(`expected "${text}" to parse, got: ${result.error}`);
  return result.mm;
};
const readError = (text: string, unit: 'in' | 'mm' = 'in'): string => {
  const result = parseLength(text, unit);
  if (result.ok) throw new Error(`expected "${text}" to fail, got ${result.mm} mm`);
  return result.error;
};

describe('parseLength accepts the forms makers type', () => {
  it.each([
    ['3/16', 'in', 4.7625], // 3/16 x 25.4, NIST SP 811
    ['3/16', 'mm', 4.7625], // a bare fraction is inches whatever the default (common practice, no source)
    ['1 5/8 in', 'mm', 41.275], // 1.625 x 25.4, NIST SP 811
    ['0.1875in', 'mm', 4.7625], // 0.1875 x 25.4, NIST SP 811
    ['4.76 mm', 'in', 4.76],
    ['1-5/8"', 'mm', 41.275],
    ['1 5/8"', 'mm', 41.275],
    ['2 in', 'mm', 50.8], // 2 x 25.4, NIST SP 811
    ['25.4mm', 'in', 25.4],
    ['12', 'mm', 12], // bare number takes the default unit
    ['12', 'in', 304.8], // 12 x 25.4, NIST SP 811
    ['0.5 inch', 'mm', 12.7],
    ['3 inches', 'mm', 76.2],
    ['10 cm', 'in', 100], // 1 cm = 10 mm (SI)
    ['3\u204416', 'in', 4.7625], // unicode fraction slash
    ['1½ in', 'mm', 38.1], // 1.5 x 25.4, NIST SP 811
    ['  2 IN ', 'mm', 50.8],
    ['.5 in', 'mm', 12.7],
    ['3/16 mm', 'in', 0.1875], // an explicit unit wins, even on a fraction
    ['1 5/8\u2033', 'mm', 41.275], // double-prime inch mark
    ['4.8 millimetres', 'in', 4.8],
  ] as const)('%s (default %s) -> %s mm', (text, unit, mm) => {
    expect(readMm(text, unit)).toBeCloseTo(mm, 9);
  });
});

describe('parseLength explains what is wrong', () => {
  it('says what it could not read and shows examples', () => {
    expect(readError('abc')).toBe('Could not read "abc" as a length; try 3/16, 1 5/8 in or 4.8 mm');
  });

  it.each(['4.8 ft', '1 2 3', '3/16/2', '1.2.3', 'mm', '1/2/', '#7', '5\'', '1e3'])('rejects "%s"', (text) => {
    expect(readError(text)).toMatch(/^Could not read ".*" as a length; try/);
  });

  it.each(['', '   ', '\t\n'])('asks for a length when empty: %j', (text) => {
    expect(readError(text)).toBe('Enter a length, such as 3/16, 1 5/8 in or 4.8 mm');
  });

  it.each(['3/0', '1 5/0 in', '0/0'])('names a zero denominator in "%s"', (text) => {
    expect(readError(text)).toMatch(/number under the slash must not be 0/);
  });

  it.each(['-3 mm', '-3/16', '- 1 5/8 in', '\u22124.8 mm'])('rejects the negative "%s"', (text) => {
    expect(readError(text)).toMatch(/Lengths must be positive; .* is below zero/);
  });

  it.each(['0', '0 mm', '0/16', '0.000 in', '-0'])('rejects the zero "%s"', (text) => {
    expect(readError(text)).toMatch(/Lengths must be positive; .* is zero/);
  });

  it('rejects a number too large to hold', () => {
    expect(readError('9'.repeat(400))).toMatch(/^Could not read/);
  });

  it('never throws, whatever it is given', () => {
    const odd = ['/', '-', '"', '1/', '/2', '1 /', '\u0000', '🔩', '1 - 2', 'in in', String(undefined), '1'.repeat(10_000)];
    for (const text of odd) expect(() => parseLength(text, 'mm')).not.toThrow();
    expect(() => parseLength(undefined as unknown as string, 'mm')).not.toThrow();
  });
});
