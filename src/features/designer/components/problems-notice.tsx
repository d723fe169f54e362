import type { DesignInput } from '../../../../shared/design/design-schema.ts';
import { describeProblem } from '../../../../shared/design/describe-problem.ts';
import type { DesignProblem } from '../../../../shared/design/validate-design.ts';

/** Shown at most; the rest are counted (each field shows its own below). */
const LISTED = 8;

/**
 * The values to fix, in the form's words, each with a way to the field. The preview, checks,
 * air and print keep the last layout that worked meanwhile, marked as not up to date.
 */
export function ProblemsNotice({ problems, values, onGo }: { problems: DesignProblem[]; values: DesignInput; onGo(path: string): void }) {
  if (problems.length === 0) return null;
  return (
    <section aria-labelledby="problems-heading" className="rounded-md border border-danger/40 bg-danger/5 p-3 text-sm">
      <h2 id="problems-heading" className="font-medium">
        {problems.length === 1 ? 'One value needs fixing' : `${problems.length} values need fixing`}; until then the preview, checks, air and print show the last layout that worked.
      </h2>
      <ul className="mt-1 flex flex-col gap-1">
        {problems.slice(0, LISTED).map((p) => (
          <li key={p.path} className="flex flex-wrap items-center gap-x-2">
            <span>{describeProblem(values, p)}</span>
            <button type="button" onClick={() => onGo(p.path)} className="min-h-8 rounded px-1 font-medium text-ember-700 underline">
              Go to the field
            </button>
          </li>
        ))}
      </ul>
      {problems.length > LISTED && <p className="mt-1 text-ink-soft">and {problems.length - LISTED} more, marked in the form.</p>}
    </section>
  );
}

/** Focuses the control of a field path, or of the nearest enclosing field the form shows. */
export function focusField(path: string): boolean {
  const keys = path.split('.');
  for (let n = keys.length; n > 0; n--) {
    const name = keys.slice(0, n).join('.');
    const control = document.querySelector<HTMLElement>(`[name="${CSS.escape(name)}"], [data-field="${CSS.escape(name)}"]`);
    if (control) {
      control.focus();
      control.scrollIntoView({ block: 'center' });
      return true;
    }
  }
  return false;
}
