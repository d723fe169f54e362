import type { Finding } from '../../../../shared/layout/index.ts';

const marks = { error: { text: 'Error', className: 'bg-danger/10 text-danger' }, warning: { text: 'Check', className: 'bg-ember-50 text-ember-700' }, note: { text: 'Note', className: 'bg-paper text-ink-soft' } } as const;

/** The checks' findings; choosing one highlights its holes in the preview. */
export function FindingsList({ findings, holeCount, selected, onSelect }: { findings: Finding[]; holeCount: number; selected?: Finding; onSelect(finding: Finding | undefined): void }) {
  if (holeCount === 0 && findings.length === 0) return <p className="text-sm text-ink-soft">No holes yet: add a row round the wall or rings on the bottom.</p>;
  if (findings.length === 0) return <p className="text-sm text-ok">No findings: the layout passes every check.</p>;
  return (
    <ul className="flex flex-col gap-2" aria-label="Findings">
      {findings.map((finding, i) => {
        const mark = marks[finding.severity];
        const active = selected === finding;
        return (
          <li key={`${finding.rule}-${i}`}>
            <button
              type="button"
              aria-pressed={active}
              onClick={() => onSelect(active ? undefined : finding)}
              className={`w-full rounded-md border px-3 py-2 text-left text-sm ${active ? 'border-ember-600 bg-ember-50' : 'border-rule bg-white hover:bg-ember-50'}`}
            >
              <span className={`mr-2 rounded px-1.5 py-0.5 text-xs font-medium ${mark.className}`}>{mark.text}</span>
              {finding.message}
              {finding.holeIds.length > 0 && <span className="ml-1 text-xs text-ink-soft">({finding.holeIds.length} {finding.holeIds.length === 1 ? 'hole' : 'holes'})</span>}
            </button>
          </li>
        );
      })}
    </ul>
  );
}
