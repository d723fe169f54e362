import { randomInt } from 'node:crypto';
import fontkit from '@pdf-lib/fontkit';
import { CustomFontSubsetEmbedder, PDFFont } from 'pdf-lib';
import type { PDFDocument } from 'pdf-lib';
import { PLEX_SUBSETS, type PlexSubset } from '../../../shared/print/plex-coverage.ts';
import { plexSubsetFor } from '../../../shared/print/printable-text.ts';
import { FONT_WEIGHTS, readPlexWoff, type FontWeight } from './plex-files.ts';
import { convertWoffToSfnt } from './woff-to-sfnt.ts';

/**
 * IBM Plex Sans for PDFs, in Fontsource's subsets (latin, latin-ext, greek, cyrillic,
 * cyrillic-ext, vietnamese). The WOFF files are read once per process; a subset is unpacked to
 * plain sfnt and parsed by fontkit only when a document first needs one of its characters, and
 * then shared by every later document. Each document gets its own subset embedders over the
 * parsed fonts, made on first use, so only the subsets a document draws go into its file, and
 * only the glyphs it encodes (pdf-lib subsets at save time).
 */
export type { FontWeight } from './plex-files.ts';

type Fontkit = Parameters<typeof CustomFontSubsetEmbedder.for>[0];
type ParsedFont = ReturnType<Fontkit['create']>;

interface PreparedFont {
  sfnt: Uint8Array;
  parsed: ParsedFont;
}

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

type FontKey = `${PlexSubset}-${FontWeight}`;

/** The shipped files' bytes (about 150 kB for all twelve), read once per process. */
let files: Promise<Map<FontKey, Uint8Array>> | undefined;
/** Parsed subsets, each on first need. */
const parsedFonts = new Map<FontKey, PreparedFont>();

function readPlexFiles(): Promise<Map<FontKey, Uint8Array>> {
  if (!files) {
    const keys = PLEX_SUBSETS.flatMap((subset) => FONT_WEIGHTS.map((weight) => [subset, weight] as const));
    files = Promise.all(keys.map(async ([subset, weight]) => [`${subset}-${weight}`, await readPlexWoff(subset, weight)] as const)).then((entries) => new Map(entries));
    // A failed read is not cached: the next document tries again.
    files.catch(() => {
      files = undefined;
    });
  }
  return files;
}

function parsedFont(woffs: Map<FontKey, Uint8Array>, key: FontKey): PreparedFont {
  let font = parsedFonts.get(key);
  if (!font) {
    const woff = woffs.get(key);
    if (!woff) throw new Error(`No font file for ${key}`);
    const sfnt = convertWoffToSfnt(woff);
    font = { sfnt, parsed: memoizeLayout(fontkit.create(sfnt)) };
    parsedFonts.set(key, font);
  }
  return font;
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

/** Reads the font files on first use (later calls share them) and parses the latin subset, which every kit uses. */
export async function preparePlexFonts(): Promise<void> {
  const woffs = await readPlexFiles();
  for (const weight of FONT_WEIGHTS) parsedFont(woffs, `latin-${weight}`);
}

/** ISO 32000-1, 9.6.4: a subset font's name starts with six upper-case letters and a plus. */
function createSubsetTag(): string {
  return Array.from({ length: 6 }, () => String.fromCharCode(65 + randomInt(26))).join('');
}

/**
 * CustomFontSubsetEmbedder.for only awaits fontkit.create and calls this constructor; the font is
 * already parsed here, and text is drawn synchronously, so the embedder is made directly.
 */
const SubsetEmbedder = CustomFontSubsetEmbedder as unknown as new (font: ParsedFont, fontData: Uint8Array, customFontName: string, fontFeatures: typeof FEATURES) => CustomFontSubsetEmbedder;

/** One document's fonts: for each character, the subset font that prints it. */
export interface PlexFonts {
  /**
   * The font that prints `char` (one code point) in `weight`: the first subset that covers it
   * (shared/print/printable-text.ts); latin when none does (forms refuse such text; it prints
   * the font's empty box rather than failing the kit).
   */
  fontFor(weight: FontWeight, char: string): PDFFont;
}

/**
 * Makes subset fonts for one document without embedding them, each on first use: the caller
 * embeds only the fonts it used (`font.embed()` before saving), so an unused subset or weight
 * costs nothing.
 */
export async function createPlexFonts(doc: PDFDocument): Promise<PlexFonts> {
  const woffs = await readPlexFiles();
  const fonts = new Map<FontKey, PDFFont>();
  const byChar: Record<FontWeight, Map<string, PDFFont>> = { regular: new Map(), bold: new Map() };
  const fontOf = (key: FontKey): PDFFont => {
    let font = fonts.get(key);
    if (!font) {
      const { sfnt, parsed } = parsedFont(woffs, key);
      const name = `${createSubsetTag()}+${parsed.postscriptName ?? 'IBMPlexSans'}`;
      font = PDFFont.of(doc.context.nextRef(), doc, new SubsetEmbedder(parsed, sfnt, name, FEATURES));
      fonts.set(key, font);
    }
    return font;
  };
  return {
    fontFor(weight, char) {
      let font = byChar[weight].get(char);
      if (!font) {
        const subset = plexSubsetFor(char.codePointAt(0) ?? 0) ?? 'latin';
        byChar[weight].set(char, (font = fontOf(`${subset}-${weight}`)));
      }
      return font;
    },
  };
}
