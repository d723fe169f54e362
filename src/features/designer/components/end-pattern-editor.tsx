import { Controller, useFormContext, useWatch } from 'react-hook-form';
import type { DesignInput, RingPlan } from '../../../../shared/design/design-schema.ts';
import type { UnitSystem } from '../../../../shared/units/length.ts';
import { useProblems } from '../design-problems.tsx';
import { DrillOptions, useDrillChoices } from './drill-options.tsx';
import { CheckField, NumberField, SelectField, TextInputField } from './field.tsx';
import { ExplicitRingsEditor } from './explicit-rings-editor.tsx';
import { LengthInput } from './length-input.tsx';

/** What a pattern switched to another strategy starts from (10 mm rings: common practice, no source). */
const startingPlans: Record<RingPlan['strategy'], RingPlan> = {
  divider: { strategy: 'divider', ringCount: 3, firstCount: 4, firstRadiusMm: 10, ringSpacingMm: 10 },
  'equal-pitch': { strategy: 'equal-pitch', ringCount: 3, targetPitchMm: 12, firstRadiusMm: 10, ringSpacingMm: 10 },
  explicit: { strategy: 'explicit', rings: [] },
};

/** Rings of holes on a can end. */
export function EndPatternEditor({ partIndex, patternIndex, units, onRemove }: { partIndex: number; patternIndex: number; units: UnitSystem; onRemove(): void }) {
  const { register, control, setValue } = useFormContext<DesignInput>();
  const base = `parts.${partIndex}.endPatterns.${patternIndex}` as const;
  const pattern = useWatch({ control, name: base });
  const choices = useDrillChoices(units);
  const problemAt = useProblems();
  const plan = pattern?.rings;
  const name = pattern?.label?.trim() || `Rings ${patternIndex + 1}`;
  const length = (field: 'targetPitchMm' | 'firstRadiusMm' | 'ringSpacingMm', label: string) => (
    <Controller control={control} name={`${base}.rings.${field}`} render={({ field: f }) => <LengthInput label={label} context={name} units={units} valueMm={f.value} error={problemAt(`${base}.rings.${field}`)} inputRef={f.ref} onChange={(mm) => mm !== undefined && f.onChange(mm)} />} />
  );

  return (
    <fieldset className="grid grid-cols-2 gap-2 rounded-md border border-rule p-3 @lg:grid-cols-4">
      <legend className="px-1 text-sm font-medium">
        {name} (can {pattern?.face === 'lid' ? 'lid' : 'bottom'})
      </legend>
      <TextInputField label="Name" context={`ring pattern ${patternIndex + 1}`} error={problemAt(`${base}.label`)} {...register(`${base}.label`)} />
      <SelectField label="Can end" context={name} {...register(`${base}.face`)}>
        <option value="bottom">Bottom</option>
        <option value="lid">Lid (top end)</option>
      </SelectField>
      <SelectField label="Air" context={name} {...register(`${base}.group`)}>
        <option value="primary">Primary</option>
        <option value="secondary">Secondary</option>
        <option value="intake">Intake</option>
        <option value="other">Other</option>
      </SelectField>
      <SelectField label="Drill" context={name} error={problemAt(`${base}.drillId`)} {...register(`${base}.drillId`)}>
        <DrillOptions choices={choices} current={pattern?.drillId ?? ''} />
      </SelectField>
      <SelectField label="Rings" context={name} value={plan?.strategy} onChange={(e) => setValue(`${base}.rings`, structuredClone(startingPlans[e.target.value as RingPlan['strategy']]), { shouldDirty: true })}>
        <option value="divider">Doubling counts (4, 8, 16…)</option>
        <option value="equal-pitch">Equal pitch</option>
        <option value="explicit">Set each ring</option>
      </SelectField>
      <NumberField label="Turn (°)" context={name} step="any" error={problemAt(`${base}.phaseDeg`)} hint="From the index mark" {...register(`${base}.phaseDeg`, { valueAsNumber: true })} />
      <div className="flex flex-col justify-end">
        <CheckField label="Centre hole" context={name} {...register(`${base}.centerHole`)} />
        <CheckField label="Stagger rings" context={name} {...register(`${base}.stagger`)} />
      </div>
      <div className="flex items-end">
        <button type="button" onClick={onRemove} className="min-h-9 rounded-md border border-danger/40 px-3 text-sm text-danger hover:bg-danger/5">
          Remove rings<span className="sr-only">: {name}</span>
        </button>
      </div>
      {plan && plan.strategy !== 'explicit' && (
        <>
          <NumberField label="Number of rings" context={name} min={1} max={20} error={problemAt(`${base}.rings.ringCount`)} {...register(`${base}.rings.ringCount`, { valueAsNumber: true })} />
          {plan.strategy === 'divider' ? (
            <NumberField label="Holes in first ring" context={name} min={1} error={problemAt(`${base}.rings.firstCount`)} {...register(`${base}.rings.firstCount`, { valueAsNumber: true })} />
          ) : (
            length('targetPitchMm', 'Target pitch')
          )}
          {length('firstRadiusMm', 'First ring radius')}
          {length('ringSpacingMm', 'Ring spacing')}
        </>
      )}
      {plan?.strategy === 'explicit' && <ExplicitRingsEditor partIndex={partIndex} patternIndex={patternIndex} units={units} patternName={name} />}
    </fieldset>
  );
}
