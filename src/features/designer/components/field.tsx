import { useId, type InputHTMLAttributes, type ReactNode, type Ref, type SelectHTMLAttributes, type TextareaHTMLAttributes } from 'react';

const controlClass = 'min-h-9 w-full rounded-md border border-rule bg-white px-2 py-1 text-sm aria-[invalid]:border-danger';

interface LabelledProps {
  label: string;
  /** Read after the label by screen readers ("Drill, Secondary jets"), where many fields share a name. */
  context?: string;
  error?: string;
  hint?: string;
  children: (id: string, describedBy: string | undefined) => ReactNode;
}

/** A small label above one control, with its hint and error below: the dense design editor's one layout. */
export function Labelled({ label, context, error, hint, children }: LabelledProps) {
  const id = useId();
  const describedBy = [hint ? `${id}-hint` : '', error ? `${id}-error` : ''].filter(Boolean).join(' ') || undefined;
  return (
    <div className="flex min-w-0 flex-col gap-1">
      <label htmlFor={id} className="text-xs font-medium text-ink-soft">
        {label}
        {context && <span className="sr-only">, {context}</span>}
      </label>
      {children(id, describedBy)}
      {hint && (
        <p id={`${id}-hint`} className="text-xs text-ink-soft">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="text-xs text-danger">
          {error}
        </p>
      )}
    </div>
  );
}

type Common = { label: string; context?: string; error?: string; hint?: string };
type InputProps = Omit<InputHTMLAttributes<HTMLInputElement>, 'ref'> & Common & { ref?: Ref<HTMLInputElement> };

export function NumberField({ label, context, error, hint, ref, ...input }: InputProps) {
  return (
    <Labelled label={label} context={context} error={error} hint={hint}>
      {(id, describedBy) => <input id={id} ref={ref} type="number" aria-invalid={error ? true : undefined} aria-describedby={describedBy} className={controlClass} {...input} />}
    </Labelled>
  );
}

export function TextInputField({ label, context, error, hint, ref, ...input }: InputProps) {
  return (
    <Labelled label={label} context={context} error={error} hint={hint}>
      {(id, describedBy) => <input id={id} ref={ref} aria-invalid={error ? true : undefined} aria-describedby={describedBy} className={controlClass} {...input} />}
    </Labelled>
  );
}

export function TextAreaField({ label, context, error, hint, ref, ...area }: Omit<TextareaHTMLAttributes<HTMLTextAreaElement>, 'ref'> & Common & { ref?: Ref<HTMLTextAreaElement> }) {
  return (
    <Labelled label={label} context={context} error={error} hint={hint}>
      {(id, describedBy) => <textarea id={id} ref={ref} aria-invalid={error ? true : undefined} aria-describedby={describedBy} className={`${controlClass} min-h-20`} {...area} />}
    </Labelled>
  );
}

export function SelectField({ label, context, error, hint, ref, children, ...select }: Omit<SelectHTMLAttributes<HTMLSelectElement>, 'ref'> & Common & { ref?: Ref<HTMLSelectElement>; children: ReactNode }) {
  return (
    <Labelled label={label} context={context} error={error} hint={hint}>
      {(id, describedBy) => (
        <select id={id} ref={ref} aria-invalid={error ? true : undefined} aria-describedby={describedBy} className={controlClass} {...select}>
          {children}
        </select>
      )}
    </Labelled>
  );
}

/** A checkbox with its label beside it. */
export function CheckField({ label, context, ref, ...input }: Omit<InputHTMLAttributes<HTMLInputElement>, 'ref'> & { label: string; context?: string; ref?: Ref<HTMLInputElement> }) {
  return (
    <label className="flex min-h-9 items-center gap-2 text-sm">
      <input type="checkbox" ref={ref} {...input} />
      {label}
      {context && <span className="sr-only">, {context}</span>}
    </label>
  );
}
