import { describe, expect, it } from 'vitest';
import { vesselFromCircumference, vesselFromDiameter } from './measure.ts';
import { wrapStripLengthMm } from './vessel.ts';

describe('vesselFromCircumference', () => {
  it('divides by pi and takes off the tape thickness', () => {
    // Worked arithmetic: 254.34 / pi = 80.96 mm; tape 0.15 mm -> 80.81 mm
    const bare = vesselFromCircumference({ circumferenceMm: 254.34, heightMm: 111 });
    expect(bare.outerDiameterMm).toBeCloseTo(80.96, 2);
    const taped = vesselFromCircumference({ circumferenceMm: 254.34, heightMm: 111, tapeThicknessMm: 0.15 });
    expect(taped.outerDiameterMm).toBeCloseTo(80.81, 2);
  });

  it('round-trips through the wrap strip length', () => {
    // A strip as thick as the tape reads what the tape read: pi x (D + t) both ways.
    for (const circumferenceMm of [160, 254.34, 493.7]) {
      const vessel = vesselFromCircumference({ circumferenceMm, heightMm: 100, tapeThicknessMm: 0.1 });
      expect(wrapStripLengthMm(vessel, 0.1)).toBeCloseTo(circumferenceMm, 9);
    }
  });

  it('names and marks the vessel as measured with defaults', () => {
    const vessel = vesselFromCircumference({ circumferenceMm: Math.PI * 81, heightMm: 110 });
    expect(vessel).toMatchObject({ source: 'measured', name: 'Measured can, 81.0 mm', seamAngleDeg: 0 });
    expect(vessel.wallThicknessMm).toBe(0.25); // from memory: tinplate 0.15-0.30 mm
    expect(vessel.catalogueId).toBeUndefined();
  });

  it('refuses impossible measurements', () => {
    expect(() => vesselFromCircumference({ circumferenceMm: 0, heightMm: 100 })).toThrow();
    expect(() => vesselFromCircumference({ circumferenceMm: 250, heightMm: 100, tapeThicknessMm: -1 })).toThrow(RangeError);
    expect(() => vesselFromCircumference({ circumferenceMm: 250, heightMm: 0 })).toThrow();
  });
});

describe('vesselFromDiameter', () => {
  it('takes a calliper reading as it is', () => {
    const vessel = vesselFromDiameter({ diameterMm: 99.4, heightMm: 118 });
    expect(vessel).toMatchObject({ source: 'measured', name: 'Measured can, 99.4 mm', outerDiameterMm: 99.4, heightMm: 118 });
    expect(vessel.bottomRimInsetMm).toBe(4); // common practice, no source
  });

  it('refuses a diameter over 600 mm', () => {
    expect(() => vesselFromDiameter({ diameterMm: 700, heightMm: 100 })).toThrow();
  });
});
