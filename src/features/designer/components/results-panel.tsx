import type { Design } from '../../../../shared/design/design-schema.ts';
import type { Finding } from '../../../../shared/layout/index.ts';
import type { UnitSystem } from '../../../../shared/units/length.ts';
import type { GoodLayout } from '../use-design-form.ts';
import { AirflowPanel } from './airflow-panel.tsx';
import { FindingsList } from './findings-list.tsx';
import { PrintSection } from './print-section.tsx';
import { StaleMark } from './stale-mark.tsx';

interface ResultsPanelProps {
  good: GoodLayout;
  units: UnitSystem;
  /** The first value to fix, in words, while the form does not validate. */
  stale?: string;
  finding?: Finding;
  onSelectFinding(finding: Finding | undefined): void;
  onApply(next: Design): void;
  onLeave(): void;
}

const plural = (n: number, noun: string) => `${n} ${noun}${n === 1 ? '' : 's'}`;

/** "2 errors, 1 warning": what the checks found, said once per change to screen readers. */
function summarize(findings: Finding[]): string {
  const count = (s: string) => findings.filter((f) => f.severity === s).length;
  const parts = [count('error') && plural(count('error'), 'error'), count('warning') && plural(count('warning'), 'warning'), count('note') && plural(count('note'), 'note')].filter(Boolean);
  return parts.length ? `Checks: ${parts.join(', ')}.` : 'Checks: the layout passes every check.';
}

/** The checks, the air and the way to print, for the last layout that worked. */
export function ResultsPanel({ good, units, stale, finding, onSelectFinding, onApply, onLeave }: ResultsPanelProps) {
  const { design, layout } = good;
  // The chosen finding as it stands after the latest edit (gone when the edit fixed it).
  const active = finding && layout.findings.find((f) => f.rule === finding.rule && f.message === finding.message);
  return (
    <div className="flex min-w-0 flex-col gap-5">
      <section aria-labelledby="findings-heading" className="flex flex-col gap-2">
        <h2 id="findings-heading" className="font-semibold">
          Checks
        </h2>
        {stale && <StaleMark what="This list" problem={stale} />}
        <p aria-live="polite" className="sr-only">
          {stale ? 'Checks are not up to date.' : summarize(layout.findings)}
        </p>
        <FindingsList findings={layout.findings} holeCount={layout.holes.length} selected={active} onSelect={onSelectFinding} />
      </section>
      <div className="flex flex-col gap-2">
        {stale && <StaleMark what="The air panel" problem={stale} />}
        <AirflowPanel design={design} layout={layout} units={units} stale={Boolean(stale)} onApply={onApply} />
      </div>
      <PrintSection stale={stale} holeCount={layout.holes.length} onLeave={onLeave} />
    </div>
  );
}
