import { describePosition } from '../../../../shared/layout/describe-row.ts';

/** Up to this many positions get a button each; longer rows take a typed list. */
const MAX_BUTTONS = 72;

interface SkipPickerProps {
  count: number;
  startDeg: number;
  seamAngleDeg: number;
  skip: number[];
  rowName: string;
  onChange(skip: number[]): void;
}

/** Which positions of a row are left out: a button per position (pressed = left out), counted from 1. */
export function SkipPicker({ count, startDeg, seamAngleDeg, skip, rowName, onChange }: SkipPickerProps) {
  const left = new Set(skip);
  const toggle = (i: number) => onChange(left.has(i) ? skip.filter((s) => s !== i) : [...skip, i].sort((a, b) => a - b));
  if (!Number.isInteger(count) || count < 1) return null;
  if (count > MAX_BUTTONS) return <TypedSkips count={count} skip={skip} rowName={rowName} onChange={onChange} />;
  const pitch = 360 / count;
  return (
    <div role="group" aria-label={`Positions of ${rowName}: pressed ones are left out`} className="flex flex-wrap gap-1">
      {Array.from({ length: count }, (_, i) => {
        const where = describePosition(startDeg + i * pitch, seamAngleDeg, pitch);
        const out = left.has(i);
        return (
          <button
            key={i}
            type="button"
            aria-pressed={out}
            aria-label={`Position ${i + 1}, ${where}${out ? ', left out' : ''}`}
            title={`Position ${i + 1}, ${where}`}
            onClick={() => toggle(i)}
            className={`h-8 min-w-8 rounded border px-1 text-xs tabular-nums ${out ? 'border-danger/50 bg-danger/10 text-danger line-through' : 'border-rule bg-white'}`}
          >
            {i + 1}
          </button>
        );
      })}
    </div>
  );
}

/** A long row's left-out positions as "1, 5, 9". */
function TypedSkips({ count, skip, rowName, onChange }: Omit<SkipPickerProps, 'startDeg' | 'seamAngleDeg'>) {
  const text = skip.map((s) => s + 1).join(', ');
  return (
    <label className="flex flex-col gap-1 text-xs font-medium text-ink-soft">
      Left-out positions (1 to {count}, with commas)<span className="sr-only">, {rowName}</span>
      <input
        defaultValue={text}
        key={text}
        onBlur={(e) => {
          const picked = e.target.value.split(/[\s,;]+/).filter(Boolean).map(Number);
          onChange([...new Set(picked.filter((n) => Number.isInteger(n) && n >= 1 && n <= count).map((n) => n - 1))].sort((a, b) => a - b));
        }}
        className="min-h-9 rounded-md border border-rule bg-white px-2 text-sm text-ink"
      />
    </label>
  );
}
