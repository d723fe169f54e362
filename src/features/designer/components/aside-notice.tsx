import { shownDocument, visibleAside, type AsideDraft } from '../draft-store.ts';
import { formatWhen } from '../../library/format-when.ts';

interface AsideNoticeProps {
  aside: AsideDraft[];
  accountId: string | null | undefined;
  onBringBack(at: number): void;
  onLetGo(at: number): void;
}

/** Work put aside when another design opened (or someone signed out), each with a way back. */
export function AsideNotice({ aside, accountId, onBringBack, onLetGo }: AsideNoticeProps) {
  const shown = visibleAside(aside, accountId);
  if (shown.length === 0) return null;
  return (
    <section aria-labelledby="aside-heading" className="rounded-md border border-ember-600/30 bg-ember-50 px-3 py-2 text-sm">
      <h2 id="aside-heading" className="font-medium">
        {shown.length === 1 ? 'Work put aside' : `${shown.length} pieces of work put aside`}
      </h2>
      <ul className="mt-1 flex flex-col gap-1">
        {shown.map(({ entry, at }) => {
          const name = shownDocument(entry)?.name?.trim() || 'Untitled design';
          return (
            <li key={`${entry.at}-${at}`} className="flex flex-wrap items-center gap-x-3 gap-y-1">
              <span className="min-w-0 flex-1">
                “{name}”{entry.working ? ' (with values still to fix)' : ''}, put aside when you {entry.reason} · <time dateTime={entry.at}>{formatWhen(entry.at)}</time>
              </span>
              <button type="button" onClick={() => onBringBack(at)} className="min-h-9 rounded-md border border-rule bg-white px-3 font-medium">
                Bring back<span className="sr-only"> “{name}”</span>
              </button>
              <button type="button" onClick={() => onLetGo(at)} className="min-h-9 rounded-md px-2 text-ink-soft underline">
                Let it go<span className="sr-only">: “{name}”</span>
              </button>
            </li>
          );
        })}
      </ul>
    </section>
  );
}
