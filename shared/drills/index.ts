export type { Drill, DrillSeries } from './drill.ts';
export { allDrills, drillsInSeries, findDrill } from './series.ts';
export { parseDrill } from './parse-drill.ts';
export { commonDrillSets, nearestDrill, nearestDrillNotOver, resolveDrillSet } from './drill-set.ts';
export type { DrillMatch, DrillSet } from './drill-set.ts';
export { suggestPilot } from './pilot.ts';
