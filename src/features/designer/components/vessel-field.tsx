import { useState } from 'react';
import { Controller, useFormContext, useWatch } from 'react-hook-form';
import type { DesignInput } from '../../../../shared/design/design-schema.ts';
import type { UnitSystem } from '../../../../shared/units/length.ts';
import { searchCatalogue, vesselFromCatalogue, vesselFromCircumference } from '../../../../shared/vessels/index.ts';
import { LengthInput } from './length-input.tsx';

/** The can of a part: picked from the catalogue (search by trade code or size) or measured. */
export function VesselField({ partIndex, units }: { partIndex: number; units: UnitSystem }) {
  const { control, setValue } = useFormContext<DesignInput>();
  const vessel = useWatch({ control, name: `parts.${partIndex}.vessel` });
  const [query, setQuery] = useState('');
  const results = searchCatalogue(query).slice(0, 30);

  return (
    <fieldset className="flex flex-col gap-2 rounded-md border border-rule p-3">
      <legend className="px-1 text-sm font-medium">Can</legend>
      <p className="text-sm">
        <strong>{vessel.name}</strong> · {vessel.outerDiameterMm.toFixed(1)} × {vessel.heightMm.toFixed(1)} mm
      </p>
      <div className="grid gap-2 @md:grid-cols-2">
        <div className="flex flex-col gap-1">
          <label className="text-xs font-medium text-ink-soft" htmlFor={`can-search-${partIndex}`}>
            Find a can (trade code such as 303x406, or a size)
          </label>
          <input id={`can-search-${partIndex}`} value={query} onChange={(e) => setQuery(e.target.value)} className="min-h-9 rounded-md border border-rule bg-white px-2 text-sm" />
        </div>
        <div className="flex flex-col gap-1">
          <label className="text-xs font-medium text-ink-soft" htmlFor={`can-pick-${partIndex}`}>
            Catalogue
          </label>
          <select
            id={`can-pick-${partIndex}`}
            value={vessel.catalogueId ?? ''}
            onChange={(e) => e.target.value && setValue(`parts.${partIndex}.vessel`, { ...vesselFromCatalogue(e.target.value), seamAngleDeg: vessel.seamAngleDeg ?? 0 }, { shouldDirty: true })}
            className="min-h-9 rounded-md border border-rule bg-white px-2 text-sm"
          >
            <option value="">Measured can</option>
            {results.map((entry) => (
              <option key={entry.id} value={entry.id}>
                {entry.name}
              </option>
            ))}
          </select>
        </div>
      </div>
      <div className="grid grid-cols-2 gap-2 @md:grid-cols-3">
        <Controller
          control={control}
          name={`parts.${partIndex}.vessel.outerDiameterMm`}
          render={({ field, fieldState }) => (
            <LengthInput label="Diameter over the seam" units={units} valueMm={field.value} error={fieldState.error?.message} onChange={(mm) => (field.onChange(mm), setValue(`parts.${partIndex}.vessel.source`, 'measured'))} />
          )}
        />
        <LengthInput
          label="or tape circumference"
          units={units}
          valueMm={Math.PI * vessel.outerDiameterMm}
          onChange={(mm) => setValue(`parts.${partIndex}.vessel`, { ...vessel, ...vesselFromCircumference({ circumferenceMm: mm, heightMm: vessel.heightMm }), seamAngleDeg: vessel.seamAngleDeg ?? 0 }, { shouldDirty: true })}
        />
        <Controller
          control={control}
          name={`parts.${partIndex}.vessel.heightMm`}
          render={({ field, fieldState }) => <LengthInput label="Height" units={units} valueMm={field.value} error={fieldState.error?.message} onChange={field.onChange} />}
        />
      </div>
    </fieldset>
  );
}
