import type { CreateBurnInput } from '../../../shared/burns/burn-schema.ts';

/**
 * Entries written in the field but not yet on the server (no signal, server away). They stay in
 * the browser until the server has them, and the design's page offers to send them again.
 */
export interface UnsavedBurn {
  key: string;
  designId: string;
  input: CreateBurnInput;
  keptAt: string;
}

const KEY = 'canwright.unsaved-burns.v1';

export function listUnsaved(storage: Pick<Storage, 'getItem'> = localStorage): UnsavedBurn[] {
  try {
    const list = JSON.parse(storage.getItem(KEY) ?? '[]') as unknown;
    return Array.isArray(list) ? (list as UnsavedBurn[]).filter((u) => typeof u?.key === 'string' && typeof u.designId === 'string' && typeof u.input?.date === 'string') : [];
  } catch {
    return [];
  }
}

export function keepUnsaved(entry: UnsavedBurn, storage: Pick<Storage, 'getItem' | 'setItem'> = localStorage): void {
  storage.setItem(KEY, JSON.stringify([...listUnsaved(storage).filter((u) => u.key !== entry.key), entry]));
}

export function dropUnsaved(key: string, storage: Pick<Storage, 'getItem' | 'setItem'> = localStorage): void {
  storage.setItem(KEY, JSON.stringify(listUnsaved(storage).filter((u) => u.key !== key)));
}

/** The form being written for a design, kept on every change until the entry is saved or kept above. */
export const draftKey = (designId: string) => `canwright.burn-draft.v1.${designId}`;
