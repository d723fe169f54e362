import { useState } from 'react';
import { Link } from 'react-router';
import { checkDesignName } from '../field-limits.ts';
import { useDesignRow } from './design-row-actions.ts';

const small = 'inline-flex min-h-9 items-center rounded-md border px-2.5 text-sm font-medium';
const plain = `${small} border-rule bg-white hover:bg-ember-50`;
const danger = `${small} border-danger/40 bg-white text-danger hover:bg-danger/5`;

/** The design's name as a link to its history, or a form to rename it in place. */
export function NameCell() {
  const { design, nameId, renaming, setRenaming, busy, rename } = useDesignRow();
  const [tried, setTried] = useState(false);
  // Too long is said at once; an empty name only after trying to save it.
  const nameError = renaming !== undefined && (tried || renaming.trim()) ? checkDesignName(renaming) : undefined;
  const errorId = `${nameId}-error`;
  return (
    <>
      {renaming === undefined ? (
        <Link id={nameId} to={`/library/${encodeURIComponent(design.id)}`} className="font-medium text-ember-700 underline [overflow-wrap:anywhere]">
          {design.name}
        </Link>
      ) : (
        <form
          aria-label={`Rename ${design.name}`}
          className="flex flex-wrap items-center gap-2"
          noValidate
          onSubmit={(event) => {
            event.preventDefault();
            setTried(true);
            if (!checkDesignName(renaming)) void rename(renaming.trim());
          }}
        >
          <label id={nameId} className="sr-only" htmlFor={`${nameId}-input`}>
            New name for {design.name}
          </label>
          <input
            id={`${nameId}-input`}
            value={renaming}
            onChange={(e) => setRenaming(e.target.value)}
            aria-invalid={nameError ? true : undefined}
            aria-describedby={nameError ? errorId : undefined}
            autoFocus
            className="min-h-9 min-w-0 flex-1 rounded-md border border-rule bg-white px-2 text-sm aria-[invalid]:border-danger"
          />
          <button type="submit" disabled={busy} className={plain}>
            Save name
          </button>
          <button
            type="button"
            onClick={() => {
              setTried(false);
              setRenaming(undefined);
            }}
            className={plain}
          >
            Cancel
          </button>
          {nameError && (
            <p id={errorId} className="w-full text-sm text-danger">
              {nameError}
            </p>
          )}
        </form>
      )}
      <p className="text-xs text-ink-soft">
        {design.holeCount} holes · {design.parts} {design.parts === 1 ? 'part' : 'parts'}
      </p>
    </>
  );
}

/** Open, rename, duplicate, or delete after asking again; a failed request's message shows below. */
export function ActionsCell() {
  const { nameId, confirming, setConfirming, setRenaming, design, busy, problem, open, duplicate, remove } = useDesignRow();
  return (
    <>
      {confirming ? (
        <div role="group" aria-labelledby={nameId} className="flex flex-wrap items-center gap-2">
          <span className="text-sm">Delete with all its versions?</span>
          <button type="button" disabled={busy} onClick={() => void remove()} className={danger}>
            Yes, delete
          </button>
          <button type="button" onClick={() => setConfirming(false)} className={plain}>
            Keep it
          </button>
        </div>
      ) : (
        <div className="flex flex-wrap gap-2 lg:grid lg:w-max lg:grid-cols-2">
          <button type="button" disabled={busy} onClick={() => void open()} aria-describedby={nameId} className={plain}>
            Open
          </button>
          <button type="button" disabled={busy} onClick={() => setRenaming(design.name)} aria-describedby={nameId} className={plain}>
            Rename
          </button>
          <button type="button" disabled={busy} onClick={() => void duplicate()} aria-describedby={nameId} className={plain}>
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
    </>
  );
}
