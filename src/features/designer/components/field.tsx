import { useId, type InputHTMLAttributes, type ReactNode, type SelectHTMLAttributes } from 'react';
import { plainMessage } from '../describe-problem.ts';

const controlClass = 'min-h-9 w-full rounded-md border border-rule bg-white px-2 py-1 text-sm aria-[invalid]:border-danger';

/** A small label above one control, with its error below: the dense design editor's one layout. */
function Labelled({ label, error, children }: { label: string; error?: string; children: (id: string) => ReactNode }) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-xs font-medium text-ink-soft">
        {label}
      </label>
      {children(id)}
      {error && <p className="text-xs text-danger">{plainMessage(error)}</p>}
    </div>
  );
}

type InputProps = InputHTMLAttributes<HTMLInputElement> & { label: string; error?: string };

export function NumberField({ label, error, ...input }: InputProps) {
  return <Labelled label={label} error={error}>{(id) => <input id={id} type="number" aria-invalid={error ? true : undefined} className={controlClass} {...input} />}</Labelled>;
}

export function TextInputField({ label, error, ...input }: InputProps) {
  return <Labelled label={label} error={error}>{(id) => <input id={id} aria-invalid={error ? true : undefined} className={controlClass} {...input} />}</Labelled>;
}

export function SelectField({ label, children, ...select }: SelectHTMLAttributes<HTMLSelectElement> & { label: string; children: ReactNode }) {
  return (
    <Labelled label={label}>
      {(id) => (
        <select id={id} className={controlClass} {...select}>
          {children}
        </select>
      )}
    </Labelled>
  );
}
