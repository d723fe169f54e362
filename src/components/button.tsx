import type { ButtonHTMLAttributes } from 'react';

type Variant = 'primary' | 'secondary' | 'danger';

const variants: Record<Variant, string> = {
  primary: 'bg-ember-600 text-white hover:bg-ember-700 disabled:bg-ink-soft/40',
  secondary: 'border border-rule bg-white text-ink hover:bg-ember-50 disabled:text-ink-soft/60',
  danger: 'border border-danger/40 bg-white text-danger hover:bg-danger/5',
};

export function Button({ variant = 'primary', className = '', ...props }: ButtonHTMLAttributes<HTMLButtonElement> & { variant?: Variant }) {
  return (
    <button
      type="button"
      className={`inline-flex min-h-10 items-center justify-center gap-2 rounded-md px-4 py-2 text-sm font-medium transition-colors disabled:cursor-not-allowed ${variants[variant]} ${className}`}
      {...props}
    />
  );
}
