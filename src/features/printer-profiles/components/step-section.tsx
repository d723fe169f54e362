import { useId, type ReactNode } from 'react';

/** One numbered step of the calibration page: a white card labelled by its heading. */
export function StepSection({ step, title, intro, children }: { step: number; title: string; intro?: ReactNode; children: ReactNode }) {
  const headingId = useId();
  return (
    <section aria-labelledby={headingId} className="rounded-lg border border-rule bg-white p-5">
      <p className="text-sm font-medium text-ember-700">Step {step}</p>
      <h2 id={headingId} className="mt-1 text-lg font-semibold">
        {title}
      </h2>
      {intro && <div className="mt-1 text-sm text-ink-soft">{intro}</div>}
      <div className="mt-4">{children}</div>
    </section>
  );
}
