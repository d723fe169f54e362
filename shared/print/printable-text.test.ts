import { describe, expect, it } from 'vitest';
import { describeUnprintable, isPrintableCharacter, plexSubsetFor, unprintableCharacters } from './printable-text.ts';

describe('characters the kit fonts print', () => {
  it('takes accented Latin, Greek, Cyrillic and Vietnamese letters', () => {
    // Sample words from memory; each letter's block from the Unicode code charts.
    expect(unprintableCharacters('Śliwka Ζήτα Жаровня Ґанок Tiếng Việt Straße Ærø 3/16 in (4.76 mm) – “ok”')).toEqual([]);
    expect(plexSubsetFor('A'.codePointAt(0)!)).toBe('latin');
    expect(plexSubsetFor('Ś'.codePointAt(0)!)).toBe('latin-ext');
    expect(plexSubsetFor('Ζ'.codePointAt(0)!)).toBe('greek');
    expect(plexSubsetFor('Ж'.codePointAt(0)!)).toBe('cyrillic');
  });

  it('names an emoji, a CJK character and a symbol outside the fonts, each once, in order', () => {
    // U+1F525 FIRE, U+7089 (a CJK ideograph), U+2603 SNOWMAN, U+1D11E MUSICAL SYMBOL G CLEF (Unicode code charts).
    expect(unprintableCharacters('Stove 🔥 炉 ☃ 🔥 𝄞 炉')).toEqual(['🔥', '炉', '☃', '𝄞']);
  });

  it('refuses line breaks in a one-line name but takes them in notes', () => {
    expect(unprintableCharacters('two\nlines')).toEqual(['\n']);
    expect(unprintableCharacters('two\nlines\ttabbed', { multiline: true })).toEqual([]);
    expect(isPrintableCharacter('\u0007', { multiline: true })).toBe(false);
  });

  it('says which characters in plain words, invisible ones by their code', () => {
    expect(describeUnprintable('Snow ☃ 𝄞')).toBe('has characters the printed kit cannot show: "☃", "𝄞". Use letters, digits and common punctuation.');
    expect(describeUnprintable('left\u200eright')).toBe('has a character the printed kit cannot show: U+200E. Use letters, digits and common punctuation.');
    expect(describeUnprintable('Plain name')).toBeUndefined();
  });
});
