/**
 * Fuel load and burn time of a batch-loaded chamber. Wood pellets pour at 600-750 kg/m3 bulk
 * density; household pellets are at least 650 kg/m3 (CEN/TS 14961), the default here.
 */
export const PELLET_BULK_DENSITY_KG_M3 = { min: 600, max: 750, household: 650 } as const;

export interface FuelLoadInput {
  /** Inside diameter of the burn chamber. */
  innerDiameterMm: number;
  /** How high the fuel is filled: below the secondary jets. */
  fillHeightMm: number;
  bulkDensityKgM3?: number;
}

export function estimateFuelMassG({ innerDiameterMm, fillHeightMm, bulkDensityKgM3 = PELLET_BULK_DENSITY_KG_M3.household }: FuelLoadInput): number {
  const volumeM3 = Math.PI * (innerDiameterMm / 2000) ** 2 * (fillHeightMm / 1000);
  return volumeM3 * bulkDensityKgM3 * 1000;
}

/** Burn time from a burn rate the maker enters (or takes from the burn log), in minutes. */
export function estimateBurnMinutes(fuelMassG: number, burnRateGPerMin: number): number {
  if (burnRateGPerMin <= 0) throw new RangeError('The burn rate must be above zero');
  return fuelMassG / burnRateGPerMin;
}
