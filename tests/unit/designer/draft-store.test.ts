import { beforeEach, describe, expect, it, vi } from 'vitest';
import type { DesignInput } from '../../../shared/design/design-schema.ts';

/** A Map behind the Storage methods the draft store uses; kept across a simulated reload. */
const stored = new Map<string, string>();
vi.stubGlobal('localStorage', {
  getItem: (key: string) => stored.get(key) ?? null,
  setItem: (key: string, value: string) => void stored.set(key, value),
  removeItem: (key: string) => void stored.delete(key),
});

/** A fresh module instance reads what the last one stored, as a page reload would. */
async function loadStore() {
  vi.resetModules();
  return import('../../../src/features/designer/draft-store.ts');
}

const step = (n: number) => ({ name: `step ${n}` }) as DesignInput;
const opened = { reason: 'opened another design' };

describe('the design draft kept in the browser', () => {
  beforeEach(() => stored.clear());

  it('comes back after a reload at the step the maker was on, after undo, with redo still possible', async () => {
    const first = await loadStore();
    first.draftStore.start(step(0), opened);
    for (let n = 1; n <= 25; n++) first.draftStore.record(step(n));
    for (let i = 0; i < 5; i++) first.draftStore.undo();
    expect(first.currentDocument(first.draftStore.get())).toEqual(step(20)); // worked arithmetic: 25 - 5

    const reloaded = await loadStore();
    const draft = reloaded.draftStore.get();
    expect(reloaded.currentDocument(draft)).toEqual(step(20));
    reloaded.draftStore.redo();
    expect(reloaded.currentDocument(reloaded.draftStore.get())).toEqual(step(21));
  });

  it('keeps values that do not validate yet across a reload, and undo goes back to the last good step', async () => {
    const first = await loadStore();
    first.draftStore.start(step(0), opened);
    first.draftStore.record(step(1));
    first.draftStore.keepWorking(step(99));
    const reloaded = await loadStore();
    const d = reloaded.draftStore.get();
    expect(reloaded.shownDocument(d)).toEqual(step(99));
    expect(reloaded.currentDocument(d)).toEqual(step(1));
    reloaded.draftStore.undo();
    expect(reloaded.shownDocument(reloaded.draftStore.get())).toEqual(step(1));
  });

  it('reads a draft the first release kept', async () => {
    stored.set('canwright.draft.v1', JSON.stringify({ history: [step(0), step(1)], index: 1, savedId: 'd1' }));
    const { draftStore, currentDocument } = await loadStore();
    expect(currentDocument(draftStore.get())).toEqual(step(1));
    expect(draftStore.get()?.savedId).toBe('d1');
  });
});

describe('opening another design over edited work', () => {
  beforeEach(() => stored.clear());

  it('puts the edited draft aside, and bringing it back restores it with its library link', async () => {
    const store = (await loadStore()).draftStore;
    store.start(step(0), { savedId: 'saved-1', accountId: 'a', reason: 'opened it' });
    store.record(step(1));
    store.start(step(100), { reason: 'opened the example “B”' });
    expect(store.aside()[0]?.history[0]).toEqual(step(1));
    expect(store.aside()[0]?.reason).toBe('opened the example “B”');
    expect(store.get()?.savedId).toBeUndefined();
    const reloaded = await loadStore();
    reloaded.draftStore.bringBack(0);
    expect(reloaded.currentDocument(reloaded.draftStore.get())).toEqual(step(1));
    expect(reloaded.draftStore.get()?.savedId).toBe('saved-1');
    expect(reloaded.draftStore.aside()).toEqual([]);
  });

  it('keeps every piece of edited work, not only the last', async () => {
    const store = (await loadStore()).draftStore;
    store.start(step(0), opened);
    store.record(step(1));
    store.start(step(10), opened);
    store.record(step(11));
    store.start(step(20), opened);
    expect(store.aside().map((a) => a.history[0])).toEqual([step(11), step(1)]);
  });

  it('puts nothing aside when the draft was not edited, or was edited back to where it started', async () => {
    const store = (await loadStore()).draftStore;
    store.start(step(0), opened);
    store.start(step(100), opened);
    store.record(step(101));
    store.undo();
    store.start(step(200), opened);
    expect(store.aside()).toEqual([]);
  });

  it('counts values still being fixed as edited work', async () => {
    const store = (await loadStore()).draftStore;
    store.start(step(0), opened);
    store.keepWorking(step(5));
    store.start(step(100), opened);
    expect(store.aside()[0]?.working).toEqual(step(5));
  });

  it('bringing work back puts the edited work it replaces aside', async () => {
    const { draftStore: store, currentDocument } = await loadStore();
    store.start(step(0), opened);
    store.record(step(1));
    store.start(step(10), opened);
    store.record(step(11));
    store.bringBack(0);
    expect(currentDocument(store.get())).toEqual(step(1));
    expect(store.aside().map((a) => a.history[0])).toEqual([step(11)]);
  });
});

describe('signing in and out', () => {
  beforeEach(() => stored.clear());

  it('carries a visitor’s work into the account that signs in', async () => {
    const { draftStore } = await loadStore();
    draftStore.start(step(0), opened);
    draftStore.record(step(1));
    draftStore.follow('maker');
    expect(draftStore.get()?.accountId).toBe('maker');
    expect(draftStore.aside()).toEqual([]);
  });

  it('puts an account’s edited work aside on sign-out, out of a visitor’s sight, and offers it back on sign-in', async () => {
    const { draftStore, visibleAside, currentDocument } = await loadStore();
    draftStore.start(step(0), { savedId: 'd1', accountId: 'maker', reason: 'opened it' });
    draftStore.record(step(1));
    draftStore.follow(null);
    expect(draftStore.get()).toBeNull();
    expect(visibleAside(draftStore.aside(), null)).toEqual([]);
    expect(visibleAside(draftStore.aside(), 'someone-else')).toEqual([]);
    const mine = visibleAside(draftStore.aside(), 'maker');
    expect(mine).toHaveLength(1);
    expect(mine[0]!.entry.reason).toBe('signed out');
    draftStore.bringBack(mine[0]!.at);
    expect(currentDocument(draftStore.get())).toEqual(step(1));
    expect(draftStore.get()?.savedId).toBe('d1');
  });
});
