export { holeAreaMm2, openAreaMm2, totalGroups } from './open-area.ts';
export { holesForArea, primaryAreaForRatio } from './hole-count.ts';
export { judgeAirflow, summarizeAirflow } from './airflow-summary.ts';
export { applyPrimarySplit, proposePrimarySplits, type PrimarySplit, type SplitRequest } from './propose-splits.ts';
export { estimateBurnMinutes, estimateFuelMassG, PELLET_BULK_DENSITY_KG_M3, type FuelLoadInput } from './fuel-load.ts';
