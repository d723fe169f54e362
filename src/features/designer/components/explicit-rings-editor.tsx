import { useState } from 'react';
import { Controller, useFieldArray, useFormContext } from 'react-hook-form';
import { endPatternSchema, MAX_EXPLICIT_RINGS, partSchema, rulesSchema, type DesignInput } from '../../../../shared/design/design-schema.ts';
import { findDrill } from '../../../../shared/drills/index.ts';
import { placeNextRing } from '../../../../shared/layout/place-next.ts';
import type { UnitSystem } from '../../../../shared/units/length.ts';
import { useProblems } from '../design-problems.tsx';
import { NumberField } from './field.tsx';
import { LengthInput } from './length-input.tsx';

/** The rings of a "set each ring" pattern, one by one; a new ring goes where it clears the others. */
export function ExplicitRingsEditor({ partIndex, patternIndex, units, patternName }: { partIndex: number; patternIndex: number; units: UnitSystem; patternName: string }) {
  const { control, register, getValues } = useFormContext<DesignInput>();
  const base = `parts.${partIndex}.endPatterns.${patternIndex}.rings.rings` as const;
  const rings = useFieldArray({ control, name: base });
  const problemAt = useProblems();
  const [note, setNote] = useState<string>();

  function addRing() {
    setNote(undefined);
    const part = partSchema.safeParse(getValues(`parts.${partIndex}`));
    const pattern = endPatternSchema.safeParse(getValues(`parts.${partIndex}.endPatterns.${patternIndex}`));
    const drill = pattern.success ? findDrill(pattern.data.drillId) : undefined;
    if (!part.success || !pattern.success || !drill) return setNote('Fix the values of these rings first; then a new ring can be placed clear of them.');
    const ring = placeNextRing(pattern.data, part.data, drill.diameterMm, rulesSchema.parse(getValues('rules') ?? {}));
    if (!ring) return setNote('No room for another ring: it would come closer to the rim than the check limits allow.');
    rings.append(ring);
  }

  return (
    <div className="col-span-2 flex flex-col gap-2 @lg:col-span-4">
      {rings.fields.map((field, r) => {
        const at = `${base}.${r}` as const;
        const context = `ring ${r + 1} of ${patternName}`;
        return (
          <div key={field.id} role="group" aria-label={`Ring ${r + 1}`} className="grid grid-cols-2 gap-2 @lg:grid-cols-4">
            <Controller control={control} name={`${at}.radiusMm`} render={({ field: f }) => <LengthInput label={`Ring ${r + 1} radius`} context={patternName} units={units} valueMm={f.value} error={problemAt(`${at}.radiusMm`)} inputRef={f.ref} onChange={(mm) => mm !== undefined && f.onChange(mm)} />} />
            <NumberField label="Holes" context={context} min={1} error={problemAt(`${at}.count`)} {...register(`${at}.count`, { valueAsNumber: true })} />
            <NumberField label="Turn (°)" context={context} step="any" error={problemAt(`${at}.phaseDeg`)} {...register(`${at}.phaseDeg`, { valueAsNumber: true })} />
            <div className="flex items-end">
              <button type="button" onClick={() => rings.remove(r)} className="min-h-9 rounded-md border border-danger/40 px-3 text-sm text-danger hover:bg-danger/5">
                Remove ring {r + 1}<span className="sr-only"> of {patternName}</span>
              </button>
            </div>
          </div>
        );
      })}
      {rings.fields.length === 0 && <p className="text-sm text-ink-soft">No rings yet.</p>}
      <div className="flex flex-wrap items-center gap-2">
        <button type="button" onClick={addRing} disabled={rings.fields.length >= MAX_EXPLICIT_RINGS} className="min-h-9 rounded-md border border-rule bg-white px-3 text-sm hover:bg-ember-50 disabled:opacity-50">
          Add a ring<span className="sr-only"> to {patternName}</span>
        </button>
        {note && (
          <p role="status" className="text-sm text-ink-soft">
            {note}
          </p>
        )}
      </div>
    </div>
  );
}
