/** A saved time in the reader's own locale and zone: "12 Mar 2026, 14:05" or similar. */
export function formatWhen(iso: string): string {
  return new Date(iso).toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });
}
