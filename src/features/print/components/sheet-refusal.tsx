import type { PaperFix } from '../../../../shared/print/suggest-paper-fix.ts';
import { Button } from '../../../components/button.tsx';

interface SheetRefusalProps {
  /** Why the kit does not print, from the same planner as the server's refusal. */
  problem: string;
  /** The paper choice that would print it, when there is one. */
  fix?: PaperFix;
  onApply(fix: PaperFix): void;
}

/** A kit that cannot print on this paper: what to do in one line with a button that does it, then the details. */
export function SheetRefusal({ problem, fix, onApply }: SheetRefusalProps) {
  return (
    <div className="rounded-md border border-danger/40 bg-danger/5 px-4 py-3 text-sm">
      {fix && (
        <p className="mb-2 flex flex-wrap items-center gap-x-3 gap-y-2">
          <span className="font-medium">{fix.advice}</span>
          <Button variant="secondary" onClick={() => onApply(fix)}>
            {fix.action}
          </Button>
        </p>
      )}
      <p className={fix ? 'text-ink-soft' : 'text-danger'}>{problem}</p>
    </div>
  );
}
