import type { Finding } from '../../../../shared/layout/layout-types.ts';

const tone = { error: 'text-danger', warning: 'text-ember-700', note: 'text-ink-soft' } as const;

/** The layout's findings; one with holes can be shown on the preview. */
export function FindingList({ findings, onShow }: { findings: Finding[]; onShow: (holeIds: string[]) => void }) {
  if (findings.length === 0) return <p className="mt-4 text-sm text-ink-soft">The checks found nothing to report.</p>;
  return (
    <ul className="mt-4 flex flex-col gap-2" aria-label="Findings">
      {findings.map((finding, i) => (
        <li key={`${finding.rule}-${i}`} className="flex flex-wrap items-baseline gap-x-3 gap-y-1 rounded-md border border-rule bg-white px-3 py-2 text-sm">
          <span className={`font-medium capitalize ${tone[finding.severity]}`}>{finding.severity}</span>
          <span className="min-w-0 flex-1">{finding.message}</span>
          {finding.holeIds.length > 0 && (
            <button type="button" className="min-h-10 rounded-md px-2 font-medium text-ember-700 underline hover:bg-ember-50" onClick={() => onShow(finding.holeIds)}>
              Show {finding.holeIds.length === 1 ? 'the hole' : `the ${finding.holeIds.length} holes`}
            </button>
          )}
        </li>
      ))}
    </ul>
  );
}
