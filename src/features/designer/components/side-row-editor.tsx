import { Controller, useFormContext, useWatch } from 'react-hook-form';
import type { DesignInput } from '../../../../shared/design/design-schema.ts';
import type { UnitSystem } from '../../../../shared/units/length.ts';
import { useAccount } from '../../account/api/get-account.ts';
import { DrillOptions, drillChoices } from './drill-options.tsx';
import { NumberField, SelectField, TextInputField } from './field.tsx';
import { LengthInput } from './length-input.tsx';

/** One row of holes round the wall. */
export function SideRowEditor({ partIndex, rowIndex, units, onRemove }: { partIndex: number; rowIndex: number; units: UnitSystem; onRemove(): void }) {
  const { register, control, formState } = useFormContext<DesignInput>();
  const base = `parts.${partIndex}.sideRows.${rowIndex}` as const;
  const row = useWatch({ control, name: base });
  const drillSet = useWatch({ control, name: 'drillSet.drillIds' }) ?? [];
  const { data: account } = useAccount();
  const errors = formState.errors.parts?.[partIndex]?.sideRows?.[rowIndex];
  return (
    <fieldset className="grid grid-cols-2 gap-2 rounded-md border border-rule p-3 @lg:grid-cols-4">
      <legend className="px-1 text-sm font-medium">{row?.label || row?.id}</legend>
      <TextInputField label="Name" {...register(`${base}.label`)} />
      <SelectField label="Air" {...register(`${base}.group`)}>
        <option value="secondary">Secondary (jets)</option>
        <option value="primary">Primary</option>
        <option value="intake">Shell intake</option>
        <option value="other">Other</option>
      </SelectField>
      <SelectField label="Drill" {...register(`${base}.drillId`)}>
        <DrillOptions choices={drillChoices(drillSet, units, account?.drillSetIds)} current={row?.drillId ?? ''} />
      </SelectField>
      <NumberField label="Holes (positions)" min={1} max={720} error={errors?.count?.message} {...register(`${base}.count`, { valueAsNumber: true })} />
      <SelectField label="Height from" {...register(`${base}.height.from`)}>
        <option value="bottom">the bottom</option>
        <option value="top">the top rim</option>
      </SelectField>
      <Controller control={control} name={`${base}.height.mm`} render={({ field, fieldState }) => <LengthInput label="Height of centres" units={units} valueMm={field.value} error={fieldState.error?.message} onChange={field.onChange} />} />
      <NumberField label="Start angle (°)" step="any" {...register(`${base}.startDeg`, { valueAsNumber: true })} />
      <div className="flex items-end">
        <button type="button" onClick={onRemove} className="min-h-9 rounded-md border border-danger/40 px-3 text-sm text-danger hover:bg-danger/5">
          Remove row
        </button>
      </div>
    </fieldset>
  );
}
