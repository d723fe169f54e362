import type { ReactNode } from 'react';

type Tone = 'info' | 'success' | 'error';

const tones: Record<Tone, string> = {
  info: 'border-rule bg-white',
  success: 'border-ok/40 bg-ok/5',
  error: 'border-danger/40 bg-danger/5',
};

/** A boxed message; errors are announced at once, the others politely. */
export function Notice({ tone = 'info', children }: { tone?: Tone; children: ReactNode }) {
  return (
    <div role={tone === 'error' ? 'alert' : 'status'} className={`rounded-md border px-4 py-3 text-sm ${tones[tone]}`}>
      {children}
    </div>
  );
}
