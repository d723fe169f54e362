import { describe, expect, it } from 'vitest';
import pintCanStove from '../../templates/pint-can-stove.json' with { type: 'json' };
import { designSchema } from '../design/design-schema.ts';
import { summarizeDesign } from '../library/summarize-design.ts';
import { bestBurn } from './best-burn.ts';
import { compareWithLog, estimateFuelLoad, measuredBurnRate } from './burn-estimates.ts';
import type { Burn } from './burn-schema.ts';

const pint = designSchema.parse(pintCanStove);

let next = 0;
function burn(fields: Partial<Burn>): Burn {
  next += 1;
  return {
    id: `b${next}`, designId: 'd', version: 1, date: '2026-11-30T10:00:00Z', photos: [], createdAt: '', updatedAt: '',
    fuelKind: null, fuelMassG: null, starter: null, ambientC: null, wind: null, windscreen: null, windFacing: null,
    timeToLightS: null, timeToJetsS: null, timeToBoilS: null, boilWaterL: null, boilStartC: null, burnTimeS: null,
    charG: null, smoke: null, flameRing: null, notes: null,
    ...fields,
  };
}

describe('fuel load of the pint-can stove (templates/pint-can-stove.json)', () => {
  it('fills the chamber to an inch below the jets at household pellet density', () => {
    const estimate = estimateFuelLoad(pint);
    if (!estimate) throw new Error('expected an estimate');
    // Worked arithmetic: inside diameter 80.9625 - 2 x 0.25 = 80.4625 mm (303 can, catalogue values);
    // jets 15 mm below a 111.125 mm rim sit 96.125 mm up; fill 96.125 - 25 = 71.125 mm (common practice, no source).
    expect(estimate.innerDiameterMm).toBeCloseTo(80.4625, 6);
    expect(estimate.fillHeightMm).toBeCloseTo(71.125, 6);
    // V = pi x 0.04023125^2 x 0.071125 = 3.6166e-4 m3; x 650 kg/m3 (CEN/TS 14961 household pellets) = 235.08 g.
    expect(estimate.fuelMassG).toBeCloseTo(235.08, 1);
    // 71.125 mm at 5 mm/min (from memory: a small can stove burns a load in 15-20 min) = 14.225 min;
    // 235.08 / 14.225 = 16.53 g/min.
    expect(estimate.burnMinutes).toBeCloseTo(14.225, 3);
    expect(estimate.burnRateGPerMin).toBeCloseTo(16.53, 2);
  });

  it('has no estimate without a burn chamber', () => {
    expect(estimateFuelLoad({ ...pint, parts: pint.parts.filter((p) => p.role !== 'burn-chamber') })).toBeNull();
  });
});

describe('correction from the burn log', () => {
  it('keeps the estimate until three burns have a fuel mass and a burn time', () => {
    const two = [burn({ fuelMassG: 200, burnTimeS: 20 * 60 }), burn({ fuelMassG: 220, burnTimeS: 22 * 60 }), burn({ fuelMassG: 210 })];
    expect(compareWithLog(pint, two)?.corrected).toBeNull();
    expect(measuredBurnRate(two)).toEqual({ burns: 2, medianGPerMin: 10 }); // 200/20 = 10 and 220/22 = 10 g/min, worked arithmetic
  });

  it('uses the median measured rate once there are three', () => {
    // Rates 200/20 = 10, 240/20 = 12, 180/10 = 18 g/min; the median is 12 (worked arithmetic).
    const three = [burn({ fuelMassG: 200, burnTimeS: 1200 }), burn({ fuelMassG: 240, burnTimeS: 1200 }), burn({ fuelMassG: 180, burnTimeS: 600 })];
    const result = compareWithLog(pint, three);
    expect(result?.corrected?.burnRateGPerMin).toBe(12);
    // A full load of 235.08 g at 12 g/min lasts 19.59 min (worked arithmetic).
    expect(result?.corrected?.burnMinutes).toBeCloseTo(19.59, 2);
    expect(result?.measured.burnMinutes).toBe(20); // median of 20, 20, 10 min
    expect(result?.measured.fuelMassG).toBe(200); // median of 200, 240, 180 g
  });
});

describe('best burn so far (common practice, no source)', () => {
  it('is the fastest boil per litre, leaving out heavy smoke', () => {
    const slow = burn({ timeToBoilS: 600, boilWaterL: 1 });
    const quickHalf = burn({ timeToBoilS: 400, boilWaterL: 0.5 }); // 800 s per litre
    const smoky = burn({ timeToBoilS: 300, boilWaterL: 1, smoke: 'heavy' });
    expect(bestBurn([slow, quickHalf, smoky])).toEqual({ burn: slow, reason: 'boil' });
  });

  it('falls back to the longest burn, then the best flame ring', () => {
    const long = burn({ burnTimeS: 1800 });
    expect(bestBurn([burn({ burnTimeS: 900 }), long])).toEqual({ burn: long, reason: 'burn-time' });
    const ring = burn({ flameRing: 5 });
    expect(bestBurn([burn({ flameRing: 2 }), ring])).toEqual({ burn: ring, reason: 'flame-ring' });
    expect(bestBurn([burn({ notes: 'rain' })])).toBeNull();
  });
});

describe('jet pitch in a version summary', () => {
  it('is the chamber circumference over its jet positions', () => {
    // pi x 80.9625 / 16 = 15.90 mm, just over the 5/8 in (15.875 mm) warning (worked arithmetic; limit common practice, no source).
    expect(summarizeDesign(pint).jetPitchMm).toBe(15.9);
  });
});
