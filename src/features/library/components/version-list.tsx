import type { VersionListItem } from '../../../../shared/library/library-schemas.ts';
import { Button } from '../../../components/button.tsx';
import { formatWhen } from '../format-when.ts';

interface VersionListProps {
  versions: VersionListItem[];
  currentVersion: number;
  busy: boolean;
  onRestore(number: number): void;
}

/** A design's versions, newest first, each with its note and what changed from the one before. */
export function VersionList({ versions, currentVersion, busy, onRestore }: VersionListProps) {
  return (
    <ol aria-label="Versions" className="flex flex-col gap-3">
      {versions.map((version) => {
        const headingId = `version-${version.number}`;
        return (
          <li key={version.number} aria-labelledby={headingId} className="rounded-lg border border-rule bg-white p-4">
            <div className="flex flex-wrap items-baseline justify-between gap-2">
              <h3 id={headingId} className="font-medium">
                Version {version.number}
                {version.number === currentVersion && <span className="ml-2 rounded-full bg-ember-50 px-2 py-0.5 text-xs font-medium text-ember-700">Current</span>}
              </h3>
              <p className="text-sm text-ink-soft">
                <time dateTime={version.createdAt}>{formatWhen(version.createdAt)}</time> · {version.summary.holes} holes
              </p>
            </div>
            {version.note && <p className="mt-1 text-sm italic [overflow-wrap:anywhere]">“{version.note}”</p>}
            {version.changes.length > 0 ? (
              <ul aria-label={`Changes in version ${version.number}`} className="mt-2 list-disc pl-5 text-sm">
                {version.changes.map((line, i) => (
                  <li key={i}>{line}</li>
                ))}
              </ul>
            ) : (
              <p className="mt-2 text-sm text-ink-soft">{version.number === 1 ? 'First saved version.' : 'No change to the layout.'}</p>
            )}
            {version.number !== currentVersion && (
              <div className="mt-3">
                <Button variant="secondary" disabled={busy} onClick={() => onRestore(version.number)} aria-describedby={headingId}>
                  Restore this version
                </Button>
              </div>
            )}
          </li>
        );
      })}
    </ol>
  );
}
