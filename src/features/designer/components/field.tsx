import { useId, type ReactNode, type SelectHTMLAttributes, type InputHTMLAttributes } from 'react';

/** Small labelled controls for the dense design editor. */
export function NumberField({ label, error, ...input }: InputHTMLAttributes<HTMLInputElement> & { label: string; error?: string }) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-xs font-medium text-ink-soft">
        {label}
      </label>
      <input id={id} type="number" aria-invalid={error ? true : undefined} className="min-h-9 w-full rounded-md border border-rule bg-white px-2 py-1 text-sm aria-[invalid]:border-danger" {...input} />
      {error && <p className="text-xs text-danger">{error}</p>}
    </div>
  );
}

export function SelectField({ label, children, ...select }: SelectHTMLAttributes<HTMLSelectElement> & { label: string; children: ReactNode }) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-xs font-medium text-ink-soft">
        {label}
      </label>
      <select id={id} className="min-h-9 w-full rounded-md border border-rule bg-white px-2 py-1 text-sm" {...select}>
        {children}
      </select>
    </div>
  );
}

export function TextInputField({ label, error, ...input }: InputHTMLAttributes<HTMLInputElement> & { label: string; error?: string }) {
  const id = useId();
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-xs font-medium text-ink-soft">
        {label}
      </label>
      <input id={id} aria-invalid={error ? true : undefined} className="min-h-9 w-full rounded-md border border-rule bg-white px-2 py-1 text-sm aria-[invalid]:border-danger" {...input} />
      {error && <p className="text-xs text-danger">{error}</p>}
    </div>
  );
}
