import { describe, expect, it } from 'vitest';
import { designListQuerySchema, MAX_TAGS, saveVersionInputSchema, updateDesignInputSchema } from '../../../shared/library/library-schemas.ts';
import { checkDesignName, checkLibrarySearch, checkNewTag, checkVersionNote, normalizeTag } from '../../../src/features/library/field-limits.ts';
import { buildDesign } from '../../helpers/design-factory.ts';

/** Zod's own wording (from memory of its messages): none may be shown in the library. */
const RAW = /Too (big|small)|expected|Invalid (input|string)|String must contain|Required/;

// The API's schemas are the source of the limits: a value the screen lets through must be one the
// server takes, and one it stops must be one the server would refuse with a 400.
const serverTakesName = (name: string) => updateDesignInputSchema.safeParse({ name }).success;
const serverTakesTags = (tags: string[]) => updateDesignInputSchema.safeParse({ tags }).success;
const document = buildDesign();
const serverTakesNote = (note: string) => saveVersionInputSchema.safeParse({ document, note }).success;
const serverTakesSearch = (q: string) => designListQuerySchema.safeParse({ q }).success;

/** Lengths either side of a limit, with padding the server trims, and "🔥", one character in two UTF-16 units (zod counts code points). */
const around = (max: number) => ['', '   ', 'a', 'a'.repeat(max), ` ${'a'.repeat(max)} `, 'a'.repeat(max + 1), `${'a'.repeat(max - 1)}🔥`, '🔥'.repeat(Math.ceil(max / 2) + 1)];

describe('library field limits agree with the API', () => {
  it.each([
    ['design name', checkDesignName, serverTakesName, 120],
    ['version note', checkVersionNote, serverTakesNote, 500],
    ['library search', checkLibrarySearch, serverTakesSearch, 100],
  ] as const)('%s: stopped exactly where the server refuses (at %#)', (_field, check, serverTakes, max) => {
    for (const text of around(max)) {
      // An empty note or search is fine (no note, no filter); an empty name is not.
      expect(check(text) === undefined, JSON.stringify(text)).toBe(serverTakes(text));
    }
    const message = check('a'.repeat(max + 12));
    expect(message).toBe(`Use at most ${max} characters; this has ${max + 12}.`);
    expect(message).not.toMatch(RAW);
  });

  it('a new tag: the same rules as the server, and a repeat or a full list said in words', () => {
    // The server keeps 20 tags at most and each at most 40 characters, in lower case (library-schemas.ts).
    const nineteen = Array.from({ length: MAX_TAGS - 1 }, (_, i) => `tag ${i}`);
    for (const text of around(40)) {
      const ok = checkNewTag(text, nineteen) === undefined;
      expect(ok, JSON.stringify(text)).toBe(text.trim() !== '' && serverTakesTags([...nineteen, normalizeTag(text)]));
    }
    expect(checkNewTag('Pint', ['pint', 'build night'])).toBe('“pint” is already a tag of this design.');
    const twenty = [...nineteen, 'tag 19'];
    expect(serverTakesTags([...twenty, 'one more'])).toBe(false);
    expect(checkNewTag('one more', twenty)).toBe('A design can have at most 20 tags. Remove one to add another.');
    expect(checkNewTag('  ', [])).toBe('Type a tag to add.');
  });
});
