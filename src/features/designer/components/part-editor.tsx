import { useFieldArray, useFormContext } from 'react-hook-form';
import type { DesignInput } from '../../../../shared/design/design-schema.ts';
import type { UnitSystem } from '../../../../shared/units/length.ts';
import { EndPatternEditor } from './end-pattern-editor.tsx';
import { SideRowEditor } from './side-row-editor.tsx';
import { VesselField } from './vessel-field.tsx';

const roleNames = { 'burn-chamber': 'Burn chamber', shell: 'Outer shell', concentrator: 'Concentrator', 'pot-stand': 'Pot stand' } as const;

/** A part: its can, its rows of holes round the wall and its rings on the can end. */
export function PartEditor({ partIndex, units }: { partIndex: number; units: UnitSystem }) {
  const { control, getValues } = useFormContext<DesignInput>();
  const rows = useFieldArray({ control, name: `parts.${partIndex}.sideRows` });
  const patterns = useFieldArray({ control, name: `parts.${partIndex}.endPatterns` });
  const role = getValues(`parts.${partIndex}.role`);
  const nextId = (prefix: string, taken: { id?: string }[]) => {
    for (let n = taken.length + 1; ; n++) if (!taken.some((t) => t.id === `${prefix}-${n}`)) return `${prefix}-${n}`;
  };

  return (
    <div className="flex flex-col gap-3">
      <p className="text-sm text-ink-soft">{roleNames[role]}</p>
      <VesselField partIndex={partIndex} units={units} />
      {rows.fields.map((field, r) => (
        <SideRowEditor key={field.id} partIndex={partIndex} rowIndex={r} units={units} onRemove={() => rows.remove(r)} />
      ))}
      {patterns.fields.map((field, e) => (
        <EndPatternEditor key={field.id} partIndex={partIndex} patternIndex={e} units={units} onRemove={() => patterns.remove(e)} />
      ))}
      <div className="flex flex-wrap gap-2">
        <button
          type="button"
          className="min-h-9 rounded-md border border-rule bg-white px-3 text-sm hover:bg-ember-50"
          onClick={() => rows.append({ id: nextId('row', getValues(`parts.${partIndex}.sideRows`) ?? []), label: 'New row', group: 'secondary', drillId: units === 'mm' ? 'mm:5' : 'frac:3/16', count: 16, skip: [], height: { from: 'top', mm: 15 }, startDeg: 0, keepOuts: [], keepOutPolicy: 'drop' })}
        >
          Add a row round the wall
        </button>
        <button
          type="button"
          className="min-h-9 rounded-md border border-rule bg-white px-3 text-sm hover:bg-ember-50"
          onClick={() => patterns.append({ id: nextId('rings', getValues(`parts.${partIndex}.endPatterns`) ?? []), label: 'Bottom rings', group: 'primary', face: 'bottom', drillId: units === 'mm' ? 'mm:6' : 'frac:1/4', centerHole: true, stagger: true, phaseDeg: 0, rings: { strategy: 'divider', ringCount: 2, firstCount: 4, firstRadiusMm: 10, ringSpacingMm: 10 } })}
        >
          Add rings on the bottom
        </button>
      </div>
    </div>
  );
}
