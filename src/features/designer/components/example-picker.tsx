import { useId, useState } from 'react';
import type { DesignInput } from '../../../../shared/design/design-schema.ts';
import { examples } from '../examples.ts';

/**
 * Starts again from an example, only on the button: choosing in the list (arrow keys move through
 * it) must not replace the maker's design by itself. Undo brings the design back.
 */
export function ExamplePicker({ onLoad }: { onLoad(document: DesignInput): void }) {
  const id = useId();
  const [chosen, setChosen] = useState('');
  const example = examples.find((x) => x.id === chosen);
  return (
    <div className="flex w-full min-w-0 flex-col gap-1 sm:w-auto">
      <label htmlFor={id} className="text-xs font-medium text-ink-soft">
        Start again from an example
      </label>
      <div className="flex gap-1">
        <select id={id} value={chosen} onChange={(e) => setChosen(e.target.value)} className="min-h-10 w-full min-w-0 rounded-md border border-rule bg-white px-2 text-sm text-ink sm:w-64">
          <option value="">Choose…</option>
          {examples.map((x) => (
            <option key={x.id} value={x.id}>
              {x.document.name}
            </option>
          ))}
        </select>
        <button
          type="button"
          disabled={!example}
          onClick={() => {
            if (!example) return;
            onLoad(example.document);
            setChosen('');
          }}
          className="min-h-10 shrink-0 rounded-md border border-rule bg-white px-3 text-sm disabled:opacity-50"
        >
          Load
        </button>
      </div>
    </div>
  );
}
