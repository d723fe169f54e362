import { useQueryClient } from '@tanstack/react-query';
import { useId, useState } from 'react';
import { Link, useNavigate } from 'react-router';
import type { DesignListItem } from '../../../../shared/library/library-schemas.ts';
import { draftStore } from '../../designer/draft-store.ts';
import { useDeleteDesign } from '../api/delete-design.ts';
import { designQueryOptions } from '../api/get-design.ts';
import { useDuplicateDesign } from '../api/duplicate-design.ts';
import { useUpdateDesign } from '../api/update-design.ts';
import { formatWhen } from '../format-when.ts';
import { TagChips } from './tag-chips.tsx';

const small = 'inline-flex min-h-9 items-center rounded-md border px-2.5 text-sm font-medium';
const plain = `${small} border-rule bg-white hover:bg-ember-50`;
const danger = `${small} border-danger/40 bg-white text-danger hover:bg-danger/5`;
/** On a phone each cell is a line of a card, headed by this label. */
const cellLabel = 'mr-2 text-xs font-medium text-ink-soft sm:hidden';
const cell = 'block px-3 py-1 sm:table-cell sm:py-3 sm:align-top';

/** One design in the library table: open, rename in place, duplicate, or delete after asking again. */
export function DesignRow({ design }: { design: DesignListItem }) {
  const nameId = useId();
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  const update = useUpdateDesign();
  const duplicate = useDuplicateDesign();
  const remove = useDeleteDesign();
  const [renaming, setRenaming] = useState<string>();
  const [confirming, setConfirming] = useState(false);
  const [problem, setProblem] = useState<string>();
  const busy = update.isPending || duplicate.isPending || remove.isPending;

  async function run(action: () => Promise<unknown>) {
    setProblem(undefined);
    try {
      await action();
    } catch (error) {
      setProblem((error as Error).message);
    }
  }

  const open = () =>
    run(async () => {
      const detail = await queryClient.fetchQuery(designQueryOptions(design.id));
      draftStore.start(structuredClone(detail.document), design.id);
      await navigate('/design');
    });
  const rename = (name: string) =>
    run(async () => {
      await update.mutateAsync({ id: design.id, change: { name } });
      setRenaming(undefined);
    });

  return (
    <tr className="block border-b border-rule py-2 last:border-b-0 sm:table-row sm:py-0">
      <td className={cell}>
        {renaming === undefined ? (
          <Link id={nameId} to={`/library/${encodeURIComponent(design.id)}`} className="font-medium text-ember-700 underline [overflow-wrap:anywhere]">
            {design.name}
          </Link>
        ) : (
          <form
            aria-label={`Rename ${design.name}`}
            className="flex flex-wrap items-center gap-2"
            onSubmit={(event) => {
              event.preventDefault();
              void rename(renaming);
            }}
          >
            <label id={nameId} className="sr-only" htmlFor={`${nameId}-input`}>
              New name for {design.name}
            </label>
            <input id={`${nameId}-input`} value={renaming} onChange={(e) => setRenaming(e.target.value)} maxLength={120} required autoFocus className="min-h-9 min-w-0 flex-1 rounded-md border border-rule bg-white px-2 text-sm" />
            <button type="submit" disabled={busy || !renaming.trim()} className={plain}>
              Save name
            </button>
            <button type="button" onClick={() => setRenaming(undefined)} className={plain}>
              Cancel
            </button>
          </form>
        )}
        <p className="text-xs text-ink-soft">
          {design.holeCount} holes · {design.parts} {design.parts === 1 ? 'part' : 'parts'}
        </p>
      </td>
      <td className={cell}>
        <span className={cellLabel}>Tags</span>
        <TagChips tags={design.tags} />
      </td>
      <td className={`${cell} whitespace-nowrap text-sm`}>
        <span className={cellLabel}>Updated</span>
        <time dateTime={design.updatedAt}>{formatWhen(design.updatedAt)}</time>
      </td>
      <td className={`${cell} whitespace-nowrap text-sm`}>
        <span className={cellLabel}>Last printed</span>
        {design.lastPrintedAt ? <time dateTime={design.lastPrintedAt}>{formatWhen(design.lastPrintedAt)}</time> : <span className="text-ink-soft">Never</span>}
      </td>
      <td className={`${cell} text-sm`}>
        <span className={cellLabel}>Version</span>
        {design.currentVersion}
      </td>
      <td className={design.shared ? cell : 'hidden px-3 sm:table-cell sm:py-3'}>
        {design.shared && <span className="rounded-full bg-ok/10 px-2 py-0.5 text-xs font-medium text-ok">Shared</span>}
      </td>
      <td className={`${cell} pt-2`}>
        {confirming ? (
          <div role="group" aria-labelledby={nameId} className="flex flex-wrap items-center gap-2">
            <span className="text-sm">Delete with all its versions?</span>
            <button type="button" disabled={busy} onClick={() => void run(() => remove.mutateAsync(design.id))} className={danger}>
              Yes, delete
            </button>
            <button type="button" onClick={() => setConfirming(false)} className={plain}>
              Keep it
            </button>
          </div>
        ) : (
          <div className="flex flex-wrap gap-2 lg:flex-nowrap">
            <button type="button" disabled={busy} onClick={() => void open()} aria-describedby={nameId} className={plain}>
              Open
            </button>
            <button type="button" disabled={busy} onClick={() => setRenaming(design.name)} aria-describedby={nameId} className={plain}>
              Rename
            </button>
            <button type="button" disabled={busy} onClick={() => void run(() => duplicate.mutateAsync(design.id))} aria-describedby={nameId} className={plain}>
              Duplicate
            </button>
            <button type="button" disabled={busy} onClick={() => setConfirming(true)} aria-describedby={nameId} className={danger}>
              Delete
            </button>
          </div>
        )}
        {problem && (
          <p role="alert" className="mt-1 text-sm text-danger">
            {problem}
          </p>
        )}
      </td>
    </tr>
  );
}
