import { Controller, useFormContext, useWatch } from 'react-hook-form';
import type { DesignInput } from '../../../../shared/design/design-schema.ts';
import type { UnitSystem } from '../../../../shared/units/length.ts';
import { useAccount } from '../../account/api/get-account.ts';
import { DrillOptions, drillChoices } from './drill-options.tsx';
import { NumberField, SelectField } from './field.tsx';
import { LengthInput } from './length-input.tsx';

/** Rings of holes on a can end. */
export function EndPatternEditor({ partIndex, patternIndex, units, onRemove }: { partIndex: number; patternIndex: number; units: UnitSystem; onRemove(): void }) {
  const { register, control, setValue } = useFormContext<DesignInput>();
  const base = `parts.${partIndex}.endPatterns.${patternIndex}` as const;
  const pattern = useWatch({ control, name: base });
  const drillSet = useWatch({ control, name: 'drillSet.drillIds' }) ?? [];
  const { data: account } = useAccount();
  const plan = pattern?.rings;

  function switchStrategy(strategy: string) {
    if (strategy === 'explicit') setValue(`${base}.rings`, { strategy: 'explicit', rings: [{ radiusMm: 10, count: 6, phaseDeg: 0 }] }, { shouldDirty: true });
    else if (strategy === 'equal-pitch') setValue(`${base}.rings`, { strategy: 'equal-pitch', ringCount: 3, targetPitchMm: 12, firstRadiusMm: 10, ringSpacingMm: 10 }, { shouldDirty: true });
    else setValue(`${base}.rings`, { strategy: 'divider', ringCount: 3, firstCount: 4, firstRadiusMm: 10, ringSpacingMm: 10 }, { shouldDirty: true });
  }

  return (
    <fieldset className="grid grid-cols-2 gap-2 rounded-md border border-rule p-3 @lg:grid-cols-4">
      <legend className="px-1 text-sm font-medium">{pattern?.label || pattern?.id} (can {pattern?.face ?? 'bottom'})</legend>
      <SelectField label="Air" {...register(`${base}.group`)}>
        <option value="primary">Primary</option>
        <option value="secondary">Secondary</option>
        <option value="intake">Intake</option>
        <option value="other">Other</option>
      </SelectField>
      <SelectField label="Drill" {...register(`${base}.drillId`)}>
        <DrillOptions choices={drillChoices(drillSet, units, account?.drillSetIds)} current={pattern?.drillId ?? ''} />
      </SelectField>
      <SelectField label="Rings" value={plan?.strategy} onChange={(e) => switchStrategy(e.target.value)}>
        <option value="divider">Doubling counts (4, 8, 16…)</option>
        <option value="equal-pitch">Equal pitch</option>
        <option value="explicit">Set each ring</option>
      </SelectField>
      <div className="flex flex-col justify-end gap-1 text-sm">
        <label className="flex items-center gap-2">
          <input type="checkbox" {...register(`${base}.centerHole`)} /> Centre hole
        </label>
        <label className="flex items-center gap-2">
          <input type="checkbox" {...register(`${base}.stagger`)} /> Stagger rings
        </label>
      </div>
      {plan && plan.strategy !== 'explicit' && (
        <>
          <NumberField label="Number of rings" min={1} max={20} {...register(`${base}.rings.ringCount`, { valueAsNumber: true })} />
          {plan.strategy === 'divider' ? (
            <NumberField label="Holes in first ring" min={1} {...register(`${base}.rings.firstCount`, { valueAsNumber: true })} />
          ) : (
            <Controller control={control} name={`${base}.rings.targetPitchMm`} render={({ field }) => <LengthInput label="Target pitch" units={units} valueMm={field.value} onChange={field.onChange} />} />
          )}
          <Controller control={control} name={`${base}.rings.firstRadiusMm`} render={({ field }) => <LengthInput label="First ring radius" units={units} valueMm={field.value} onChange={field.onChange} />} />
          <Controller control={control} name={`${base}.rings.ringSpacingMm`} render={({ field }) => <LengthInput label="Ring spacing" units={units} valueMm={field.value} onChange={field.onChange} />} />
        </>
      )}
      {plan?.strategy === 'explicit' &&
        plan.rings?.map((_, ring) => (
          <div key={ring} className="col-span-2 grid grid-cols-3 gap-2 @lg:col-span-4">
            <Controller control={control} name={`${base}.rings.rings.${ring}.radiusMm`} render={({ field }) => <LengthInput label={`Ring ${ring + 1} radius`} units={units} valueMm={field.value} onChange={field.onChange} />} />
            <NumberField label="Holes" min={1} {...register(`${base}.rings.rings.${ring}.count`, { valueAsNumber: true })} />
            <NumberField label="Turn (°)" step="any" {...register(`${base}.rings.rings.${ring}.phaseDeg`, { valueAsNumber: true })} />
          </div>
        ))}
      <div className="flex items-end">
        <button type="button" onClick={onRemove} className="min-h-9 rounded-md border border-danger/40 px-3 text-sm text-danger hover:bg-danger/5">
          Remove rings
        </button>
      </div>
    </fieldset>
  );
}
