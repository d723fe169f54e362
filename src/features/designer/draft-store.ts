import { useSyncExternalStore } from 'react';
import type { DesignInput } from '../../../shared/design/design-schema.ts';

/**
 * The design being edited, with its undo history, kept in this browser so an unsaved design
 * survives a reload. `savedId` links it to a library design once saved.
 */
export interface Draft {
  history: DesignInput[];
  index: number;
  savedId?: string;
}

const KEY = 'canwright.draft.v1';
const MAX_HISTORY = 100;
/** Steps kept across a reload (localStorage is small and shared with the rest of the site). */
const STORED_STEPS = 20;
const listeners = new Set<() => void>();
let draft: Draft | null = read();

function read(): Draft | null {
  try {
    const parsed = JSON.parse(localStorage.getItem(KEY) ?? 'null') as Draft | null;
    return parsed && Array.isArray(parsed.history) && parsed.history.length > 0 ? { ...parsed, index: Math.min(parsed.index, parsed.history.length - 1) } : null;
  } catch {
    return null;
  }
}

function write(next: Draft | null): void {
  draft = next;
  try {
    if (next) {
      // Only the last steps are kept; the position moves with them (it may sit before the newest after undo).
      const dropped = Math.max(0, next.history.length - STORED_STEPS);
      localStorage.setItem(KEY, JSON.stringify({ ...next, history: next.history.slice(dropped), index: Math.max(0, next.index - dropped) }));
    }
    else localStorage.removeItem(KEY);
  } catch {
    // Storage full or blocked: the draft still lives for this page.
  }
  for (const listener of listeners) listener();
}

export const draftStore = {
  get: () => draft,
  subscribe(listener: () => void) {
    listeners.add(listener);
    return () => listeners.delete(listener);
  },
  /** Starts a new draft (from an example, a saved design or a shared one). */
  start(document: DesignInput, savedId?: string) {
    write({ history: [document], index: 0, savedId });
  },
  /** Records an edit; anything that was undone is dropped. */
  record(document: DesignInput) {
    if (!draft) return write({ history: [document], index: 0 });
    if (JSON.stringify(draft.history[draft.index]) === JSON.stringify(document)) return;
    const history = [...draft.history.slice(0, draft.index + 1), document].slice(-MAX_HISTORY);
    write({ ...draft, history, index: history.length - 1 });
  },
  undo() {
    if (draft && draft.index > 0) write({ ...draft, index: draft.index - 1 });
  },
  redo() {
    if (draft && draft.index < draft.history.length - 1) write({ ...draft, index: draft.index + 1 });
  },
  linkSaved(savedId: string) {
    if (draft) write({ ...draft, savedId });
  },
  clear: () => write(null),
};

export function useDraft(): Draft | null {
  return useSyncExternalStore(draftStore.subscribe, draftStore.get, () => null);
}

export function currentDocument(d: Draft | null): DesignInput | undefined {
  return d ? d.history[d.index] : undefined;
}
