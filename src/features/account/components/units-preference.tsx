import { useState } from 'react';
import type { UnitSystem } from '../../../../shared/account/preferences.ts';
import { Notice } from '../../../components/notice.tsx';
import { useUpdatePreferences } from '../api/update-preferences.ts';

const choices: { value: UnitSystem; label: string; example: string }[] = [
  { value: 'in', label: 'Inches', example: 'fractions such as 3/16 in, drills by fraction, number and letter' },
  { value: 'mm', label: 'Millimetres', example: 'such as 4.8 mm, metric drills' },
];

export function UnitsPreference({ current }: { current: UnitSystem }) {
  const update = useUpdatePreferences();
  // The choice shows at once; it falls back to the saved value if saving fails.
  const [selected, setSelected] = useState(current);
  function choose(units: UnitSystem) {
    setSelected(units);
    update.mutate({ units }, { onError: () => setSelected(current) });
  }
  return (
    <section aria-labelledby="units-heading" className="rounded-lg border border-rule bg-white p-5">
      <h2 id="units-heading" className="text-lg font-semibold">
        Units
      </h2>
      <fieldset className="mt-3 flex flex-col gap-2">
        <legend className="text-sm text-ink-soft">New designs and examples open in (each design keeps its own units, which you can change on the design screen)</legend>
        {choices.map((choice) => (
          <label key={choice.value} className="flex cursor-pointer items-start gap-3 rounded-md p-2 hover:bg-ember-50">
            <input
              type="radio"
              name="units"
              value={choice.value}
              checked={selected === choice.value}
              onChange={() => choose(choice.value)}
              className="mt-1 accent-ember-600"
            />
            <span>
              <span className="font-medium">{choice.label}</span>
              <span className="block text-sm text-ink-soft">{choice.example}</span>
            </span>
          </label>
        ))}
      </fieldset>
      <div className="mt-2" aria-live="polite">
        {update.isSuccess && <p className="text-sm text-ok">Saved.</p>}
        {update.isError && <Notice tone="error">{update.error.message}</Notice>}
      </div>
    </section>
  );
}
