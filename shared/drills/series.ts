import { formatFraction, nearestFraction } from '../units/format-length.ts';
import { MM_PER_INCH } from '../units/length.ts';
import type { Drill, DrillSeries } from './drill.ts';

/**
 * Number (wire-gauge) drills #1 to #80, diameters in inches, index 0 = #1.
 * ASME B94.11M twist-drill table (typed from memory; spot-checked against published tap-drill charts).
 */
const NUMBER_DRILL_INCHES: readonly number[] = [
  0.228, 0.221, 0.213, 0.209, 0.2055, 0.204, 0.201, 0.199, 0.196, 0.1935, // #1-#10
  0.191, 0.189, 0.185, 0.182, 0.18, 0.177, 0.173, 0.1695, 0.166, 0.161, // #11-#20
  0.159, 0.157, 0.154, 0.152, 0.1495, 0.147, 0.144, 0.1405, 0.136, 0.1285, // #21-#30
  0.12, 0.116, 0.113, 0.111, 0.11, 0.1065, 0.104, 0.1015, 0.0995, 0.098, // #31-#40
  0.096, 0.0935, 0.089, 0.086, 0.082, 0.081, 0.0785, 0.076, 0.073, 0.07, // #41-#50
  0.067, 0.0635, 0.0595, 0.055, 0.052, 0.0465, 0.043, 0.042, 0.041, 0.04, // #51-#60
  0.039, 0.038, 0.037, 0.036, 0.035, 0.033, 0.032, 0.031, 0.0292, 0.028, // #61-#70
  0.026, 0.025, 0.024, 0.0225, 0.021, 0.02, 0.018, 0.016, 0.0145, 0.0135, // #71-#80
];

/** Letter drills A to Z, diameters in inches. ASME B94.11M twist-drill table (from memory, spot-checked). */
const LETTER_DRILL_INCHES: Readonly<Record<string, number>> = {
  A: 0.234, B: 0.238, C: 0.242, D: 0.246, E: 0.25, F: 0.257, G: 0.261, H: 0.266, I: 0.272,
  J: 0.277, K: 0.281, L: 0.29, M: 0.295, N: 0.302, O: 0.316, P: 0.323, Q: 0.332, R: 0.339,
  S: 0.348, T: 0.358, U: 0.368, V: 0.377, W: 0.386, X: 0.397, Y: 0.404, Z: 0.413,
};

// Fractional sets run 1/64 to 1 in by 64ths; metric 0.1 to 13.0 mm by 0.1 mm (common jobber ranges).
const FRACTIONAL_64THS = { first: 1, last: 64 };
const METRIC_TENTHS = { first: 1, last: 130 };

const makeDrill = (id: string, series: DrillSeries, label: string, diameterMm: number): Drill =>
  Object.freeze({ id, series, label, diameterMm });

/** Built from whole 64ths so every size is exact: k/64 in is a short binary fraction. */
function buildFractional(sixtyFourths: number): Drill {
  const fraction = formatFraction(nearestFraction(sixtyFourths / 64, 64));
  return makeDrill(`frac:${fraction}`, 'fractional', `${fraction} in`, (sixtyFourths * MM_PER_INCH) / 64);
}

/** Built from integer tenths: 48 / 10 is the same double as the literal 4.8, with no summed drift. */
function buildMetric(tenths: number): Drill {
  const size = String(tenths / 10);
  return makeDrill(`mm:${size}`, 'metric', `${size} mm`, tenths / 10);
}

const buildRange = (first: number, last: number): number[] =>
  Array.from({ length: last - first + 1 }, (_, i) => first + i);

const SERIES: Readonly<Record<DrillSeries, readonly Drill[]>> = {
  fractional: buildRange(FRACTIONAL_64THS.first, FRACTIONAL_64THS.last).map(buildFractional),
  number: NUMBER_DRILL_INCHES.map((inches, i) => makeDrill(`num:${i + 1}`, 'number', `#${i + 1}`, inches * MM_PER_INCH)),
  letter: Object.entries(LETTER_DRILL_INCHES).map(([letter, inches]) =>
    makeDrill(`let:${letter}`, 'letter', `letter ${letter}`, inches * MM_PER_INCH),
  ),
  metric: buildRange(METRIC_TENTHS.first, METRIC_TENTHS.last).map(buildMetric),
};

const SERIES_ORDER: readonly DrillSeries[] = ['fractional', 'number', 'letter', 'metric'];
const ALL_DRILLS: readonly Drill[] = SERIES_ORDER.flatMap((series) => SERIES[series]);
const DRILLS_BY_ID: ReadonlyMap<string, Drill> = new Map(ALL_DRILLS.map((drill) => [drill.id, drill]));

/** Every drill of every series: fractional, number (#1 first), letter, metric; each series in table order. */
export const allDrills = (): Drill[] => [...ALL_DRILLS];

export const drillsInSeries = (series: DrillSeries): Drill[] => [...SERIES[series]];

export const findDrill = (id: string): Drill | undefined => DRILLS_BY_ID.get(id);
