import { useState } from 'react';
import { applyPrimarySplit, proposePrimarySplits, type PrimarySplit } from '../../../../shared/airflow/index.ts';
import type { Design } from '../../../../shared/design/design-schema.ts';
import type { Layout } from '../../../../shared/layout/index.ts';
import type { UnitSystem } from '../../../../shared/units/length.ts';
import { Button } from '../../../components/button.tsx';
import { useAccount } from '../../account/api/get-account.ts';
import { DrillOptions, drillChoices } from './drill-options.tsx';

const groupNames = { primary: 'Primary air', secondary: 'Secondary air (jets)', intake: 'Shell intake', other: 'Other holes' } as const;

/** Open area per group as sq in or mm² (1 sq in = 645.16 mm², exact from 25.4 mm). */
function area(mm2: number, units: UnitSystem): string {
  return units === 'in' ? `${(mm2 / 645.16).toFixed(3)} sq in` : `${Math.round(mm2)} mm²`;
}

export function AirflowPanel({ design, layout, units, onTargetChange, onApply }: { design: Design; layout: Layout; units: UnitSystem; onTargetChange(ratio: number): void; onApply(next: Design): void }) {
  const chamber = design.parts.find((p) => p.role === 'burn-chamber');
  const { data: account } = useAccount();
  const choices = drillChoices(design.drillSet.drillIds, units, account?.drillSetIds);
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
      <p className="text-sm">
        Primary : secondary = <strong>{ratio === null ? '–' : `${ratio.toFixed(1)} : 1`}</strong>
        <label className="ml-3 inline-flex items-center gap-1">
          target
          <TargetRatioInput value={targetRatio} onChange={onTargetChange} />
          : 1
        </label>
      </p>
      {chamber && (
        <div className="flex flex-col gap-2 rounded-md border border-rule bg-white p-3">
          <div className="flex flex-wrap items-end gap-2">
            <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
              Primary drill
              <select value={drillId} onChange={(e) => setDrillId(e.target.value)} className="min-h-9 rounded-md border border-rule bg-white px-2 text-sm text-ink">
                <DrillOptions choices={choices} current={drillId} />
              </select>
            </label>
            <Button variant="secondary" onClick={() => setSplits(proposePrimarySplits(design, { partId: chamber.id, drillId }))}>
              Suggest primary holes
            </Button>
          </div>
          {splits?.length === 0 && <p className="text-sm text-ink-soft">No split of that drill reaches the target and fits the bottom. Try another drill or target.</p>}
          {splits && splits.length > 0 && (
            <ul className="flex flex-col gap-1 text-sm">
              {splits.map((split) => (
                <li key={split.description} className="flex items-center justify-between gap-2">
                  <span>
                    {split.description} · {split.totalHoles} holes · {split.ratio.toFixed(2)} : 1
                  </span>
                  <Button variant="secondary" onClick={() => (onApply(applyPrimarySplit(design, chamber.id, split)), setSplits(null))}>
                    Apply
                  </Button>
                </li>
              ))}
            </ul>
          )}
        </div>
      )}
    </section>
  );
}

/** The schema caps the target at 50 (shared/design/design-schema.ts); under 0.5 : 1 no stove draws its jets (common practice, no source). */
const TARGET_MIN = 0.5;
const TARGET_MAX = 50;

/**
 * The target ratio as typed: only a number in range reaches the design, so a half-typed "54" can
 * never make the design invalid (which would hide this very box); out of range shows why instead.
 */
function TargetRatioInput({ value, onChange }: { value: number; onChange(ratio: number): void }) {
  const [text, setText] = useState(String(value));
  const [lastValue, setLastValue] = useState(value);
  if (value !== lastValue) {
    setLastValue(value);
    setText(String(value));
  }
  const typed = Number(text);
  const inRange = text.trim() !== '' && typed >= TARGET_MIN && typed <= TARGET_MAX;
  return (
    <>
      <input
        type="number"
        min={TARGET_MIN}
        max={TARGET_MAX}
        step={0.5}
        value={text}
        onChange={(e) => {
          setText(e.target.value);
          const next = e.target.valueAsNumber;
          if (next >= TARGET_MIN && next <= TARGET_MAX) onChange(next);
        }}
        onBlur={() => !inRange && setText(String(value))}
        aria-invalid={inRange ? undefined : true}
        aria-describedby={inRange ? undefined : 'target-ratio-error'}
        className="w-16 rounded border border-rule px-1 aria-[invalid]:border-danger"
        aria-label="Target primary to secondary ratio"
      />
      {!inRange && (
        <span id="target-ratio-error" className="text-xs text-danger">
          from {TARGET_MIN} to {TARGET_MAX}
        </span>
      )}
    </>
  );
}
