import { Controller, useFormContext } from 'react-hook-form';
import type { DesignInput, Rules } from '../../../../shared/design/design-schema.ts';
import type { UnitSystem } from '../../../../shared/units/length.ts';
import { useProblems } from '../design-problems.tsx';
import { DrillSetField } from './drill-set-field.tsx';
import { TextAreaField } from './field.tsx';
import { LengthInput } from './length-input.tsx';

/** The check limits, in the order a maker thinks of them; the defaults are rules of thumb (shared/design/design-schema.ts). */
const limits: { key: keyof Rules; label: string; hint: string }[] = [
  { key: 'minLigamentMm', label: 'Metal between holes, at least', hint: 'Thinner webs tear when drilled and crack when hot.' },
  { key: 'jetPitchWarnMm', label: 'Jet pitch: warn above', hint: 'Jets further apart than this may not join into one flame ring.' },
  { key: 'jetPitchErrorMm', label: 'Jet pitch: error above', hint: 'Not below the warning limit.' },
  { key: 'seamMarginMm', label: 'Clearance from the seam', hint: 'The seam is doubled metal and may split.' },
  { key: 'topMarginMm', label: 'Clearance below the top rim', hint: 'The rim bends and tears near holes.' },
  { key: 'chimeMarginMm', label: 'Clearance above the bottom chime', hint: 'The chime is thick; the bit wanders.' },
  { key: 'rimMarginMm', label: 'Clearance inside the rim of a can end', hint: 'Keeps holes on the flat of the end.' },
];

/** What belongs to the whole design: notes, drills, paper, and the limits the checks apply. */
export function DesignSettings({ units }: { units: UnitSystem }) {
  const { control, register } = useFormContext<DesignInput>();
  const problemAt = useProblems();
  return (
    <>
      <fieldset className="flex flex-col gap-2 rounded-md border border-rule p-3">
        <legend className="px-1 text-sm font-medium">Design</legend>
        <TextAreaField label="Notes" rows={3} error={problemAt('notes')} hint="What this version is for, what to try next. Printed on the build sheet." {...register('notes')} />
        <DrillSetField units={units} />
        <Controller
          control={control}
          name="paperThicknessMm"
          render={({ field }) => (
            <LengthInput label="Paper thickness" allowZero fine hint="Wrap strips are made this much longer round the can (80 g/m² copy paper is about 0.1 mm)." units={units} valueMm={field.value} error={problemAt('paperThicknessMm')} inputRef={field.ref} onChange={(mm) => mm !== undefined && field.onChange(mm)} />
          )}
        />
      </fieldset>
      <fieldset className="grid grid-cols-1 gap-2 rounded-md border border-rule p-3 @md:grid-cols-2">
        <legend className="px-1 text-sm font-medium">Check limits</legend>
        {limits.map(({ key, label, hint }) => (
          <Controller
            key={key}
            control={control}
            name={`rules.${key}`}
            render={({ field }) => <LengthInput label={label} hint={hint} fine allowZero={key !== 'jetPitchWarnMm' && key !== 'jetPitchErrorMm'} units={units} valueMm={field.value} error={problemAt(`rules.${key}`)} inputRef={field.ref} onChange={(mm) => mm !== undefined && field.onChange(mm)} />}
          />
        ))}
      </fieldset>
    </>
  );
}
