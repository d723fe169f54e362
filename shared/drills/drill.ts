/** The four ways twist drills are sized and sold. */
export type DrillSeries = 'fractional' | 'number' | 'letter' | 'metric';

/**
 * One drill size. ids are stable keys for saved sets: "frac:3/16", "num:7", "let:A", "mm:4.8";
 * labels are what the maker reads: "3/16 in", "#7", "letter A", "4.8 mm".
 */
export interface Drill {
  id: string;
  series: DrillSeries;
  label: string;
  diameterMm: number;
}
