import { useState } from 'react';
import { Controller, useFormContext, useWatch } from 'react-hook-form';
import type { DesignInput } from '../../../../shared/design/design-schema.ts';
import type { UnitSystem } from '../../../../shared/units/length.ts';
import { formatLength } from '../../../../shared/units/index.ts';
import { diameterFromCircumference, editVessel, findCatalogueVessel, searchCatalogue, vesselFromCatalogue, type VesselInput } from '../../../../shared/vessels/index.ts';
import { useProblems } from '../design-problems.tsx';
import { Labelled, NumberField, TextInputField } from './field.tsx';
import { LengthInput } from './length-input.tsx';

type SizeField = 'outerDiameterMm' | 'heightMm' | 'wallThicknessMm' | 'bottomRimInsetMm';

/** The can of a part: picked from the catalogue (search by trade code or size) or measured, and where its seam is. */
export function VesselField({ partIndex, units, partName }: { partIndex: number; units: UnitSystem; partName: string }) {
  const { control, setValue, register } = useFormContext<DesignInput>();
  const base = `parts.${partIndex}.vessel` as const;
  const vessel = useWatch({ control, name: base }) as VesselInput;
  const [query, setQuery] = useState('');
  const results = searchCatalogue(query).slice(0, 30);
  const current = vessel.catalogueId ? findCatalogueVessel(vessel.catalogueId) : undefined;
  const options = current && !results.some((r) => r.id === current.id) ? [current, ...results] : results;
  const problemAt = useProblems();
  const problem = (field: string) => problemAt(`${base}.${field}`);
  const edit = (change: Partial<VesselInput>) => setValue(base, editVessel(vessel, change), { shouldDirty: true });
  const size = (field: SizeField, label: string, hint?: string) => (
    <Controller
      control={control}
      name={`${base}.${field}`}
      render={({ field: f }) => <LengthInput label={label} context={partName} hint={hint} allowZero={field === 'bottomRimInsetMm'} fine={field === 'wallThicknessMm'} units={units} valueMm={f.value} error={problem(field)} inputRef={f.ref} onChange={(mm) => mm !== undefined && edit({ [field]: mm })} />}
    />
  );

  return (
    <fieldset className="flex flex-col gap-2 rounded-md border border-rule p-3">
      <legend className="px-1 text-sm font-medium">Can</legend>
      <p className="text-sm">
        <strong>{vessel.name}</strong> · {formatLength(vessel.outerDiameterMm, units)} across × {formatLength(vessel.heightMm, units)} tall
        {vessel.source === 'measured' && <span className="text-ink-soft"> · measured</span>}
      </p>
      <div className="grid gap-2 @md:grid-cols-2">
        <Labelled label="Find a can (trade code such as 303x406, or a size)" context={partName}>
          {(id) => <input id={id} value={query} onChange={(e) => setQuery(e.target.value)} className="min-h-9 rounded-md border border-rule bg-white px-2 text-sm" />}
        </Labelled>
        <Labelled label={query ? `Catalogue cans matching “${query}”` : 'Catalogue can'} context={partName}>
          {(id) => (
            <select
              id={id}
              value={vessel.catalogueId ?? ''}
              onChange={(e) => e.target.value && setValue(base, { ...vesselFromCatalogue(e.target.value), seamAngleDeg: vessel.seamAngleDeg ?? 0 }, { shouldDirty: true })}
              className="min-h-9 rounded-md border border-rule bg-white px-2 text-sm"
            >
              {!current && <option value="">{vessel.source === 'measured' ? 'A measured can (choose one to replace it)' : 'Choose a can'}</option>}
              {options.map((entry) => (
                <option key={entry.id} value={entry.id}>
                  {entry.name}
                </option>
              ))}
              {options.length === 0 && <option disabled>No catalogue can matches</option>}
            </select>
          )}
        </Labelled>
      </div>
      <div className="grid grid-cols-2 gap-2 @md:grid-cols-3">
        {size('outerDiameterMm', 'Diameter over the seam')}
        <LengthInput label="or tape circumference" context={partName} units={units} valueMm={Math.PI * vessel.outerDiameterMm} onChange={(mm) => mm !== undefined && edit({ outerDiameterMm: diameterFromCircumference(mm) })} />
        {size('heightMm', 'Height')}
        {size('wallThicknessMm', 'Wall thickness')}
        {size('bottomRimInsetMm', 'Bottom rim width', 'From the outside to where the flat bottom starts.')}
        <NumberField label="Seam angle (°)" context={partName} step="any" error={problem('seamAngleDeg')} hint="Drag the seam in the view from above, or type." {...register(`${base}.seamAngleDeg`, { valueAsNumber: true })} />
        {vessel.source === 'measured' && <TextInputField label="Can name" context={partName} error={problem('name')} {...register(`${base}.name`)} />}
      </div>
    </fieldset>
  );
}
