import type { AirflowSummary, Finding, GroupTotal } from '../layout/layout-types.ts';

/** Primary against secondary open area, as a ratio primary : secondary. */
export function summarizeAirflow(groups: GroupTotal[], targetRatio: number): AirflowSummary {
  const area = (group: string) => groups.find((g) => g.group === group)?.openAreaMm2 ?? 0;
  const primaryAreaMm2 = area('primary');
  const secondaryAreaMm2 = area('secondary');
  return { primaryAreaMm2, secondaryAreaMm2, ratio: secondaryAreaMm2 > 0 ? primaryAreaMm2 / secondaryAreaMm2 : null, targetRatio };
}

/** How far the ratio is from the maker's target: within 20 % a note, beyond it a warning (common practice, no source). */
export function judgeAirflow(summary: AirflowSummary): Finding[] {
  const { ratio, targetRatio, primaryAreaMm2, secondaryAreaMm2 } = summary;
  if (primaryAreaMm2 === 0 && secondaryAreaMm2 === 0) return [];
  const numbers = { primaryAreaMm2: round(primaryAreaMm2), secondaryAreaMm2: round(secondaryAreaMm2), targetRatio };
  if (ratio === null) {
    return [{ rule: 'airflow-ratio', severity: 'warning', message: 'There are primary holes but no secondary jets: the smoke will not burn off.', numbers, holeIds: [] }];
  }
  if (primaryAreaMm2 === 0) {
    return [{ rule: 'airflow-ratio', severity: 'warning', message: 'There are secondary jets but no primary holes: the fuel will starve.', numbers, holeIds: [] }];
  }
  const off = ratio / targetRatio - 1;
  const text = `Primary : secondary open area is ${round(ratio, 1)} : 1 (target ${round(targetRatio, 1)} : 1)`;
  if (Math.abs(off) <= 0.2) return [{ rule: 'airflow-ratio', severity: 'note', message: `${text}.`, numbers: { ...numbers, ratio: round(ratio, 3) }, holeIds: [] }];
  const advice = off > 0 ? 'more primary air than the target: add jets or use fewer primary holes' : 'less primary air than the target: add primary holes or use fewer jets';
  return [{ rule: 'airflow-ratio', severity: 'warning', message: `${text}: ${advice}.`, numbers: { ...numbers, ratio: round(ratio, 3) }, holeIds: [] }];
}

function round(value: number, digits = 2): number {
  const f = 10 ** digits;
  return Math.round(value * f) / f;
}
