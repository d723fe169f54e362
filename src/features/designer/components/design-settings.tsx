import { Controller, useFormContext } from 'react-hook-form';
import type { DesignInput, Rules } from '../../../../shared/design/design-schema.ts';
import type { UnitSystem } from '../../../../shared/units/length.ts';
import { useProblems } from '../design-problems.tsx';
import { DrillSetField } from './drill-set-field.tsx';
import { NumberField, TextAreaField } from './field.tsx';
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

/** Limits of the checks across parts (shared/layout/checks/check-fit.ts and its neighbours); lengths, then ratios. */
const assemblyLimits: { key: keyof Rules; label: string; hint: string }[] = [
  { key: 'minGapMm', label: 'Gap round the chamber, at least', hint: 'Narrower, the secondary air can hardly rise and the cans bind when hot.' },
  { key: 'maxGapMm', label: 'Gap round the chamber, at most', hint: 'Wider, the air rises slowly and cools; the jets run weak.' },
  { key: 'minClearanceBelowMm', label: 'Room under the chamber, at least', hint: 'So primary air reaches its bottom holes.' },
  { key: 'jetsBelowShellTopMm', label: 'Jets below the shell top, at least', hint: 'From the jets’ top edge to where the shell closes against the chamber.' },
  { key: 'minFlameRoomMm', label: 'Room for the flame under the pot, at least', hint: 'From the top of the stove to the top of the pot stand.' },
];
const assemblyRatios: { key: keyof Rules; label: string; hint: string; step: number }[] = [
  { key: 'minIntakeRatio', label: 'Shell intake, at least × primary + secondary', hint: 'Smaller, the intake chokes the stove.', step: 0.05 },
  { key: 'concentratorMinRatio', label: 'Concentrator opening, at least × chamber', hint: 'Smaller chokes the flame.', step: 0.05 },
  { key: 'concentratorMaxRatio', label: 'Concentrator opening, at most × chamber', hint: 'Larger does little.', step: 0.05 },
  { key: 'minExhaustRatio', label: 'Pot stand openings, at least × flame opening', hint: 'Against the concentrator opening, or the chamber mouth.', step: 0.05 },
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
      <fieldset className="grid grid-cols-1 gap-2 rounded-md border border-rule p-3 @md:grid-cols-2">
        <legend className="px-1 text-sm font-medium">Limits across parts</legend>
        {assemblyLimits.map(({ key, label, hint }) => (
          <Controller
            key={key}
            control={control}
            name={`rules.${key}`}
            render={({ field }) => <LengthInput label={label} hint={hint} fine allowZero={key !== 'maxGapMm'} units={units} valueMm={field.value} error={problemAt(`rules.${key}`)} inputRef={field.ref} onChange={(mm) => mm !== undefined && field.onChange(mm)} />}
          />
        ))}
        {assemblyRatios.map(({ key, label, hint, step }) => (
          <NumberField key={key} label={label} hint={hint} step={step} min={0} inputMode="decimal" error={problemAt(`rules.${key}`)} {...register(`rules.${key}`, { valueAsNumber: true })} />
        ))}
      </fieldset>
    </>
  );
}
