import { describe, expect, it } from 'vitest';
import { vesselFromCatalogue } from './catalogue.ts';
import { diameterFromCircumference, editVessel } from './edit-vessel.ts';
import { vesselSchema, VESSEL_LIMITS } from './vessel.ts';

describe('editing a catalogue can', () => {
  const can = vesselFromCatalogue('food-303x406');

  it('stops carrying the catalogue name once its size changes', () => {
    const edited = editVessel(can, { heightMm: 100 });
    expect(edited).toMatchObject({ source: 'measured', name: 'Based on 303x406, edited', heightMm: 100 });
    expect(edited).not.toHaveProperty('catalogueId');
    expect(vesselSchema.safeParse(edited).success).toBe(true);
  });

  it('keeps the catalogue size when only the seam is turned, or a value is typed again unchanged', () => {
    expect(editVessel(can, { seamAngleDeg: 90 })).toMatchObject({ source: 'catalogue', catalogueId: 'food-303x406', seamAngleDeg: 90 });
    expect(editVessel(can, { outerDiameterMm: can.outerDiameterMm })).toMatchObject({ source: 'catalogue' });
  });

  it('leaves a measured can measured, with its own name', () => {
    const measured = { ...can, source: 'measured' as const, catalogueId: undefined, name: 'Tomato can' };
    expect(editVessel(measured, { heightMm: 90 })).toMatchObject({ source: 'measured', name: 'Tomato can', heightMm: 90 });
  });
});

describe('plausible sizes', () => {
  const base = { source: 'measured', name: 'Test can', outerDiameterMm: 100, heightMm: 120 };
  it.each([{ outerDiameterMm: 0.01 }, { outerDiameterMm: 10_000 }, { heightMm: 10_000 }, { heightMm: 0.01 }, { wallThicknessMm: 0.001 }, { bottomRimInsetMm: 60 }])('refuses %o', (change) => {
    expect(vesselSchema.safeParse({ ...base, ...change }).success).toBe(false);
  });
  it('takes the smallest and largest catalogue cans', () => {
    // The catalogue's 202x214 (53.975 mm across, 73.025 mm tall) and a 600 mm drum sit inside the limits.
    expect(vesselSchema.safeParse({ ...base, outerDiameterMm: 53.975, heightMm: 73.025 }).success).toBe(true);
    expect(vesselSchema.safeParse({ ...base, outerDiameterMm: VESSEL_LIMITS.maxDiameterMm }).success).toBe(true);
  });
});

describe('a tape measurement', () => {
  it('gives the diameter as C / pi', () => {
    // Worked arithmetic: a 254.34 mm tape reading is pi x 80.96 mm.
    expect(diameterFromCircumference(Math.PI * 80.9625)).toBeCloseTo(80.9625, 9);
  });
});
