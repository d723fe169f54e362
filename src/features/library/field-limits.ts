import { DESIGN_NAME_MAX, LIBRARY_SEARCH_MAX, MAX_TAGS, TAG_MAX, VERSION_NOTE_MAX } from '../../../shared/library/library-schemas.ts';

/**
 * The library's field rules in the maker's words, at the same limits as the API's schemas
 * (shared/library/library-schemas.ts): lengths are counted after trimming and in characters
 * (Unicode code points: "🔥" is one), as zod counts them on the server, and nothing is cut short:
 * an over-long value stays as typed with its message beside it.
 */
function tooLong(text: string, max: number): string | undefined {
  const length = [...text.trim()].length;
  return length > max ? `Use at most ${max} characters; this has ${length}.` : undefined;
}

export function checkDesignName(text: string): string | undefined {
  if (!text.trim()) return 'Enter a name.';
  return tooLong(text, DESIGN_NAME_MAX);
}

export function checkVersionNote(text: string): string | undefined {
  return tooLong(text, VERSION_NOTE_MAX);
}

export function checkLibrarySearch(text: string): string | undefined {
  return tooLong(text, LIBRARY_SEARCH_MAX);
}

/** The tag as the server keeps it: trimmed and in lower case, so "Pint" and "pint" are one tag. */
export const normalizeTag = (text: string) => text.trim().toLowerCase();

/** Why `text` cannot be added to a design that has `tags`, or undefined if it can. */
export function checkNewTag(text: string, tags: readonly string[]): string | undefined {
  const tag = normalizeTag(text);
  if (!tag) return 'Type a tag to add.';
  if (tags.includes(tag)) return `“${tag}” is already a tag of this design.`;
  if (tags.length >= MAX_TAGS) return `A design can have at most ${MAX_TAGS} tags. Remove one to add another.`;
  return tooLong(tag, TAG_MAX);
}
