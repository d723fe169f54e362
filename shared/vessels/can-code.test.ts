import { describe, expect, it } from 'vitest';
import { formatCanCode, parseCanCode } from './can-code.ts';

/** Unwrap a successful parse, failing the test with the error otherwise. */
function parseOk(text: string) {
  const result = parseCanCode(text);
  if (!result.ok) throw new Error(result.error);
  return result;
}

/** The brief's tolerance for check values quoted to 0.01 mm. */
function expectWithin(actual: number, expected: number, tolerance = 0.01) {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tolerance);
}

describe('parseCanCode', () => {
  it('reads the CMI check values', () => {
    // CMI Voluntary Can and End Dimension Reference Manual: 211x400 = 68.26 x 101.60 mm
    expectWithin(parseOk('211x400').diameterMm, 68.26);
    expectWithin(parseOk('211x400').heightMm, 101.6);
    // CMI Voluntary Can and End Dimension Reference Manual: 303x406 = 80.96 x 111.13 mm
    expectWithin(parseOk('303x406').diameterMm, 80.96);
    expectWithin(parseOk('303x406').heightMm, 111.13);
    // CMI Voluntary Can and End Dimension Reference Manual: No. 10, 603x700 = 157.16 x 177.80 mm
    expectWithin(parseOk('603x700').diameterMm, 157.16);
    expectWithin(parseOk('603x700').heightMm, 177.8);
  });

  it('reads the gallon paint can, 610x708 = 6 5/8 x 7 1/2 in', () => {
    // Code rule from the CMI manual; a gallon paint can being 610x708 is a container maker's
    // worked example (milehighcontainers.com, "Metal Container Basics"). 6.625 x 25.4 = 168.275.
    expectWithin(parseOk('610x708').diameterMm, 168.28);
    expectWithin(parseOk('610x708').heightMm, 190.5);
  });

  it('gives the No. 10 over-seam circumference', () => {
    // CMI Voluntary Can and End Dimension Reference Manual (603 dia.): pi x 157.16 = 493.7 mm
    expectWithin(Math.PI * parseOk('603x700').diameterMm, 493.7, 0.05);
  });

  it.each(['303x406', '303 x 406', '303X406', '303×406', ' 303 x406 '])('accepts the spelling %j', (text) => {
    expect(parseOk(text).code).toBe('303x406');
  });

  it('rejects sixteenths of 16 or more with a clear message', () => {
    const result = parseCanCode('317x406');
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.error).toMatch(/sixteenths.*00 to 15/);
    const height = parseCanCode('303x420');
    expect(height.ok).toBe(false);
    if (!height.ok) expect(height.error).toMatch(/height "420"/);
  });

  it.each(['', '303', '303x', 'x406', '30x406', '303-406', 'abc', '303x406x409', '000x406'])(
    'returns an error, not an exception, for %j',
    (text) => {
      const result = parseCanCode(text);
      expect(result.ok).toBe(false);
      if (!result.ok) expect(result.error.length).toBeGreaterThan(0);
    },
  );

  it('accepts a four-digit part for 10 in and over', () => {
    // Code rule (CMI manual): 1000 = 10 in = 254 mm
    expect(parseOk('1000x1000').diameterMm).toBeCloseTo(254, 6);
  });
});

describe('formatCanCode', () => {
  it('writes the code for a size in mm', () => {
    // CMI Voluntary Can and End Dimension Reference Manual check values, inverted
    expect(formatCanCode(80.96, 111.13)).toBe('303x406');
    expect(formatCanCode(157.16, 177.8)).toBe('603x700');
    expect(formatCanCode(68.26, 101.6)).toBe('211x400');
  });

  it('rounds to the nearest sixteenth and carries into the inches', () => {
    // Worked arithmetic: 101.5 mm = 63.94 sixteenths -> 64 = 4 in exactly -> "400"
    expect(formatCanCode(80.9, 101.5)).toBe('303x400');
  });

  it('round-trips every valid code', () => {
    for (let inches = 1; inches <= 9; inches += 1) {
      for (let sixteenths = 0; sixteenths < 16; sixteenths += 1) {
        const part = `${inches}${String(sixteenths).padStart(2, '0')}`;
        const parsed = parseOk(`${part}x${part}`);
        expect(formatCanCode(parsed.diameterMm, parsed.heightMm)).toBe(`${part}x${part}`);
      }
    }
  });

  it('refuses lengths that are not positive', () => {
    expect(() => formatCanCode(0, 100)).toThrow(RangeError);
    expect(() => formatCanCode(80, Number.NaN)).toThrow(RangeError);
  });
});
