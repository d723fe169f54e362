import { useState, type Ref } from 'react';
import type { UnitSystem } from '../../../../shared/units/length.ts';
import { convertMmToInches, formatLength, parseLength } from '../../../../shared/units/index.ts';
import { Labelled } from './field.tsx';

interface LengthInputProps {
  label: string;
  /** Read after the label by screen readers, where many fields share a name. */
  context?: string;
  valueMm: number | undefined | null;
  units: UnitSystem;
  onChange(mm: number | undefined): void;
  error?: string;
  hint?: string;
  /** An empty field means "none" (an optional length) rather than a mistake. */
  optional?: boolean;
  /** Zero is a real value here (a margin of none), not a slip. */
  allowZero?: boolean;
  /** A figure 64ths would round (a sheet, a limit): thousandths of an inch unless it is a whole 64th. */
  fine?: boolean;
  inputRef?: Ref<HTMLInputElement>;
}

/** Exactly k/64 in (to a micrometre): a fraction says it truly; anything else would be rounded by one. */
const isWhole64th = (mm: number) => Math.abs(convertMmToInches(mm) * 64 - Math.round(convertMmToInches(mm) * 64)) * (25.4 / 64) < 1e-3;

const ZERO = /^\s*(0+\.?0*|\.0+)\s*(mm|in|")?\s*$/i;

/** A length typed as "1 5/8", "3/16 in" or "41.3 mm"; shown back in the maker's units. */
export function LengthInput({ label, context, valueMm, units, onChange, error, hint, optional = false, allowZero = false, fine = false, inputRef }: LengthInputProps) {
  const format = (mm: number) => (fine && units === 'in' && !isWhole64th(mm) ? `${convertMmToInches(mm).toFixed(3)} in` : formatLength(mm, units));
  const shown = valueMm === undefined || valueMm === null || Number.isNaN(valueMm) ? '' : format(valueMm);
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
    if (text.trim() === '') {
      if (optional) {
        setProblem(undefined);
        return onChange(undefined);
      }
      return setProblem('needs a length');
    }
    if (allowZero && ZERO.test(text)) {
      setProblem(undefined);
      return onChange(0);
    }
    const parsed = parseLength(text, units);
    if (!parsed.ok) return setProblem(parsed.error);
    setProblem(undefined);
    onChange(parsed.mm);
    setText(format(parsed.mm));
  }

  const message = problem ?? error;
  return (
    <Labelled label={label} context={context} error={message} hint={hint}>
      {(id, describedBy) => (
        <input
          id={id}
          ref={inputRef}
          value={text}
          inputMode="decimal"
          onChange={(event) => setText(event.target.value)}
          onBlur={commit}
          onKeyDown={(event) => event.key === 'Enter' && commit()}
          aria-invalid={message ? true : undefined}
          aria-describedby={describedBy}
          className="min-h-9 w-full rounded-md border border-rule bg-white px-2 py-1 text-sm aria-[invalid]:border-danger"
        />
      )}
    </Labelled>
  );
}
