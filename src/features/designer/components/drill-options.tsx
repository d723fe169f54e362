import { allDrills, commonDrillSets, drillsInSeries, resolveDrillSet, type Drill } from '../../../../shared/drills/index.ts';
import type { UnitSystem } from '../../../../shared/units/length.ts';

/** Drills offered for a hole: the design's set, else the maker's own (account), else the usual drills of their units. */
export function drillChoices(drillSetIds: string[], units: UnitSystem, accountSetIds: string[] = []): Drill[] {
  if (drillSetIds.length) return resolveDrillSet({ name: 'set', drillIds: drillSetIds });
  if (accountSetIds.length) return resolveDrillSet({ name: 'mine', drillIds: accountSetIds });
  if (units === 'mm') return drillsInSeries('metric').filter((d) => d.diameterMm >= 1 && d.diameterMm <= 13 && Math.round(d.diameterMm * 10) % 5 === 0);
  return [...resolveDrillSet(commonDrillSets[0]!), ...drillsInSeries('number').filter((d) => d.diameterMm >= 1.5), ...drillsInSeries('letter')].sort((a, b) => a.diameterMm - b.diameterMm);
}

export function DrillOptions({ choices, current }: { choices: Drill[]; current: string }) {
  const list = choices.some((d) => d.id === current) ? choices : [...(allDrills().filter((d) => d.id === current)), ...choices];
  return (
    <>
      {list.map((drill) => (
        <option key={drill.id} value={drill.id}>
          {drill.label} ({drill.diameterMm.toFixed(2)} mm)
        </option>
      ))}
    </>
  );
}
