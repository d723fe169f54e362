import { Controller, useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import { freshId, ROLE_NAMES } from '../../../../shared/design/new-design.ts';
import { MAX_END_PATTERNS, MAX_SIDE_ROWS, partRoleSchema, partSchema, type DesignInput, type PartRole } from '../../../../shared/design/design-schema.ts';
import { findDrill } from '../../../../shared/drills/index.ts';
import { placeNextRowHeight } from '../../../../shared/layout/place-next.ts';
import type { UnitSystem } from '../../../../shared/units/length.ts';
import { useProblem } from '../design-problems.tsx';
import { useDrillChoices } from './drill-options.tsx';
import { EndPatternEditor } from './end-pattern-editor.tsx';
import { SelectField, TextInputField } from './field.tsx';
import { LengthInput } from './length-input.tsx';
import { SideRowEditor } from './side-row-editor.tsx';
import { VesselField } from './vessel-field.tsx';

const small = 'min-h-9 rounded-md border border-rule bg-white px-3 text-sm hover:bg-ember-50 disabled:opacity-50';
/** 3/16 in and 1/4 in: the usual jet and primary drills (common practice, no source). */
const JET_DRILL_MM = 4.7625;
const PRIMARY_DRILL_MM = 6.35;

/** Where a part stands when "Bottom stands at" is empty (shared/layout/assembly.ts), up from the shell's bottom. */
const USUAL_PLACE: Record<PartRole, string> = {
  'burn-chamber': 'Up from the shell’s bottom. Empty: hung with its top level with the shell’s.',
  shell: '',
  concentrator: 'Up from the shell’s bottom. Empty: on top of the stove.',
  'pot-stand': 'Up from the shell’s bottom. Empty: on the concentrator, or on top of the stove.',
  'intake-collar': 'Up from the shell’s bottom. Empty: centred on the shell’s intake row.',
};

interface PartEditorProps {
  partIndex: number;
  partCount: number;
  units: UnitSystem;
  onMove(to: number): void;
  onRemove(): void;
}

/** A part: its name and role, its can, its rows of holes round the wall and its rings on the can ends. */
export function PartEditor({ partIndex, partCount, units, onMove, onRemove }: PartEditorProps) {
  const { control, register, getValues } = useFormContext<DesignInput>();
  const base = `parts.${partIndex}` as const;
  const rows = useFieldArray({ control, name: `${base}.sideRows` });
  const patterns = useFieldArray({ control, name: `${base}.endPatterns` });
  const role = useWatch({ control, name: `${base}.role` });
  const partName = useWatch({ control, name: `${base}.name` })?.trim() || ROLE_NAMES[role];
  const choices = useDrillChoices(units);
  const nearest = (mm: number) => [...choices].sort((a, b) => Math.abs(a.diameterMm - mm) - Math.abs(b.diameterMm - mm))[0]?.id ?? (units === 'mm' ? 'mm:5' : 'frac:3/16');
  const nameProblem = useProblem(`${base}.name`);
  const openingProblem = useProblem(`${base}.openingDiameterMm`);
  const bottomAtProblem = useProblem(`${base}.bottomAtMm`);

  function addRow() {
    const drillId = nearest(JET_DRILL_MM);
    const part = partSchema.safeParse(getValues(base));
    const rules = getValues('rules');
    const height = part.success ? placeNextRowHeight(part.data, findDrill(drillId)?.diameterMm ?? JET_DRILL_MM, (id) => findDrill(id)?.diameterMm ?? 0, { minLigamentMm: rules?.minLigamentMm ?? 3, topMarginMm: rules?.topMarginMm ?? 6, chimeMarginMm: rules?.chimeMarginMm ?? 6 }) : null;
    const label = rows.fields.length === 0 ? 'Secondary jets' : `Row ${rows.fields.length + 1}`;
    rows.append({ id: freshId('row', getValues(`${base}.sideRows`) ?? []), label, group: 'secondary', drillId, count: 16, skip: [], height: height ?? { from: 'top', mm: 15 }, startDeg: 0, keepOuts: [], keepOutPolicy: 'drop' });
  }

  function addRings() {
    const taken = getValues(`${base}.endPatterns`) ?? [];
    patterns.append({ id: freshId('rings', taken), label: taken.length ? `Rings ${taken.length + 1}` : 'Bottom rings', group: 'primary', face: 'bottom', drillId: nearest(PRIMARY_DRILL_MM), centerHole: true, stagger: true, phaseDeg: 0, rings: { strategy: 'divider', ringCount: 2, firstCount: 4, firstRadiusMm: 10, ringSpacingMm: 10 } });
  }

  return (
    <div className="flex flex-col gap-3">
      <fieldset className="grid grid-cols-2 gap-2 rounded-md border border-rule p-3 @lg:grid-cols-4">
        <legend className="px-1 text-sm font-medium">Part</legend>
        <TextInputField label="Part name" error={nameProblem} {...register(`${base}.name`)} />
        <SelectField label="Role" context={partName} {...register(`${base}.role`)}>
          {partRoleSchema.options.map((r) => (
            <option key={r} value={r}>
              {ROLE_NAMES[r]}
            </option>
          ))}
        </SelectField>
        <div className="col-span-2 flex flex-wrap items-end gap-1">
          <button type="button" className={small} disabled={partIndex === 0} onClick={() => onMove(partIndex - 1)}>
            Move earlier<span className="sr-only">: {partName}</span>
          </button>
          <button type="button" className={small} disabled={partIndex >= partCount - 1} onClick={() => onMove(partIndex + 1)}>
            Move later<span className="sr-only">: {partName}</span>
          </button>
          <button type="button" className="min-h-9 rounded-md border border-danger/40 bg-white px-3 text-sm text-danger hover:bg-danger/5 disabled:opacity-50" disabled={partCount === 1} onClick={onRemove}>
            Remove part<span className="sr-only">: {partName}</span>
          </button>
        </div>
        {role !== 'shell' && (
          <Controller
            control={control}
            name={`${base}.bottomAtMm`}
            render={({ field }) => (
              <LengthInput
                label="Bottom stands at"
                context={partName}
                hint={USUAL_PLACE[role]}
                optional
                allowZero
                units={units}
                valueMm={field.value}
                error={bottomAtProblem}
                inputRef={field.ref}
                onChange={field.onChange}
              />
            )}
          />
        )}
        {role === 'concentrator' && (
          <Controller
            control={control}
            name={`${base}.openingDiameterMm`}
            render={({ field }) => <LengthInput label="Opening diameter" hint="The hole the flame passes through; empty for none." optional units={units} valueMm={field.value} error={openingProblem} inputRef={field.ref} onChange={field.onChange} />}
          />
        )}
      </fieldset>
      <VesselField partIndex={partIndex} units={units} partName={partName} />
      {role === 'intake-collar' ? (
        <>
          <p className="rounded-md border border-rule bg-white p-3 text-sm">
            A band cut from a can wall, wrapped round the outer shell over its intake row. Its holes follow that row: the same drill at the same angles, so fully open they sit over the shell’s. Turn it round the shell to close the intake partly; its printed band carries a scale (open, 3/4, 1/2, 1/4, and closed, or the least it reaches when its holes are close together) to read against the shell’s seam.
          </p>
          {(rows.fields.length > 0 || patterns.fields.length > 0) && (
            <div role="alert" className="rounded-md border border-danger bg-white p-3 text-sm text-danger">
              <p>
                This part still has {rows.fields.length > 0 ? `${rows.fields.length} row${rows.fields.length === 1 ? '' : 's'} round the wall` : ''}
                {rows.fields.length > 0 && patterns.fields.length > 0 ? ' and ' : ''}
                {patterns.fields.length > 0 ? `${patterns.fields.length} ring pattern${patterns.fields.length === 1 ? '' : 's'}` : ''} from before it was a collar. A collar takes its holes from the shell, so these must go before the design can be saved.
              </p>
              <button
                type="button"
                className={`${small} mt-2`}
                onClick={() => {
                  rows.remove();
                  patterns.remove();
                }}
              >
                Remove them
              </button>
            </div>
          )}
        </>
      ) : (
        <>
          {rows.fields.map((field, r) => (
            <SideRowEditor key={field.id} partIndex={partIndex} rowIndex={r} units={units} onRemove={() => rows.remove(r)} />
          ))}
          {patterns.fields.map((field, e) => (
            <EndPatternEditor key={field.id} partIndex={partIndex} patternIndex={e} units={units} onRemove={() => patterns.remove(e)} />
          ))}
          <div className="flex flex-wrap gap-2">
            <button type="button" className={small} disabled={rows.fields.length >= MAX_SIDE_ROWS} onClick={addRow}>
              Add a row round the wall
            </button>
            <button type="button" className={small} disabled={patterns.fields.length >= MAX_END_PATTERNS} onClick={addRings}>
              Add rings on a can end
            </button>
          </div>
        </>
      )}
    </div>
  );
}
