import { useId, type InputHTMLAttributes } from 'react';
import type { FieldError, UseFormRegisterReturn } from 'react-hook-form';

interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, 'name'> {
  label: string;
  registration: UseFormRegisterReturn;
  error?: FieldError;
  hint?: string;
}

/** A labelled input wired to react-hook-form, with its hint and error announced to screen readers. */
export function TextField({ label, registration, error, hint, ...input }: TextFieldProps) {
  const id = useId();
  const describedBy = [hint ? `${id}-hint` : '', error ? `${id}-error` : ''].filter(Boolean).join(' ') || undefined;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium">
        {label}
      </label>
      <input
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className="min-h-10 rounded-md border border-rule bg-white px-3 py-2 text-base aria-[invalid]:border-danger"
        {...input}
        {...registration}
      />
      {hint && (
        <p id={`${id}-hint`} className="text-sm text-ink-soft">
          {hint}
        </p>
      )}
      {error?.message && (
        <p id={`${id}-error`} className="text-sm text-danger">
          {error.message}
        </p>
      )}
    </div>
  );
}
