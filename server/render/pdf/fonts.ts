import { randomInt } from 'node:crypto';
import { readFile } from 'node:fs/promises';
import { createRequire } from 'node:module';
import fontkit from '@pdf-lib/fontkit';
import { CustomFontSubsetEmbedder, PDFFont } from 'pdf-lib';
import type { PDFDocument } from 'pdf-lib';
import { convertWoffToSfnt } from './woff-to-sfnt.ts';

/**
 * IBM Plex Sans for PDFs, prepared once per process: the WOFF files are unpacked to plain sfnt
 * and parsed by fontkit once, then every document gets its own subset embedders over the same
 * parsed fonts. Only glyphs a document encodes go into its file (pdf-lib subsets at save time).
 */
export type FontWeight = 'regular' | 'bold';

type Fontkit = Parameters<typeof CustomFontSubsetEmbedder.for>[0];
type ParsedFont = ReturnType<Fontkit['create']>;

interface PreparedFont {
  sfnt: Uint8Array;
  parsed: ParsedFont;
}

/** Fontsource file names; 600 (semibold) stands in for 'bold', as in the app's CSS. */
const FILES: Record<FontWeight, string> = {
  regular: '@fontsource/ibm-plex-sans/files/ibm-plex-sans-latin-400-normal.woff',
  bold: '@fontsource/ibm-plex-sans/files/ibm-plex-sans-latin-600-normal.woff',
};

/**
 * Shaping switched off: pdf-lib writes glyph ids at the font's advance widths and drops shaping
 * positions, so kerning and mark features only cost time, and for short Latin labels the
 * substitutions (ligatures, ccmp, fractions) are not worth fontkit's lookups either: with them,
 * laying out a label took about 7x longer (measured here, ~0.1 ms a label). One glyph a
 * character also matches what the layout's width estimates assume.
 */
const FEATURES = Object.fromEntries(
  ['ccmp', 'locl', 'rlig', 'mark', 'mkmk', 'calt', 'clig', 'liga', 'rclt', 'curs', 'kern', 'rvrn', 'ltra', 'ltrm', 'frac', 'numr', 'dnom'].map(
    (tag) => [tag, false],
  ),
);

let prepared: Promise<Record<FontWeight, PreparedFont>> | undefined;

async function prepareFont(specifier: string): Promise<PreparedFont> {
  const path = createRequire(import.meta.url).resolve(specifier);
  const sfnt = convertWoffToSfnt(new Uint8Array(await readFile(path)));
  return { sfnt, parsed: memoizeLayout(fontkit.create(sfnt)) };
}

/**
 * Without shaping a string's layout depends only on the string, and every kit lays out the same
 * few characters again (each document's subset embedder asks afresh): remember each answer for
 * the process. pdf-lib reads the glyphs and never changes them. Other calls reach the parsed font
 * through the prototype.
 */
function memoizeLayout(parsed: ParsedFont): ParsedFont {
  const runs = new Map<string, ReturnType<ParsedFont['layout']>>();
  const layout: ParsedFont['layout'] = (text, features) => {
    // Only single characters (how pdf-page-context asks), so the memory stays a few hundred entries;
    // the features are always FEATURES above, so the text alone is the key.
    if ([...text].length !== 1) return parsed.layout(text, features);
    let run = runs.get(text);
    if (!run) runs.set(text, (run = parsed.layout(text, features)));
    return run;
  };
  return Object.create(parsed, { layout: { value: layout } }) as ParsedFont;
}

/** Reads and parses both weights on first use; later calls share the result. */
export function preparePlexFonts(): Promise<Record<FontWeight, PreparedFont>> {
  if (!prepared) {
    prepared = Promise.all([prepareFont(FILES.regular), prepareFont(FILES.bold)]).then(([regular, bold]) => ({ regular, bold }));
    // A failed read is not cached: the next document tries again.
    prepared.catch(() => {
      prepared = undefined;
    });
  }
  return prepared;
}

/** ISO 32000-1, 9.6.4: a subset font's name starts with six upper-case letters and a plus. */
function createSubsetTag(): string {
  return Array.from({ length: 6 }, () => String.fromCharCode(65 + randomInt(26))).join('');
}

/**
 * Makes subset fonts for one document without embedding them: the caller embeds only the
 * weights it used (`font.embed()` before saving), so an unused weight costs nothing.
 */
export async function createPlexFonts(doc: PDFDocument): Promise<Record<FontWeight, PDFFont>> {
  const fonts = await preparePlexFonts();
  const create = async (weight: FontWeight): Promise<PDFFont> => {
    const { sfnt, parsed } = fonts[weight];
    // pdf-lib asks a fontkit to parse the bytes; hand it the font parsed once per process.
    const cachedKit: Fontkit = { create: () => parsed };
    const name = `${createSubsetTag()}+${parsed.postscriptName ?? 'IBMPlexSans'}`;
    const embedder = await CustomFontSubsetEmbedder.for(cachedKit, sfnt, name, FEATURES);
    return PDFFont.of(doc.context.nextRef(), doc, embedder);
  };
  return { regular: await create('regular'), bold: await create('bold') };
}
