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
/** The draft another design replaced, kept until the maker brings it back or lets it go. */
const REPLACED_KEY = 'canwright.draft.replaced.v1';
const listeners = new Set<() => void>();
let draft: Draft | null = read();
let replaced: Draft | null = read(REPLACED_KEY);

function read(key = KEY): Draft | null {
  try {
    const parsed = JSON.parse(localStorage.getItem(key) ?? 'null') as Draft | null;
    return parsed && Array.isArray(parsed.history) && parsed.history.length > 0 ? { ...parsed, index: Math.min(parsed.index, parsed.history.length - 1) } : null;
  } catch {
    return null;
  }
}

/** Stores a draft under a key (only its last steps), or removes it. */
function store(key: string, next: Draft | null): void {
  try {
    if (next) {
      // Only the last steps are kept; the position moves with them (it may sit before the newest after undo).
      const dropped = Math.max(0, next.history.length - STORED_STEPS);
      localStorage.setItem(key, JSON.stringify({ ...next, history: next.history.slice(dropped), index: Math.max(0, next.index - dropped) }));
    } else localStorage.removeItem(key);
  } catch {
    // Storage full or blocked: the draft still lives for this page.
  }
  for (const listener of listeners) listener();
}

function write(next: Draft | null): void {
  draft = next;
  store(KEY, next);
}

function setReplaced(next: Draft | null): void {
  replaced = next;
  store(REPLACED_KEY, next);
}

export const draftStore = {
  get: () => draft,
  subscribe(listener: () => void) {
    listeners.add(listener);
    return () => listeners.delete(listener);
  },
  /**
   * Starts a new draft (from a saved design or a shared one). A draft the maker had edited is put
   * aside, not lost: bringBack() returns to it.
   */
  start(document: DesignInput, savedId?: string) {
    if (draft && draft.history.length > 1) setReplaced(draft);
    write({ history: [document], index: 0, savedId });
  },
  /** The edited draft the last start() put aside, if any. */
  replaced: () => replaced,
  /** Makes the put-aside draft current again (the design that replaced it stays in the library or its link). */
  bringBack() {
    if (!replaced) return;
    write(replaced);
    setReplaced(null);
  },
  /** Lets the put-aside draft go. */
  forgetReplaced: () => setReplaced(null),
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

export function useReplacedDraft(): Draft | null {
  return useSyncExternalStore(draftStore.subscribe, draftStore.replaced, () => null);
}
