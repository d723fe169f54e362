import type { AsideDraft, Draft } from './draft-store.ts';

const KEY = 'canwright.draft.v2';
const ASIDE_KEY = 'canwright.draft.aside.v2';
/** Where the first release kept the draft and the one draft it put aside. */
const OLD_KEY = 'canwright.draft.v1';
const OLD_REPLACED_KEY = 'canwright.draft.replaced.v1';
/** Steps kept across a reload (localStorage is small and shared with the rest of the site). */
const STORED_STEPS = 20;

function parse(key: string): unknown {
  try {
    return JSON.parse(localStorage.getItem(key) ?? 'null');
  } catch {
    return null;
  }
}

function asDraft(value: unknown): Draft | null {
  const d = value as Draft | null;
  if (!d || typeof d !== 'object' || !Array.isArray(d.history) || d.history.length === 0) return null;
  const index = Number.isInteger(d.index) ? Math.min(Math.max(0, d.index), d.history.length - 1) : d.history.length - 1;
  return { ...d, index };
}

/** The draft and the put-aside work as this browser last kept them (the first release's keys too). */
export function readStored(): { draft: Draft | null; aside: AsideDraft[] } {
  const draft = asDraft(parse(KEY)) ?? asDraft(parse(OLD_KEY));
  const list = parse(ASIDE_KEY);
  const aside = Array.isArray(list) ? list.map((e) => asDraft(e) as AsideDraft | null).filter((e): e is AsideDraft => e !== null) : [];
  const oldReplaced = asDraft(parse(OLD_REPLACED_KEY));
  if (oldReplaced && !Array.isArray(list)) aside.push({ ...oldReplaced, reason: 'opened another design', at: new Date(0).toISOString() });
  return { draft, aside };
}

/** Keeps the last steps only; the position moves with them (it may sit before the newest after undo). */
function trim(d: Draft): Draft {
  const dropped = Math.max(0, d.history.length - STORED_STEPS);
  return { ...d, history: d.history.slice(dropped), index: Math.max(0, d.index - dropped) };
}

export function writeStored(draft: Draft | null, aside: AsideDraft[]): void {
  try {
    if (draft) localStorage.setItem(KEY, JSON.stringify(trim(draft)));
    else localStorage.removeItem(KEY);
    localStorage.setItem(ASIDE_KEY, JSON.stringify(aside));
    localStorage.removeItem(OLD_KEY);
    localStorage.removeItem(OLD_REPLACED_KEY);
  } catch {
    // Storage full or blocked: the draft still lives for this page.
  }
}
