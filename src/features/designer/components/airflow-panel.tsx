import { useState } from 'react';
import { useFormContext } from 'react-hook-form';
import { applyPrimarySplit, proposePrimarySplits, type PrimarySplit } from '../../../../shared/airflow/index.ts';
import type { Design, DesignInput } from '../../../../shared/design/design-schema.ts';
import type { Layout } from '../../../../shared/layout/index.ts';
import type { UnitSystem } from '../../../../shared/units/length.ts';
import { Button } from '../../../components/button.tsx';
import { useProblem } from '../design-problems.tsx';
import { DrillOptions, useDrillChoices } from './drill-options.tsx';
import { JetSolver } from './jet-solver.tsx';

const groupNames = { primary: 'Primary air', secondary: 'Secondary air (jets)', intake: 'Shell intake', other: 'Other holes' } as const;

/** Open area per group as sq in or mm² (1 sq in = 645.16 mm², exact from 25.4 mm). */
function area(mm2: number, units: UnitSystem): string {
  return units === 'in' ? `${(mm2 / 645.16).toFixed(3)} sq in` : `${Math.round(mm2)} mm²`;
}

/** "5.0 : 1", the one way a ratio is written on screen and on paper. */
export const formatRatio = (ratio: number | null) => (ratio === null ? '–' : `${ratio.toFixed(1)} : 1`);

interface AirflowPanelProps {
  design: Design;
  layout: Layout;
  units: UnitSystem;
  stale: boolean;
  onApply(next: Design): void;
}

/** Open areas, the air ratio against its target, and the solvers: primary splits and jet counts. */
export function AirflowPanel({ design, layout, units, stale, onApply }: AirflowPanelProps) {
  const { register } = useFormContext<DesignInput>();
  const targetProblem = useProblem('airflow.targetRatio');
  const chamber = design.parts.find((p) => p.role === 'burn-chamber');
  const choices = useDrillChoices(units);
  // Start from the drill the primary holes already use, else the one nearest 1/4 in (6.35 mm).
  const current = design.parts.flatMap((p) => [...p.sideRows, ...p.endPatterns]).find((r) => r.group === 'primary')?.drillId;
  const nearestQuarter = [...choices].sort((a, b) => Math.abs(a.diameterMm - 6.35) - Math.abs(b.diameterMm - 6.35))[0]?.id;
  const [drillId, setDrillId] = useState(current ?? nearestQuarter ?? 'frac:1/4');
  const [splits, setSplits] = useState<PrimarySplit[] | null>(null);
  const { ratio, targetRatio } = layout.airflow;

  return (
    <section aria-labelledby="airflow-heading" className="flex flex-col gap-3">
      <h2 id="airflow-heading" className="font-semibold">
        Air
      </h2>
      <table className="text-sm">
        <caption className="sr-only">Holes and open area by air group</caption>
        <tbody>
          {layout.groups.map((group) => (
            <tr key={group.group}>
              <th scope="row" className="py-0.5 pr-3 text-left font-normal text-ink-soft">
                {groupNames[group.group]}
              </th>
              <td className="py-0.5 pr-3">{group.holeCount} holes</td>
              <td className="py-0.5">{area(group.openAreaMm2, units)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <div className="flex flex-wrap items-center gap-x-3 gap-y-1 text-sm">
        <p aria-live="polite">
          Primary : secondary = <strong>{formatRatio(ratio)}</strong>
          {!stale && <span className="sr-only">, target {formatRatio(targetRatio)}</span>}
        </p>
        <label className="inline-flex items-center gap-1">
          target
          <input type="number" step={0.5} min={0.5} max={50} {...register('airflow.targetRatio', { valueAsNumber: true })} aria-invalid={targetProblem ? true : undefined} aria-describedby={targetProblem ? 'target-ratio-error' : undefined} className="w-16 rounded border border-rule px-1 aria-[invalid]:border-danger" aria-label="Target primary to secondary ratio" />
          : 1
        </label>
        {targetProblem && (
          <span id="target-ratio-error" className="text-xs text-danger">
            Target ratio: {targetProblem}
          </span>
        )}
      </div>
      {chamber && (
        <div className="flex flex-col gap-2 rounded-md border border-rule bg-white p-3">
          <div className="flex flex-wrap items-end gap-2">
            <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
              Primary drill
              <select value={drillId} onChange={(e) => setDrillId(e.target.value)} className="min-h-9 rounded-md border border-rule bg-white px-2 text-sm text-ink">
                <DrillOptions choices={choices} current={drillId} />
              </select>
            </label>
            <Button variant="secondary" disabled={stale} onClick={() => setSplits(proposePrimarySplits(design, { partId: chamber.id, drillId }))}>
              Suggest primary holes
            </Button>
          </div>
          {splits?.length === 0 && <p className="text-sm text-ink-soft">No split of that drill reaches the target and fits the bottom. Try another drill or target.</p>}
          {splits && splits.length > 0 && (
            <ul className="flex flex-col gap-1 text-sm">
              {splits.map((split) => (
                <li key={split.description} className="flex items-center justify-between gap-2">
                  <span>
                    {split.description} · {split.totalHoles} holes · {formatRatio(split.ratio)}
                  </span>
                  <Button variant="secondary" disabled={stale} onClick={() => (onApply(applyPrimarySplit(design, chamber.id, split)), setSplits(null))}>
                    Apply<span className="sr-only">: {split.description}</span>
                  </Button>
                </li>
              ))}
            </ul>
          )}
        </div>
      )}
      <JetSolver design={design} units={units} stale={stale} />
    </section>
  );
}
