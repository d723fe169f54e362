import { PLEX_SUBSET_COVERAGE, PLEX_SUBSETS, type PlexSubset } from './plex-coverage.ts';

/**
 * What the kit's fonts can print, on the server and in the browser alike: the IBM Plex Sans
 * subsets the PDF writer embeds (latin, latin-ext, greek, cyrillic, cyrillic-ext, vietnamese,
 * both weights). A name or label holding anything else would print as an empty box, so forms
 * and the API refuse it, naming the characters.
 */

/** Is code point `cp` inside the flattened inclusive ranges? Binary search over the pairs. */
function inRanges(ranges: readonly number[], cp: number): boolean {
  let lo = 0;
  let hi = ranges.length / 2 - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    if (cp < ranges[2 * mid]!) hi = mid - 1;
    else if (cp > ranges[2 * mid + 1]!) lo = mid + 1;
    else return true;
  }
  return false;
}

/** The first subset (in the writer's order) that prints the code point, if any does. */
export function plexSubsetFor(cp: number): PlexSubset | undefined {
  return PLEX_SUBSETS.find((subset) => inRanges(PLEX_SUBSET_COVERAGE[subset], cp));
}

export interface PrintableOptions {
  /** Line breaks and tabs are fine (multi-line notes); a one-line name or label refuses them. */
  multiline?: boolean;
}

const LINE_CHARACTERS = new Set(['\n', '\r', '\t']);

/** True when the shipped fonts print this one character (a code point, not a UTF-16 unit). */
export function isPrintableCharacter(char: string, options: PrintableOptions = {}): boolean {
  if (options.multiline && LINE_CHARACTERS.has(char)) return true;
  const cp = char.codePointAt(0);
  return cp !== undefined && plexSubsetFor(cp) !== undefined;
}

/** The characters of `text` the kit's fonts cannot print: each once, in the order they first appear. */
export function unprintableCharacters(text: string, options: PrintableOptions = {}): string[] {
  const found = new Set<string>();
  for (const char of text) if (!found.has(char) && !isPrintableCharacter(char, options)) found.add(char);
  return [...found];
}

/**
 * Characters for a message: visible ones in quotes ("☃"), invisible ones (controls, odd spaces,
 * format marks, a lone surrogate) by their code: U+200E.
 */
export function listCharacters(chars: readonly string[]): string {
  return chars
    .map((char) => {
      const cp = char.codePointAt(0) ?? 0;
      const invisible = /^[\p{C}\p{Z}]$/u.test(char) || (cp >= 0xd800 && cp <= 0xdfff);
      return invisible ? `U+${cp.toString(16).toUpperCase().padStart(4, '0')}` : `"${char}"`;
    })
    .join(', ');
}

/**
 * The plain sentence for a field holding unprintable characters, without the field's name
 * (the form puts that in front): 'has characters the printed kit cannot show: "☃", "𝄞". Use
 * letters, digits and common punctuation.' Undefined when everything prints.
 */
export function describeUnprintable(text: string, options: PrintableOptions = {}): string | undefined {
  const chars = unprintableCharacters(text, options);
  if (chars.length === 0) return undefined;
  return `has ${chars.length === 1 ? 'a character' : 'characters'} the printed kit cannot show: ${listCharacters(chars)}. Use letters, digits and common punctuation.`;
}

/** A zod refinement for one-line text that prints on a kit: refuses it naming the characters. */
export function refinePrintable(text: string, ctx: { addIssue(issue: { code: 'custom'; message: string }): void }): void {
  const message = describeUnprintable(text);
  if (message) ctx.addIssue({ code: 'custom', message });
}

/** Text as the kit can print it: any character the fonts lack becomes "?" (for data saved before the check). */
export function printableOrReplaced(text: string): string {
  let out = '';
  for (const char of text) out += isPrintableCharacter(char) ? char : '?';
  return out;
}
