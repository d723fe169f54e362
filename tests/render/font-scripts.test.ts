import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { deriveCoverage } from '../../server/render/pdf/plex-files.ts';
import { renderKitPdf } from '../../server/render/render-kit.ts';
import { PLEX_SUBSET_COVERAGE } from '../../shared/print/plex-coverage.ts';

const template = (name: string) => JSON.parse(readFileSync(new URL(`../../templates/${name}.json`, import.meta.url), 'utf8'));

/** Runs a poppler-utils tool (pdftotext, pdffonts) on the bytes: a reader other than the one that wrote them. */
function poppler(tool: string, bytes: Uint8Array, args: string[] = []): string {
  const dir = mkdtempSync(join(tmpdir(), 'canwright-fonts-'));
  try {
    const file = join(dir, 'kit.pdf');
    writeFileSync(file, bytes);
    return execFileSync(tool, [...args, file, ...(tool === 'pdftotext' ? ['-'] : [])], { encoding: 'utf8' });
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** Font rows of `pdffonts` (after its two header lines). */
const embeddedFonts = (bytes: Uint8Array) => poppler('pdffonts', bytes).trim().split('\n').slice(2);

describe('text in any script the kit fonts carry', () => {
  it('prints a name in accented Latin, Greek and Cyrillic as itself', async () => {
    // Polish, Greek and Russian words (from memory): Ś is latin-ext, ή greek, Ж cyrillic.
    const name = 'Śliwka Ζήτα Жаровня';
    const design = template('pint-can-stove');
    design.name = name;
    design.parts[0].name = 'Камера Ζήτα';
    const { bytes } = await renderKitPdf({ design, print: { paper: 'letter' } });
    const lines = poppler('pdftotext', bytes, ['-enc', 'UTF-8']).split('\n').map((line) => line.trim());
    // The title block of every sheet carries the name on a line of its own, and the build sheet's title follows it.
    expect(lines).toContain(name);
    expect(lines).toContain(`${name}: build sheet`);
    expect(lines.some((line) => line.startsWith('• Камера Ζήτα: '))).toBe(true);
    // The extra subsets are embedded because they are used: regular and bold of latin plus latin-ext, greek, cyrillic.
    expect(embeddedFonts(bytes).length).toBeGreaterThan(2);
  });

  it('prints a letter typed with a combining accent as the one composed letter (Unicode NFC)', async () => {
    // "S" + U+0301 COMBINING ACUTE ACCENT composes to U+015A "Ś" (Unicode Standard Annex #15).
    const typed = 'S\u0301liwka';
    const design = template('pint-can-stove');
    design.name = typed;
    const { bytes } = await renderKitPdf({ design, print: { paper: 'letter' } });
    const lines = poppler('pdftotext', bytes, ['-enc', 'UTF-8']).split('\n').map((line) => line.trim());
    expect(lines).toContain('\u015Aliwka');
    expect(lines.some((line) => line.includes('\u0301'))).toBe(false);
  });

  it('embeds only the latin subset, one font a weight, for a Latin-only kit', async () => {
    const { bytes } = await renderKitPdf({ design: template('pint-can-stove'), print: { paper: 'letter' } });
    const fonts = embeddedFonts(bytes);
    expect(fonts).toHaveLength(2);
    expect(fonts.map((row) => row.split(/\s+/)[0]!.replace(/^[A-Z]{6}\+/, '')).sort()).toEqual(['IBMPlexSans-Regular', 'IBMPlexSans-SemiBold']);
  });

  it('keeps the committed coverage table equal to what the shipped font files hold', async () => {
    // Re-derived from @fontsource/ibm-plex-sans's WOFF files; after a font update run node scripts/font-coverage.mjs.
    const derived = await deriveCoverage();
    expect(derived).toEqual(Object.fromEntries(Object.entries(PLEX_SUBSET_COVERAGE).map(([subset, ranges]) => [subset, [...ranges]])));
    // Sanity on the table itself (Unicode code charts): A, Ω and Ж are in it, the snowman is not.
    const covers = (cp: number) => Object.values(derived).some((r) => r.some((_, i) => i % 2 === 0 && r[i]! <= cp && cp <= r[i + 1]!));
    expect([0x41, 0x3a9, 0x416].map(covers)).toEqual([true, true, true]);
    expect(covers(0x2603)).toBe(false);
  });
});
