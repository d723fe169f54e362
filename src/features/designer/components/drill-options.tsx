import { useFormContext, useWatch } from 'react-hook-form';
import type { DesignInput } from '../../../../shared/design/design-schema.ts';
import { allDrills, commonDrillSets, drillsInSeries, resolveDrillSet, type Drill } from '../../../../shared/drills/index.ts';
import type { UnitSystem } from '../../../../shared/units/length.ts';
import { useAccount } from '../../account/api/get-account.ts';

/** Drills offered for a hole: the design's set, else the maker's own (account), else the usual drills of their units. */
export function drillChoices(drillSetIds: string[], units: UnitSystem, accountSetIds: string[] = []): Drill[] {
  if (drillSetIds.length) return resolveDrillSet({ name: 'set', drillIds: drillSetIds });
  if (accountSetIds.length) return resolveDrillSet({ name: 'mine', drillIds: accountSetIds });
  if (units === 'mm') return drillsInSeries('metric').filter((d) => d.diameterMm >= 1 && d.diameterMm <= 13 && Math.round(d.diameterMm * 10) % 5 === 0);
  return [...resolveDrillSet(commonDrillSets[0]!), ...drillsInSeries('number').filter((d) => d.diameterMm >= 1.5), ...drillsInSeries('letter')].sort((a, b) => a.diameterMm - b.diameterMm);
}

/** The drill choices for the design on screen. */
export function useDrillChoices(units: UnitSystem): Drill[] {
  const { control } = useFormContext<DesignInput>();
  const drillSet = useWatch({ control, name: 'drillSet.drillIds' }) ?? [];
  const { data: account } = useAccount();
  return drillChoices(drillSet, units, account?.drillSetIds);
}

/** "3/16 in (4.76 mm)"; a metric drill is its size already. */
export const drillOptionLabel = (drill: Drill) => (drill.series === 'metric' ? drill.label : `${drill.label} (${drill.diameterMm.toFixed(2)} mm)`);

/** The options of a drill list; a drill the list lacks stays shown, and none chosen asks for one. */
export function DrillOptions({ choices, current }: { choices: Drill[]; current: string }) {
  const known = choices.some((d) => d.id === current);
  const list = known ? choices : [...allDrills().filter((d) => d.id === current), ...choices];
  const missing = !list.some((d) => d.id === current);
  return (
    <>
      {missing && <option value={current}>{current ? `Unknown drill “${current}”: choose one` : 'Choose a drill'}</option>}
      {list.map((drill) => (
        <option key={drill.id} value={drill.id}>
          {drillOptionLabel(drill)}
        </option>
      ))}
    </>
  );
}
