import { useSyncExternalStore } from 'react';
import type { DesignInput } from '../../../shared/design/design-schema.ts';
import { readStored, writeStored } from './draft-storage.ts';

/**
 * The design being edited, with its undo history, kept in this browser so an unsaved design
 * survives a reload, and bound to the library design it came from so a save can only land there.
 */
export interface Draft {
  /** Steps that validate, oldest first; `index` is the one shown (undo moves it back). */
  history: DesignInput[];
  index: number;
  /** Values typed since the last step that do not validate yet (30.5 jets, an empty drill). */
  working?: DesignInput;
  /** The library design a save makes the next version of; none for examples, copies and files. */
  savedId?: string;
  /** The account signed in when this work was done; none for a visitor. */
  accountId?: string;
  /** The document as opened or last saved, as JSON: what "changed" is measured against. */
  baseline?: string;
  /** Changes whenever the shown document is replaced rather than edited (open, undo, bring back): the form reloads then. */
  key?: number;
}

/** Work put aside so another design could open: it waits here until brought back or let go. */
export interface AsideDraft extends Draft {
  /** Why it was put aside, finishing "put aside when you…". */
  reason: string;
  at: string;
}

/** Put-aside work kept at most; the oldest goes first (localStorage is small). */
const MAX_ASIDE = 8;
const MAX_HISTORY = 100;
const listeners = new Set<() => void>();
let draft: Draft | null = readStored().draft;
let aside: AsideDraft[] = readStored().aside;
let keys = Math.max(0, ...[draft, ...aside].map((d) => d?.key ?? 0));
const replaced = (d: Draft): Draft => ({ ...d, key: ++keys });

function emit(): void {
  writeStored(draft, aside);
  for (const listener of listeners) listener();
}

/** The document a draft shows: what was typed last, valid or not. */
export function shownDocument(d: Draft | null): DesignInput | undefined {
  return d ? (d.working ?? d.history[d.index]) : undefined;
}

/** The newest step that validates (what the print screen and the checks use). */
export function currentDocument(d: Draft | null): DesignInput | undefined {
  return d ? d.history[d.index] : undefined;
}

/** Edited since it was opened or saved: only such work needs keeping when something replaces it. */
export function isEdited(d: Draft | null): boolean {
  if (!d) return false;
  if (d.working) return true;
  return d.baseline === undefined ? d.history.length > 1 : JSON.stringify(d.history[d.index]) !== d.baseline;
}

function putAside(d: Draft | null, reason: string): void {
  if (!d || !isEdited(d)) return;
  aside = [{ ...d, history: [d.history[d.index]!], index: 0, reason, at: new Date().toISOString() }, ...aside].slice(0, MAX_ASIDE);
}

export interface StartOptions {
  savedId?: string;
  accountId?: string;
  /** Finishes "Your earlier work was put aside when you…", e.g. "opened the example “Pint stove”". */
  reason: string;
}

export const draftStore = {
  get: () => draft,
  aside: () => aside,
  subscribe(listener: () => void) {
    listeners.add(listener);
    return () => listeners.delete(listener);
  },
  /**
   * Opens another design (an example, a library design, a shared copy, a file, a blank one). Edited
   * work is put aside first, never lost; a design that is not from the library is bound to none.
   */
  start(document: DesignInput, { savedId, accountId, reason }: StartOptions) {
    putAside(draft, reason);
    draft = replaced({ history: [document], index: 0, savedId, accountId, baseline: JSON.stringify(document) });
    emit();
  },
  /** Makes put-aside work current again; the work it replaces is put aside in turn if edited. */
  bringBack(at: number) {
    const chosen = aside[at];
    if (!chosen) return;
    aside = aside.filter((_, i) => i !== at);
    putAside(draft, 'brought back other work');
    const { reason: _reason, at: _at, ...rest } = chosen;
    draft = replaced(rest);
    emit();
  },
  letGo(at: number) {
    aside = aside.filter((_, i) => i !== at);
    emit();
  },
  /** Records a step that validates; anything undone is dropped, and the typed values are this step. */
  record(document: DesignInput) {
    if (!draft) draft = { history: [document], index: 0 };
    else if (JSON.stringify(draft.history[draft.index]) === JSON.stringify(document)) draft = { ...draft, working: undefined };
    else {
      const history = [...draft.history.slice(0, draft.index + 1), document].slice(-MAX_HISTORY);
      draft = { ...draft, history, index: history.length - 1, working: undefined };
    }
    emit();
  },
  /** Keeps typed values that do not validate yet, so they survive a reload or a trip to another page. */
  keepWorking(document: DesignInput) {
    if (!draft || JSON.stringify(draft.working) === JSON.stringify(document)) return;
    draft = { ...draft, working: document };
    emit();
  },
  /** Back one step; with values still being fixed, back to the last step that validated first. */
  undo() {
    if (draft?.working) draft = replaced({ ...draft, working: undefined });
    else if (draft && draft.index > 0) draft = replaced({ ...draft, index: draft.index - 1 });
    else return;
    emit();
  },
  redo() {
    if (!draft || draft.working || draft.index >= draft.history.length - 1) return;
    draft = replaced({ ...draft, index: draft.index + 1 });
    emit();
  },
  /** After a save: bound to that library design, and unchanged as of this document. */
  markSaved(savedId: string, accountId: string, document: DesignInput) {
    if (!draft) return;
    draft = { ...draft, savedId, accountId, baseline: JSON.stringify(document) };
    emit();
  },
  /** The bound design is gone (deleted, or another account's): the work stays, bound to nothing. */
  unbind() {
    if (!draft) return;
    draft = { ...draft, savedId: undefined };
    emit();
  },
  /**
   * Follows who is signed in. A visitor's work carries on under the account that signs in; work
   * of another account (signed out, or someone else signed in) is put aside under its account
   * and the screen starts afresh, so one person's work never shows to the next.
   */
  follow(accountId: string | null) {
    if (!draft) return;
    if (!draft.accountId) {
      if (accountId && !draft.savedId) {
        draft = { ...draft, accountId };
        emit();
      }
      return;
    }
    if (draft.accountId === accountId) return;
    putAside(draft, accountId ? 'signed in as someone else' : 'signed out');
    draft = null;
    emit();
  },
};

/** Put-aside work this person may see: a visitor's, or their own account's. */
export function visibleAside(list: readonly AsideDraft[], accountId: string | null | undefined): { entry: AsideDraft; at: number }[] {
  return list.map((entry, at) => ({ entry, at })).filter(({ entry }) => !entry.accountId || entry.accountId === accountId);
}

export function useDraft(): Draft | null {
  return useSyncExternalStore(draftStore.subscribe, draftStore.get, () => null);
}

export function useAsideDrafts(): AsideDraft[] {
  return useSyncExternalStore(draftStore.subscribe, draftStore.aside, () => []);
}
