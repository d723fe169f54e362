import { useState } from 'react';
import { Link } from 'react-router';
import type { DesignInput } from '../../../../shared/design/design-schema.ts';
import { validateDesign } from '../../../../shared/design/validate-design.ts';
import { sameDocument } from '../../../../shared/library/same-document.ts';
import { Button } from '../../../components/button.tsx';
import { Notice } from '../../../components/notice.tsx';
import { SignInLink } from '../../../components/sign-in-link.tsx';
import { ApiError } from '../../../lib/api-client.ts';
import { useAccount } from '../../account/api/get-account.ts';
import { draftStore, useDraft } from '../../designer/draft-store.ts';
import { useCreateDesign } from '../api/create-design.ts';
import { useSaveVersion } from '../api/save-version.ts';
import { checkVersionNote } from '../field-limits.ts';

interface Status {
  tone: 'success' | 'error' | 'info';
  text: string;
}

const linkClass = 'inline-flex min-h-10 items-center rounded-md px-3 text-sm font-medium text-ember-700 underline hover:bg-ember-50';

/** A failed save in the maker's terms. */
function describeFailure(error: unknown): Status {
  if (error instanceof ApiError && error.status === 409) return { tone: 'info', text: error.message };
  if (error instanceof ApiError && error.status === 400) return { tone: 'error', text: 'Fix the values listed above the form, then save again.' };
  if (error instanceof ApiError && error.status === 401) return { tone: 'error', text: 'You were signed out. Sign in again to save; your work stays here.' };
  return { tone: 'error', text: error instanceof ApiError ? error.message : 'The design could not be saved: the server could not be reached. Your work stays here; try again.' };
}

/**
 * Saving from the design screen. A draft bound to a library design saves as that design's next
 * version, and only there; anything else (an example, a shared copy, a file) saves as a new
 * design. "Save as new design" forks a bound one.
 */
export function SaveBar({ document, valid }: { document: DesignInput; valid: boolean }) {
  const { data: account } = useAccount();
  const draft = useDraft();
  const create = useCreateDesign();
  const save = useSaveVersion();
  const [note, setNote] = useState('');
  const [status, setStatus] = useState<Status>();
  const busy = create.isPending || save.isPending;
  const boundId = draft?.savedId && draft.accountId === account?.id ? draft.savedId : undefined;
  const noteError = checkVersionNote(note);

  if (account === undefined) return null; // still asking who is signed in
  if (account === null)
    return (
      <p className="text-sm">
        <SignInLink className={linkClass}>Sign in to save</SignInLink>
        <span className="text-ink-soft"> — your work stays here while you do.</span>
      </p>
    );

  /** The document as it will be stored (defaults filled in), or undefined while values need fixing. */
  function storable(): DesignInput | undefined {
    const checked = validateDesign(document);
    return checked.ok ? (checked.design as DesignInput) : undefined;
  }

  async function saveNew() {
    setStatus(undefined);
    const doc = storable();
    if (!doc || !account) return setStatus({ tone: 'error', text: 'Fix the values listed above the form, then save.' });
    try {
      const created = await create.mutateAsync({ document: structuredClone(doc) });
      draftStore.markSaved(created.id, account.id, doc);
      setStatus({ tone: 'success', text: `Saved “${created.name}” to your library as a new design.` });
    } catch (error) {
      setStatus(describeFailure(error));
    }
  }

  async function saveNext(id: string) {
    setStatus(undefined);
    const doc = storable();
    if (!doc || !account) return setStatus({ tone: 'error', text: 'Fix the values listed above the form, then save.' });
    if (draft?.baseline && sameDocument(JSON.parse(draft.baseline), doc)) return setStatus({ tone: 'info', text: 'Nothing has changed since the last save, so no new version was made.' });
    try {
      const saved = await save.mutateAsync({ id, input: { document: structuredClone(doc), note: note.trim() || undefined } });
      draftStore.markSaved(id, account.id, doc);
      setNote('');
      setStatus({ tone: 'success', text: `Saved version ${saved.currentVersion}.` });
    } catch (error) {
      if (error instanceof ApiError && error.status === 404) {
        draftStore.unbind();
        return setStatus({ tone: 'error', text: 'This design is no longer in your library. Your work stays here: save it as a new design.' });
      }
      setStatus(describeFailure(error));
    }
  }

  return (
    // A line of its own under the name and undo, so a message does not push the other fields about.
    <div className="flex w-full flex-wrap items-end gap-x-3 gap-y-2">
      {boundId ? (
        <form
          className="flex flex-wrap items-end gap-2"
          onSubmit={(event) => {
            event.preventDefault();
            if (!noteError) void saveNext(boundId);
          }}
        >
          <label className="flex min-w-0 flex-1 flex-col gap-1 text-xs font-medium text-ink-soft sm:w-56 sm:flex-none">
            Version note (optional)
            <input value={note} onChange={(e) => setNote(e.target.value)} aria-invalid={noteError ? true : undefined} aria-describedby={noteError ? 'version-note-error' : undefined} className="min-h-10 rounded-md border border-rule bg-white px-3 text-sm text-ink aria-[invalid]:border-danger" />
            {noteError && (
              <span id="version-note-error" className="text-xs font-normal text-danger">
                {noteError}
              </span>
            )}
          </label>
          <Button type="submit" disabled={busy || !valid || Boolean(noteError)}>
            Save new version
          </Button>
          <Button variant="secondary" disabled={busy || !valid} onClick={() => void saveNew()}>
            Save as new design
          </Button>
          <Link to={`/library/${encodeURIComponent(boundId)}`} className={linkClass}>
            History
          </Link>
        </form>
      ) : (
        <Button disabled={busy || !valid} onClick={() => void saveNew()}>
          Save as new design
        </Button>
      )}
      {!valid && <p className="text-xs text-ink-soft">Saving waits until the values marked below are fixed.</p>}
      {status && (
        <div className="min-w-0 flex-1 sm:min-w-64">
          <Notice tone={status.tone}>{status.text}</Notice>
        </div>
      )}
    </div>
  );
}
