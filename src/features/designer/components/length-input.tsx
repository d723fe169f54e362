import { useId, useState } from 'react';
import type { UnitSystem } from '../../../../shared/units/length.ts';
import { formatLength, parseLength } from '../../../../shared/units/index.ts';
import { plainMessage } from '../describe-problem.ts';

interface LengthInputProps {
  label: string;
  valueMm: number | undefined;
  units: UnitSystem;
  onChange(mm: number): void;
  error?: string;
  className?: string;
}

/** A length typed as "1 5/8", "3/16 in" or "41.3 mm"; shown back in the maker's units. */
export function LengthInput({ label, valueMm, units, onChange, error, className = '' }: LengthInputProps) {
  const id = useId();
  const shown = valueMm === undefined || Number.isNaN(valueMm) ? '' : formatLength(valueMm, units);
  const [text, setText] = useState(shown);
  const [problem, setProblem] = useState<string>();
  // When the value changes from outside (undo, a catalogue pick), show it (React's "adjust state on prop change").
  const [lastShown, setLastShown] = useState(shown);
  if (shown !== lastShown) {
    setLastShown(shown);
    setText(shown);
  }

  function commit() {
    // Leaving a field untouched changes nothing: the shown text is rounded (to 1/64 in or 0.01 mm),
    // and committing it would move a hole or turn a catalogue can into a measured one.
    if (text === shown) return setProblem(undefined);
    const parsed = parseLength(text, units);
    if (!parsed.ok) return setProblem(parsed.error);
    setProblem(undefined);
    onChange(parsed.mm);
    setText(formatLength(parsed.mm, units));
  }

  const message = problem ?? (error ? plainMessage(error) : undefined);
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={id} className="text-xs font-medium text-ink-soft">
        {label}
      </label>
      <input
        id={id}
        value={text}
        inputMode="decimal"
        onChange={(event) => setText(event.target.value)}
        onBlur={commit}
        onKeyDown={(event) => event.key === 'Enter' && commit()}
        aria-invalid={message ? true : undefined}
        aria-describedby={message ? `${id}-error` : undefined}
        className="min-h-9 w-full rounded-md border border-rule bg-white px-2 py-1 text-sm aria-[invalid]:border-danger"
      />
      {message && (
        <p id={`${id}-error`} className="text-xs text-danger">
          {message}
        </p>
      )}
    </div>
  );
}
