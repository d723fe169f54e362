import { Controller, useFormContext, useWatch } from 'react-hook-form';
import type { DesignInput } from '../../../../shared/design/design-schema.ts';
import { findDrill } from '../../../../shared/drills/index.ts';
import { describeRowPositions } from '../../../../shared/layout/describe-row.ts';
import { sideRowSchema } from '../../../../shared/design/design-schema.ts';
import type { UnitSystem } from '../../../../shared/units/length.ts';
import { useProblems } from '../design-problems.tsx';
import { DrillOptions, useDrillChoices } from './drill-options.tsx';
import { NumberField, SelectField, TextInputField } from './field.tsx';
import { KeepOutsEditor } from './keep-outs-editor.tsx';
import { LengthInput } from './length-input.tsx';
import { SkipPicker } from './skip-picker.tsx';

/** One row of holes round the wall: where, how many, which are left out, and the arcs it keeps out of. */
export function SideRowEditor({ partIndex, rowIndex, units, onRemove }: { partIndex: number; rowIndex: number; units: UnitSystem; onRemove(): void }) {
  const { register, control, setValue } = useFormContext<DesignInput>();
  const base = `parts.${partIndex}.sideRows.${rowIndex}` as const;
  const row = useWatch({ control, name: base });
  const vessel = useWatch({ control, name: `parts.${partIndex}.vessel` });
  const choices = useDrillChoices(units);
  const problemAt = useProblems();
  const rowName = row?.label?.trim() || `Row ${rowIndex + 1}`;
  const valid = sideRowSchema.safeParse(row);
  const drill = valid.success ? findDrill(valid.data.drillId) : undefined;
  const words = valid.success && drill && vessel ? describeRowPositions(valid.data, drill.diameterMm, vessel.outerDiameterMm, vessel.seamAngleDeg ?? 0) : undefined;

  // Positions past the end of a shortened row no longer exist: they stop being left out.
  function pruneSkips(count: number) {
    const skip = row?.skip ?? [];
    if (Number.isInteger(count) && skip.some((s) => s >= count)) setValue(`${base}.skip`, skip.filter((s) => s < count), { shouldDirty: true });
  }

  return (
    <fieldset className="grid grid-cols-2 gap-2 rounded-md border border-rule p-3 @lg:grid-cols-4">
      <legend className="px-1 text-sm font-medium">{rowName}</legend>
      <TextInputField label="Name" context={`row ${rowIndex + 1}`} error={problemAt(`${base}.label`)} {...register(`${base}.label`)} />
      <SelectField label="Air" context={rowName} {...register(`${base}.group`)}>
        <option value="secondary">Secondary (jets)</option>
        <option value="primary">Primary</option>
        <option value="intake">Shell intake</option>
        <option value="other">Other</option>
      </SelectField>
      <SelectField label="Drill" context={rowName} error={problemAt(`${base}.drillId`)} {...register(`${base}.drillId`)}>
        <DrillOptions choices={choices} current={row?.drillId ?? ''} />
      </SelectField>
      <NumberField label="Holes (positions)" context={rowName} min={1} max={720} error={problemAt(`${base}.count`)} {...register(`${base}.count`, { valueAsNumber: true, onChange: (e: { target: HTMLInputElement }) => pruneSkips(e.target.valueAsNumber) })} />
      <SelectField label="Height from" context={rowName} {...register(`${base}.height.from`)}>
        <option value="bottom">the bottom</option>
        <option value="top">the top rim</option>
      </SelectField>
      <Controller
        control={control}
        name={`${base}.height.mm`}
        render={({ field }) => <LengthInput label="Height of centres" context={rowName} allowZero units={units} valueMm={field.value} error={problemAt(`${base}.height.mm`)} inputRef={field.ref} onChange={(mm) => mm !== undefined && field.onChange(mm)} />}
      />
      <NumberField label="Start angle (°)" context={rowName} step="any" error={problemAt(`${base}.startDeg`)} hint="From the design's 0° line, counter-clockwise seen from above." {...register(`${base}.startDeg`, { valueAsNumber: true })} />
      <div className="flex items-end">
        <button type="button" onClick={onRemove} className="min-h-9 rounded-md border border-danger/40 px-3 text-sm text-danger hover:bg-danger/5">
          Remove row<span className="sr-only">: {rowName}</span>
        </button>
      </div>
      <div className="col-span-2 flex flex-col gap-1 @lg:col-span-4" data-field={`${base}.skip`} tabIndex={-1}>
        <p className="text-sm" aria-live="polite">
          {words ?? 'Fix the values above to see where the holes go.'}
        </p>
        <SkipPicker count={row?.count ?? 0} startDeg={row?.startDeg ?? 0} seamAngleDeg={vessel?.seamAngleDeg ?? 0} skip={row?.skip ?? []} rowName={rowName} onChange={(skip) => setValue(`${base}.skip`, skip, { shouldDirty: true })} />
        {problemAt(`${base}.skip`, true) && <p className="text-xs text-danger">{problemAt(`${base}.skip`, true)}</p>}
      </div>
      <KeepOutsEditor partIndex={partIndex} rowIndex={rowIndex} rowName={rowName} seamAngleDeg={vessel?.seamAngleDeg ?? 0} />
    </fieldset>
  );
}
