import { useFieldArray, useFormContext } from 'react-hook-form';
import { MAX_KEEP_OUTS, type DesignInput } from '../../../../shared/design/design-schema.ts';
import { useProblems } from '../design-problems.tsx';
import { NumberField, SelectField, TextInputField } from './field.tsx';

/** Arcs of wall a row's holes keep out of (the seam, a handle, a window), and what happens to holes there. */
export function KeepOutsEditor({ partIndex, rowIndex, rowName, seamAngleDeg }: { partIndex: number; rowIndex: number; rowName: string; seamAngleDeg: number }) {
  const { control, register } = useFormContext<DesignInput>();
  const base = `parts.${partIndex}.sideRows.${rowIndex}` as const;
  const keepOuts = useFieldArray({ control, name: `${base}.keepOuts` });
  const problemAt = useProblems();
  const seam = Number.isFinite(seamAngleDeg) ? seamAngleDeg : 0;
  return (
    <div className="col-span-2 flex flex-col gap-2 @lg:col-span-4">
      {keepOuts.fields.map((field, k) => {
        const at = `${base}.keepOuts.${k}` as const;
        const context = `keep-out ${k + 1} of ${rowName}`;
        return (
          <div key={field.id} role="group" aria-label={`Keep-out ${k + 1}`} className="grid grid-cols-2 gap-2 rounded border border-dashed border-rule p-2 @lg:grid-cols-4">
            <TextInputField label="Keep-out name" context={context} error={problemAt(`${at}.label`)} {...register(`${at}.label`)} />
            <NumberField label="From (°)" context={context} step="any" error={problemAt(`${at}.startDeg`)} {...register(`${at}.startDeg`, { valueAsNumber: true })} />
            <NumberField label="To (°)" context={context} step="any" error={problemAt(`${at}.endDeg`)} {...register(`${at}.endDeg`, { valueAsNumber: true })} />
            <div className="flex items-end">
              <button type="button" onClick={() => keepOuts.remove(k)} className="min-h-9 rounded-md border border-danger/40 px-3 text-sm text-danger hover:bg-danger/5">
                Remove keep-out<span className="sr-only"> {k + 1} of {rowName}</span>
              </button>
            </div>
          </div>
        );
      })}
      <div className="flex flex-wrap items-end gap-2">
        {keepOuts.fields.length > 0 && (
          <SelectField label="Holes in a keep-out" context={rowName} {...register(`${base}.keepOutPolicy`)}>
            <option value="drop">are left out</option>
            <option value="respace">move: all holes share the free wall</option>
          </SelectField>
        )}
        <button
          type="button"
          disabled={keepOuts.fields.length >= MAX_KEEP_OUTS}
          // A seam keep-out 10 degrees either side of the seam: about 7 mm on a 303 can (common practice, no source).
          onClick={() => keepOuts.append(keepOuts.fields.length === 0 ? { label: 'Seam', startDeg: seam - 10, endDeg: seam + 10 } : { label: `Keep-out ${keepOuts.fields.length + 1}`, startDeg: seam + 170, endDeg: seam + 190 })}
          className="min-h-9 rounded-md border border-rule bg-white px-3 text-sm hover:bg-ember-50 disabled:opacity-50"
        >
          Add a keep-out<span className="sr-only"> to {rowName}</span>
        </button>
      </div>
    </div>
  );
}
