import { describe, expect, it } from 'vitest';
import { estimateBurnMinutes, estimateFuelMassG, PELLET_BULK_DENSITY_KG_M3 } from '../../../shared/airflow/index.ts';

describe('fuel load and burn time', () => {
  it('uses household pellet bulk density, at least 650 kg/m3 (CEN/TS 14961), inside the 600-750 kg/m3 range', () => {
    expect(PELLET_BULK_DENSITY_KG_M3.household).toBe(650);
    expect(PELLET_BULK_DENSITY_KG_M3.min).toBe(600);
    expect(PELLET_BULK_DENSITY_KG_M3.max).toBe(750);
  });

  it('a 100 mm chamber filled 100 mm deep holds pi x 0.05^2 x 0.1 m3 = 0.785 L, 510.5 g of pellets at 650 kg/m3 (worked arithmetic)', () => {
    expect(estimateFuelMassG({ innerDiameterMm: 100, fillHeightMm: 100 })).toBeCloseTo(510.51, 1);
    expect(estimateFuelMassG({ innerDiameterMm: 100, fillHeightMm: 100, bulkDensityKgM3: 750 })).toBeCloseTo(589.05, 1);
  });

  it('burns for mass / rate minutes, and refuses a rate of zero', () => {
    expect(estimateBurnMinutes(510, 17)).toBeCloseTo(30, 9);
    expect(() => estimateBurnMinutes(510, 0)).toThrow(RangeError);
  });
});
