import { describe, expect, it } from 'vitest';
import { DEFAULT_PAPER_THICKNESS_MM, usableBottomDiameterMm, vesselSchema, wrapStripLengthMm } from './vessel.ts';

/** An invented can for the tests, not a catalogue size. */
const demo = vesselSchema.parse({ source: 'measured', name: 'Demo can', outerDiameterMm: 100, heightMm: 120 });

describe('vesselSchema', () => {
  it('fills the defaults', () => {
    expect(demo.wallThicknessMm).toBe(0.25); // from memory: tinplate 0.15-0.30 mm
    expect(demo.seamAngleDeg).toBe(0);
    expect(demo.bottomRimInsetMm).toBe(4); // common practice, no source
  });

  it.each([
    { outerDiameterMm: 0 },
    { outerDiameterMm: 601 },
    { heightMm: -1 },
    { heightMm: 1001 },
    { seamAngleDeg: 361 },
    { seamAngleDeg: -1 },
    { bottomRimInsetMm: -0.5 },
    { name: '  ' },
    { outerDiameterMm: Number.NaN },
  ])('rejects %o', (change) => {
    expect(vesselSchema.safeParse({ ...demo, ...change }).success).toBe(false);
  });

  it('rejects unknown keys and sources', () => {
    expect(vesselSchema.safeParse({ ...demo, colour: 'red' }).success).toBe(false);
    expect(vesselSchema.safeParse({ ...demo, source: 'guessed' }).success).toBe(false);
  });
});

describe('usableBottomDiameterMm', () => {
  it('takes the rim off both sides', () => {
    // Worked arithmetic: 100 - 2 x 4 = 92
    expect(usableBottomDiameterMm(demo)).toBe(92);
  });

  it('never goes below zero', () => {
    expect(usableBottomDiameterMm({ ...demo, outerDiameterMm: 6 })).toBe(0);
  });
});

describe('wrapStripLengthMm', () => {
  it('wraps the paper centre line, pi x (D + t)', () => {
    expect(DEFAULT_PAPER_THICKNESS_MM).toBe(0.1);
    // Worked arithmetic: pi x (100 + 0.10) = pi x 100.10 = 314.4734 mm
    expect(wrapStripLengthMm(demo)).toBeCloseTo(314.4734, 3);
    // Worked arithmetic: pi x (80.96 + 0.20) = pi x 81.16 = 254.9717 mm
    expect(wrapStripLengthMm({ ...demo, outerDiameterMm: 80.96 }, 0.2)).toBeCloseTo(254.9717, 3);
    // Worked arithmetic: zero-thickness paper gives the bare circumference, pi x 50 = 157.0796 mm
    expect(wrapStripLengthMm({ ...demo, outerDiameterMm: 50 }, 0)).toBeCloseTo(157.0796, 3);
  });
});
