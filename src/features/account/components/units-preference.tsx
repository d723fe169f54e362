import { useState } from 'react';
import type { Account } from '../../../../shared/account/account.ts';
import type { UnitSystem } from '../../../../shared/account/preferences.ts';
import { Notice } from '../../../components/notice.tsx';
import { useUpdatePreferences } from '../api/update-preferences.ts';

const choices: { value: UnitSystem; label: string; example: string }[] = [
  { value: 'in', label: 'Inches', example: 'fractions such as 3/16 in, drills by fraction, number and letter' },
  { value: 'mm', label: 'Millimetres', example: 'such as 4.8 mm, metric drills' },
];

export function UnitsPreference({ current, account }: { current: UnitSystem; account?: Account }) {
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
      {account && <BurnUnitsChoice account={account} />}
      <div className="mt-2" aria-live="polite">
        {update.isSuccess && <p className="text-sm text-ok">Saved.</p>}
        {update.isError && <Notice tone="error">{update.error.message}</Notice>}
      </div>
    </section>
  );
}

type BurnUnitKey = 'massUnit' | 'temperatureUnit' | 'volumeUnit';
const burnUnitChoices: { key: BurnUnitKey; label: string; options: [string, string][] }[] = [
  { key: 'massUnit', label: 'Fuel and char', options: [['g', 'grams'], ['oz', 'ounces']] },
  { key: 'temperatureUnit', label: 'Temperatures', options: [['C', '°C'], ['F', '°F']] },
  { key: 'volumeUnit', label: 'Water', options: [['L', 'litres'], ['qt', 'US quarts']] },
];

/** The burn log's units; stored values stay in grams, degrees Celsius and litres whatever is chosen. */
function BurnUnitsChoice({ account }: { account: Account }) {
  const update = useUpdatePreferences();
  return (
    <fieldset className="mt-4 grid gap-3 sm:grid-cols-3">
      <legend className="mb-1 text-sm text-ink-soft">The burn log shows measurements in</legend>
      {burnUnitChoices.map((choice) => (
        <label key={choice.key} className="flex flex-col gap-1 text-sm font-medium">
          {choice.label}
          <select
            value={account[choice.key]}
            onChange={(e) => update.mutate({ [choice.key]: e.target.value })}
            className="min-h-10 rounded-md border border-rule bg-white px-2 py-1 text-base font-normal"
          >
            {choice.options.map(([value, words]) => (
              <option key={value} value={value}>
                {words}
              </option>
            ))}
          </select>
        </label>
      ))}
      {update.isError && <Notice tone="error">{update.error.message}</Notice>}
    </fieldset>
  );
}
