/** Says that a panel shows the last layout that worked, and which value to fix. */
export function StaleMark({ what, problem, compact = false }: { what: string; problem: string; compact?: boolean }) {
  return (
    <p className="rounded border border-dashed border-danger/50 bg-white px-2 py-1 text-xs">
      <span className="font-medium text-danger">Not up to date.</span>{' '}
      {/* On a phone the preview stays on screen while editing: one short line there. */}
      <span className={compact ? 'hidden sm:inline' : ''}>
        {what} shows the last layout that worked. Fix first: {problem}
      </span>
      {compact && <span className="sm:hidden">Fix the value marked in the form.</span>}
    </p>
  );
}
