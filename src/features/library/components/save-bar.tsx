import { useState } from 'react';
import { Link } from 'react-router';
import type { DesignInput } from '../../../../shared/design/design-schema.ts';
import { Button } from '../../../components/button.tsx';
import { Notice } from '../../../components/notice.tsx';
import { ApiError } from '../../../lib/api-client.ts';
import { useAccount } from '../../account/api/get-account.ts';
import { draftStore, useDraft } from '../../designer/draft-store.ts';
import { useCreateDesign } from '../api/create-design.ts';
import { useSaveVersion } from '../api/save-version.ts';

interface Status {
  tone: 'success' | 'error';
  text: string;
  /** The linked design is gone (deleted, or another account's): offer to save it afresh. */
  lost?: boolean;
}

const linkClass = 'inline-flex min-h-10 items-center rounded-md px-3 text-sm font-medium text-ember-700 underline hover:bg-ember-50';

/** Explains a failed save in the maker's terms; a 400 means the form still has problems. */
function describeFailure(error: unknown): Status {
  if (error instanceof ApiError && error.status === 404)
    return { tone: 'error', text: 'This design is no longer in your library. You can save it again as a new design.', lost: true };
  if (error instanceof ApiError && error.status === 400) return { tone: 'error', text: 'Fix the values listed above the form, then save again.' };
  if (error instanceof ApiError && error.status === 401) return { tone: 'error', text: 'You were signed out. Sign in again to save.' };
  return { tone: 'error', text: error instanceof Error ? error.message : 'The design could not be saved.' };
}

/**
 * Saving from the design screen: a visitor is asked to sign in, a new draft becomes a library
 * design, and a draft linked to one is saved as its next version.
 */
export function SaveBar({ document }: { document: DesignInput }) {
  const { data: account } = useAccount();
  const draft = useDraft();
  const create = useCreateDesign();
  const save = useSaveVersion();
  const [note, setNote] = useState('');
  const [status, setStatus] = useState<Status>();
  const busy = create.isPending || save.isPending;
  const savedId = draft?.savedId;

  if (account === undefined) return null; // still asking who is signed in
  if (account === null)
    return (
      <Link to="/sign-in?next=/design" className={linkClass}>
        Sign in to save
      </Link>
    );

  async function saveNew() {
    setStatus(undefined);
    try {
      const created = await create.mutateAsync({ document: structuredClone(document) });
      draftStore.linkSaved(created.id);
      setStatus({ tone: 'success', text: `Saved “${created.name}” to your library.` });
    } catch (error) {
      setStatus(describeFailure(error));
    }
  }

  async function saveNext(id: string) {
    setStatus(undefined);
    try {
      const saved = await save.mutateAsync({ id, input: { document: structuredClone(document), note } });
      setNote('');
      setStatus({ tone: 'success', text: `Saved version ${saved.currentVersion}.` });
    } catch (error) {
      setStatus(describeFailure(error));
    }
  }

  return (
    // A line of its own under the name and undo, so a message does not push the other fields about.
    <div className="flex w-full flex-wrap items-end gap-x-3 gap-y-2">
      {savedId && !status?.lost ? (
        <form
          className="flex flex-wrap items-end gap-2"
          onSubmit={(event) => {
            event.preventDefault();
            void saveNext(savedId);
          }}
        >
          <label className="flex min-w-0 flex-1 flex-col gap-1 text-xs font-medium text-ink-soft sm:w-48 sm:flex-none">
            Version note (optional)
            <input value={note} onChange={(e) => setNote(e.target.value)} maxLength={500} className="min-h-10 rounded-md border border-rule bg-white px-3 text-sm text-ink" />
          </label>
          <Button type="submit" disabled={busy}>
            Save new version
          </Button>
          <Link to={`/library/${encodeURIComponent(savedId)}`} className={linkClass}>
            History
          </Link>
        </form>
      ) : (
        <Button disabled={busy} onClick={() => void saveNew()}>
          {status?.lost ? 'Save as a new design' : 'Save to library'}
        </Button>
      )}
      {status && (
        <div className="min-w-0 flex-1 sm:min-w-64">
          <Notice tone={status.tone}>{status.text}</Notice>
        </div>
      )}
    </div>
  );
}
