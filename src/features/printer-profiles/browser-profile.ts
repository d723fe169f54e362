import { useMemo, useSyncExternalStore } from 'react';
import { printerProfileInputSchema, type PrinterProfileInput } from '../../../shared/print/printer-profile.ts';

/** A visitor without an account keeps one profile in this browser; v1 so a later shape can move on. */
export const BROWSER_PROFILE_KEY = 'canwright.printerProfile.v1';
// A tab's own writes fire no 'storage' event, so it tells its own hooks with this one.
const CHANGE_EVENT = 'canwright:printer-profile-change';

/** The stored text; null when nothing is stored or storage is blocked (private modes, policies). */
function readStoredText(): string | null {
  try {
    return window.localStorage.getItem(BROWSER_PROFILE_KEY);
  } catch {
    return null;
  }
}

/** Stored text that is not JSON or not a valid profile (hand-edited, older shape) reads as none. */
export function parseBrowserProfile(text: string | null): PrinterProfileInput | null {
  if (!text) return null;
  try {
    const result = printerProfileInputSchema.safeParse(JSON.parse(text));
    return result.success ? result.data : null;
  } catch {
    return null;
  }
}

export function readBrowserProfile(): PrinterProfileInput | null {
  return parseBrowserProfile(readStoredText());
}

/** Replaces the stored profile. Throws when the input is invalid or the browser refuses to store. */
export function saveBrowserProfile(input: PrinterProfileInput): PrinterProfileInput {
  const profile = printerProfileInputSchema.parse(input);
  window.localStorage.setItem(BROWSER_PROFILE_KEY, JSON.stringify(profile));
  window.dispatchEvent(new Event(CHANGE_EVENT));
  return profile;
}

export function forgetBrowserProfile(): void {
  try {
    window.localStorage.removeItem(BROWSER_PROFILE_KEY);
  } catch {
    // Blocked storage held nothing to forget.
  }
  window.dispatchEvent(new Event(CHANGE_EVENT));
}

function subscribe(onChange: () => void): () => void {
  // key null: another tab cleared all storage.
  const onStorage = (event: StorageEvent) => {
    if (event.key === BROWSER_PROFILE_KEY || event.key === null) onChange();
  };
  window.addEventListener('storage', onStorage);
  window.addEventListener(CHANGE_EVENT, onChange);
  return () => {
    window.removeEventListener('storage', onStorage);
    window.removeEventListener(CHANGE_EVENT, onChange);
  };
}

/** The visitor's stored profile, kept current across this tab and others. */
export function useBrowserProfile(): PrinterProfileInput | null {
  // The raw text is the snapshot: a string compares by value, so React re-renders only on change.
  const text = useSyncExternalStore(subscribe, readStoredText, () => null);
  return useMemo(() => parseBrowserProfile(text), [text]);
}
