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

describe('the design draft kept in the browser', () => {
  beforeEach(() => stored.clear());

  it('comes back after a reload at the step the maker was on, after undo, with redo still possible', async () => {
    const first = await loadStore();
    first.draftStore.start(step(0));
    for (let n = 1; n <= 25; n++) first.draftStore.record(step(n));
    for (let i = 0; i < 5; i++) first.draftStore.undo();
    expect(first.currentDocument(first.draftStore.get())).toEqual(step(20)); // worked arithmetic: 25 - 5

    const reloaded = await loadStore();
    const draft = reloaded.draftStore.get();
    expect(reloaded.currentDocument(draft)).toEqual(step(20));
    reloaded.draftStore.redo();
    expect(reloaded.currentDocument(reloaded.draftStore.get())).toEqual(step(21));
  });

  it('keeps the newest step current when nothing was undone', async () => {
    const first = await loadStore();
    first.draftStore.start(step(0));
    for (let n = 1; n <= 30; n++) first.draftStore.record(step(n));
    const reloaded = await loadStore();
    expect(reloaded.currentDocument(reloaded.draftStore.get())).toEqual(step(30));
  });
});

describe('opening another design over edited work', () => {
  beforeEach(() => stored.clear());

  it('puts the edited draft aside, and bringing it back restores it with its saved link', async () => {
    const store = (await loadStore()).draftStore;
    store.start(step(0), 'saved-1');
    store.record(step(1));
    store.start(step(100), 'saved-2');
    expect(store.replaced()?.history.at(-1)).toEqual(step(1));
    // Survives a reload too.
    const reloaded = await loadStore();
    expect(reloaded.draftStore.replaced()?.savedId).toBe('saved-1');
    reloaded.draftStore.bringBack();
    expect(reloaded.currentDocument(reloaded.draftStore.get())).toEqual(step(1));
    expect(reloaded.draftStore.get()?.savedId).toBe('saved-1');
    expect(reloaded.draftStore.replaced()).toBeNull();
  });

  it('puts nothing aside when the draft was never edited', async () => {
    const store = (await loadStore()).draftStore;
    store.start(step(0));
    store.start(step(100));
    expect(store.replaced()).toBeNull();
  });
});
