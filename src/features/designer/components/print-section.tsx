import { Link } from 'react-router';
import { safetyLine } from '../../../components/safety-note.tsx';
import { StaleMark } from './stale-mark.tsx';

/** The way to the print screen (which refuses a design with values to fix, and says why). */
export function PrintSection({ stale, holeCount, onLeave }: { stale?: string; holeCount: number; onLeave(): void }) {
  return (
    <section aria-labelledby="print-heading" className="flex flex-col gap-2">
      <h2 id="print-heading" className="font-semibold">
        Print the kit
      </h2>
      {stale && <StaleMark what="This section" problem={stale} />}
      <p className="text-sm text-ink-soft">Choose paper and printer, look over every sheet and the build sheet, then download the PDF kit, an SVG per sheet or the hole table.</p>
      <div>
        {!stale && holeCount === 0 ? (
          <p className="text-sm text-ink-soft">Nothing to print yet: add a row of holes or rings on a can end.</p>
        ) : (
          <Link to="/design/print" onClick={onLeave} className="inline-flex min-h-10 items-center rounded-md bg-ember-600 px-4 py-2 text-sm font-medium text-white hover:bg-ember-700">
            Print the kit
          </Link>
        )}
      </div>
      <p className="rounded-md border border-ember-600/30 bg-ember-50 px-3 py-2 text-sm">{safetyLine}</p>
    </section>
  );
}
