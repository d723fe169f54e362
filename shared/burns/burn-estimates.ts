import { estimateFuelMassG } from '../airflow/fuel-load.ts';
import type { Design, Part } from '../design/design-schema.ts';
import type { Burn } from './burn-schema.ts';

/**
 * What the design predicts for one full load of pellets, and how the burn log corrects it.
 *
 * Fuel load: the chamber's inside cylinder filled to JET_CLEARANCE_MM below the lowest jets, at
 * household pellet bulk density (shared/airflow/fuel-load.ts).
 * Burn time: a top-lit updraft fire burns downward through the load; the pyrolysis front moves at
 * a few millimetres a minute in pellets in a can this size (from memory: a small can stove burns a
 * load of pellets in 15 to 30 minutes), so the estimate uses FLAME_FRONT_MM_PER_MIN.
 * Correction: once a design has MIN_BURNS_TO_CORRECT burns with a fuel mass and a burn time, its
 * own burn rate (the median of fuel mass / burn time, in g/min) replaces the front speed: the
 * corrected burn time of a full load is the estimated fuel load divided by that rate.
 */
export const JET_CLEARANCE_MM = 25; // leave about an inch of empty chamber under the jets (common practice, no source)
export const FLAME_FRONT_MM_PER_MIN = 5; // from memory: 70-90 mm of pellets burn down in 15-20 min
export const MIN_BURNS_TO_CORRECT = 3;

export interface FuelLoadEstimate {
  innerDiameterMm: number;
  fillHeightMm: number;
  fuelMassG: number;
  burnMinutes: number;
  burnRateGPerMin: number;
}

const sideHeightFromBottom = (part: Part, height: { from: 'bottom' | 'top'; mm: number }) => (height.from === 'bottom' ? height.mm : part.vessel.heightMm - height.mm);

/** A full load of the design's burn chamber; null without a chamber or without room under its jets. */
export function estimateFuelLoad(design: Design): FuelLoadEstimate | null {
  const chamber = design.parts.find((part) => part.role === 'burn-chamber');
  if (!chamber) return null;
  const jets = chamber.sideRows.filter((row) => row.group === 'secondary').map((row) => sideHeightFromBottom(chamber, row.height));
  // Without jets the fill stops where it would under jets at the usual place: a quarter of the can from the top (common practice, no source).
  const lowestJetMm = jets.length > 0 ? Math.min(...jets) : chamber.vessel.heightMm * 0.75;
  const fillHeightMm = lowestJetMm - JET_CLEARANCE_MM;
  if (fillHeightMm <= 0) return null;
  const innerDiameterMm = chamber.vessel.outerDiameterMm - 2 * chamber.vessel.wallThicknessMm;
  const fuelMassG = estimateFuelMassG({ innerDiameterMm, fillHeightMm });
  const burnMinutes = fillHeightMm / FLAME_FRONT_MM_PER_MIN;
  return { innerDiameterMm, fillHeightMm, fuelMassG, burnMinutes, burnRateGPerMin: fuelMassG / burnMinutes };
}

export interface MeasuredBurnRate {
  /** Burns with both a fuel mass and a burn time. */
  burns: number;
  medianGPerMin: number | null;
}

const median = (values: number[]): number | null => {
  if (values.length === 0) return null;
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  const at = (i: number) => sorted[i] as number;
  return sorted.length % 2 === 1 ? at(mid) : (at(mid - 1) + at(mid)) / 2;
};

/** The design's own burn rate from its log (the median, so one windy day does not swing it). */
export function measuredBurnRate(burns: readonly Burn[]): MeasuredBurnRate {
  const rates = burns.filter((b) => b.fuelMassG && b.burnTimeS).map((b) => (b.fuelMassG as number) / ((b.burnTimeS as number) / 60));
  return { burns: rates.length, medianGPerMin: median(rates) };
}

export interface EstimateAgainstLog {
  estimate: FuelLoadEstimate;
  measured: { fuelMassG: number | null; burnMinutes: number | null; burnRate: MeasuredBurnRate };
  /** Present once the log has MIN_BURNS_TO_CORRECT usable burns. */
  corrected: { burnRateGPerMin: number; burnMinutes: number } | null;
}

export function compareWithLog(design: Design, burns: readonly Burn[]): EstimateAgainstLog | null {
  const estimate = estimateFuelLoad(design);
  if (!estimate) return null;
  const burnRate = measuredBurnRate(burns);
  const corrected = burnRate.burns >= MIN_BURNS_TO_CORRECT && burnRate.medianGPerMin ? { burnRateGPerMin: burnRate.medianGPerMin, burnMinutes: estimate.fuelMassG / burnRate.medianGPerMin } : null;
  const minutes = burns.flatMap((b) => (b.burnTimeS ? [b.burnTimeS / 60] : []));
  const masses = burns.flatMap((b) => (b.fuelMassG ? [b.fuelMassG] : []));
  return { estimate, measured: { fuelMassG: median(masses), burnMinutes: median(minutes), burnRate }, corrected };
}
