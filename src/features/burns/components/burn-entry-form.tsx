import { useId, useState, type FormEvent, type ReactNode } from 'react';
import { flameRingWords, smokeLevels, windLevels } from '../../../../shared/burns/burn-schema.ts';
import { unitLabels, type BurnUnits } from '../../../../shared/units/burn-units.ts';
import { Button } from '../../../components/button.tsx';
import { readFormValues, smokeWords, windWords, type BurnFormErrors, type BurnFormValues } from '../burn-form-values.ts';
import type { BurnFields } from '../../../../shared/burns/burn-schema.ts';

interface Props {
  initial: BurnFormValues;
  units: BurnUnits;
  submitLabel: string;
  busy: boolean;
  /** Errors the server found, by box. */
  serverErrors?: BurnFormErrors;
  onSubmit: (entry: { date: string; fields: BurnFields }) => void;
  /** Called on every change, so the page can keep the draft in the browser. */
  onChange?: (values: BurnFormValues) => void;
}

/** Every field of a burn entry, in the maker's units; empty boxes are "not measured". */
export function BurnEntryForm({ initial, units, submitLabel, busy, serverErrors = {}, onSubmit, onChange }: Props) {
  const [values, setValues] = useState(initial);
  const [errors, setErrors] = useState<BurnFormErrors>({});
  const shownErrors = { ...serverErrors, ...errors };
  const set = <K extends keyof BurnFormValues>(key: K, value: BurnFormValues[K]) => {
    const next = { ...values, [key]: value };
    setValues(next);
    onChange?.(next);
    if (errors[key]) setErrors({ ...errors, [key]: undefined });
  };

  function submit(event: FormEvent) {
    event.preventDefault();
    const read = readFormValues(values, units);
    if (!read.ok) {
      setErrors(read.errors);
      return;
    }
    setErrors({});
    onSubmit({ date: read.date, fields: read.fields });
  }

  const box = (key: keyof BurnFormValues, label: string, hint?: string, input: { inputMode?: 'decimal' | 'text'; type?: string; placeholder?: string } = {}) => (
    <Box label={label} hint={hint} error={shownErrors[key]}>
      {(id, describedBy) => (
        <input
          id={id}
          aria-describedby={describedBy}
          aria-invalid={shownErrors[key] ? true : undefined}
          type={input.type ?? 'text'}
          inputMode={input.inputMode}
          placeholder={input.placeholder}
          value={values[key]}
          onChange={(e) => set(key, e.target.value as never)}
          className="min-h-11 w-full rounded-md border border-rule bg-white px-3 py-2 text-base aria-[invalid]:border-danger"
        />
      )}
    </Box>
  );
  const time = (key: keyof BurnFormValues, label: string) => box(key, label, 'm:ss, or minutes', { inputMode: 'text', placeholder: '7:30' });

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-6">
      <Group title="When and what burned">
        {box('date', 'Date and time', undefined, { type: 'datetime-local' })}
        {box('fuelKind', 'Fuel', 'e.g. softwood pellets, twigs')}
        {box('fuelMass', `Fuel loaded (${unitLabels[units.mass]})`, undefined, { inputMode: 'decimal' })}
        {box('starter', 'Lit with', 'e.g. a cotton ball with wax')}
      </Group>
      <Group title="Weather">
        {box('ambient', `Air temperature (${unitLabels[units.temperature]})`, undefined, { inputMode: 'decimal' })}
        <Choice label="Wind" value={values.wind} onChange={(v) => set('wind', v)} options={windLevels.map((w) => [w, windWords[w]])} />
        <Choice label="Windscreen" value={values.windscreen} onChange={(v) => set('windscreen', v)} options={[['yes', 'Used'], ['no', 'None']]} />
        {box('windFacing', 'Stove turned to the wind', 'e.g. intake row away from the wind')}
      </Group>
      <Group title="Times from lighting">
        {time('timeToLight', 'Fuel caught')}
        {time('timeToJets', 'Jets lit')}
        {time('timeToBoil', 'Water boiling')}
        {time('burnTime', 'Flame out (burn time)')}
        {box('boilWater', `Water in the pot (${unitLabels[units.volume]})`, undefined, { inputMode: 'decimal' })}
        {box('boilStart', `Water at start (${unitLabels[units.temperature]})`, undefined, { inputMode: 'decimal' })}
      </Group>
      <Group title="How it burned">
        <Choice label="Smoke" value={values.smoke} onChange={(v) => set('smoke', v)} options={smokeLevels.map((s) => [s, smokeWords[s]])} />
        {box('char', `Char left (${unitLabels[units.mass]})`, undefined, { inputMode: 'decimal' })}
        <fieldset className="flex flex-col gap-1 sm:col-span-2">
          <legend className="mb-1 text-sm font-medium">Flame ring</legend>
          {flameRingWords.map((words, i) => (
            <label key={words} className="flex min-h-10 cursor-pointer items-center gap-3 rounded-md px-2 hover:bg-ember-50">
              <input type="radio" name="flameRing" value={i + 1} checked={values.flameRing === String(i + 1)} onChange={() => set('flameRing', String(i + 1))} className="accent-ember-600" />
              <span className="text-sm">{words}</span>
            </label>
          ))}
          {values.flameRing && (
            <button type="button" onClick={() => set('flameRing', '')} className="self-start text-sm text-ember-700 underline">
              Clear the rating
            </button>
          )}
        </fieldset>
      </Group>
      <Box label="Notes" error={shownErrors.notes}>
        {(id, describedBy) => (
          <textarea id={id} aria-describedby={describedBy} rows={4} value={values.notes} onChange={(e) => set('notes', e.target.value)} className="w-full rounded-md border border-rule bg-white px-3 py-2 text-base" />
        )}
      </Box>
      <div>
        <Button type="submit" disabled={busy} className="min-h-12 w-full sm:w-auto">
          {busy ? 'Saving…' : submitLabel}
        </Button>
      </div>
    </form>
  );
}

function Group({ title, children }: { title: string; children: ReactNode }) {
  return (
    <fieldset className="grid gap-4 rounded-lg border border-rule bg-white p-4 sm:grid-cols-2">
      <legend className="px-1 font-semibold">{title}</legend>
      {children}
    </fieldset>
  );
}

function Box({ label, hint, error, children }: { label: string; hint?: string; error?: string; children: (id: string, describedBy: string | undefined) => ReactNode }) {
  const id = useId();
  const describedBy = [hint ? `${id}-hint` : '', error ? `${id}-error` : ''].filter(Boolean).join(' ') || undefined;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium">
        {label}
      </label>
      {children(id, describedBy)}
      {hint && (
        <p id={`${id}-hint`} className="text-xs text-ink-soft">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="text-sm text-danger">
          {error}
        </p>
      )}
    </div>
  );
}

function Choice<V extends string>({ label, value, onChange, options }: { label: string; value: V | ''; onChange: (value: V | '') => void; options: [V, string][] }) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium">
        {label}
      </label>
      <select id={id} value={value} onChange={(e) => onChange(e.target.value as V | '')} className="min-h-11 rounded-md border border-rule bg-white px-3 py-2 text-base">
        <option value="">Not noted</option>
        {options.map(([v, words]) => (
          <option key={v} value={v}>
            {words}
          </option>
        ))}
      </select>
    </div>
  );
}
