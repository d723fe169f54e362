import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { renderClassPackPdf, renderHoleCsv, renderKitPdf } from '../../server/render/render-kit.ts';
import { SAFETY_NOTES } from '../../shared/print/build-sheet.ts';
import { pageCount, readPdfText } from '../helpers/rasterize-pdf.ts';

const template = (name: string) => JSON.parse(readFileSync(new URL(`../../templates/${name}.json`, import.meta.url), 'utf8'));

const meta = (builds: number, names: string[] = []) => ({
  title: 'Saturday troop build',
  when: 'Saturday 12 December 2026, 10:00 UTC',
  place: 'Scout hut, Mill Lane',
  instructor: 'Robin Example',
  builds,
  names,
});

/**
 * Counts read straight from the kit's hole table (the CSV the maker can download), without the
 * class pack's code: one row a hole, the drill in its own column.
 */
function drillCountsFromCsv(csv: string): Map<string, number> {
  const [header, ...rows] = csv.trim().split('\r\n');
  const columns = header!.split(',');
  const drill = columns.indexOf('drill');
  const counts = new Map<string, number>();
  for (const row of rows) {
    const label = row.split(',')[drill]!;
    counts.set(label, (counts.get(label) ?? 0) + 1);
  }
  return counts;
}

/** "• 3/16 in (4.76 mm): 192 holes (16 a stove); pilot 3/32 in" lines as the PDF reads back. */
function drillLinesOf(page: string) {
  return [...page.matchAll(/• ([^•:]+): (\d+) holes \((\d+) a stove\)/g)].map((m) => ({ drill: m[1]!.trim(), total: Number(m[2]), perBuild: Number(m[3]) }));
}

const names = (label: string, printed: string) => printed === label || printed.startsWith(`${label} (`) || printed.includes(`(${label})`);

describe('the class pack for a workshop', () => {
  it.each([
    ['pint-can-stove', 12],
    ['no10-can-stove', 1],
    ['metric-tin-stove', 30],
  ])('%s for %i builds: each drill’s hole count is the hole table’s rows for that drill, times the builds', async (name, builds) => {
    const design = template(name);
    const { bytes } = await renderClassPackPdf({ design, print: { paper: 'letter' } }, meta(builds));
    const [cover] = await readPdfText(bytes);
    const printed = drillLinesOf(cover!);

    const fromCsv = drillCountsFromCsv(renderHoleCsv({ design }).csv);
    expect(printed).toHaveLength(fromCsv.size);
    for (const [label, count] of fromCsv) {
      const line = printed.find((p) => names(label, p.drill));
      expect(line, `a line for ${label}`).toBeDefined();
      expect(line!.perBuild).toBe(count);
      expect(line!.total).toBe(count * builds);
    }
    const holes = [...fromCsv.values()].reduce((a, b) => a + b, 0);
    expect(printed.reduce((sum, p) => sum + p.total, 0)).toBe(holes * builds);
  });

  it('counts a can per part per build, straight from the design’s parts', async () => {
    const design = template('pint-can-stove');
    const { bytes } = await renderClassPackPdf({ design, print: { paper: 'a4' } }, meta(8));
    const [cover] = await readPdfText(bytes);
    for (const part of design.parts as { vessel: { name: string } }[]) {
      // One of each can per stove (the design file's parts), so 8 builds want 8 of each.
      expect(cover).toContain(`• 8 × ${part.vessel.name}`);
      expect(cover).toMatch(new RegExp(`${part.vessel.name.replace(/[()]/g, '\\$&')}[^•]*\\(1 a stove\\)`));
    }
    expect(cover).toContain('for 8 builds');
    expect(cover).toContain('Pilot drills:');
  });

  it('is the cover, the sign-off list, then the very kit a member prints, page for page', async () => {
    const design = template('pint-can-stove');
    const request = { design, print: { paper: 'letter' as const } };
    const kit = await renderKitPdf(request);
    const pack = await renderClassPackPdf(request, meta(3, ['Ada Example', 'ben@example.com', '']));
    // Kit: its sheets, the sheet map and the build sheet; the pack adds the cover and the sign-off page.
    expect(kit.pages).toBe(kit.sheets + 2);
    expect(await pageCount(kit.bytes)).toBe(kit.pages);
    expect(pack.pages).toBe(kit.pages + 2);
    expect(await pageCount(pack.bytes)).toBe(kit.pages + 2);
    const pages = await readPdfText(pack.bytes);
    const kitPages = await readPdfText(kit.bytes);
    expect(pages[1]).toContain('Safety briefing');
    expect(pages[1]).toContain('Ada Example');
    expect(pages[1]).toContain('ben@example.com');
    for (const note of SAFETY_NOTES) expect(pages[1]).toContain(note.split(' ').slice(0, 5).join(' '));
    expect(pages.slice(2)).toEqual(kitPages);
    expect(pack.fileName).toBe('saturday-troop-build-class-pack.pdf');
  });
});

describe('names on the class pack', () => {
  it('prints a roster name with a character the fonts lack, that character as "?" (no font carries U+2603 SNOWMAN)', async () => {
    const pack = await renderClassPackPdf({ design: template('pint-can-stove'), print: { paper: 'letter' } }, { ...meta(2, ['Ada ☃ Example', 'Жанна Ζήτα']), instructor: 'Robin ☃' });
    const pages = await readPdfText(pack.bytes);
    expect(pages[0]).toContain('Instructor: Robin ?');
    expect(pages[1]).toContain('Ada ? Example');
    expect(pages[1]).toContain('Жанна Ζήτα');
  });
});

describe('a class pack for a full workshop', () => {
  it('carries the sign-off list over pages until every name of 200 has its line', async () => {
    const design = template('pint-can-stove');
    const roster = Array.from({ length: 200 }, (_, i) => `Member ${String(i + 1).padStart(3, '0')}`);
    const request = { design, print: { paper: 'a4' as const } };
    const kit = await renderKitPdf(request);
    const pack = await renderClassPackPdf(request, meta(200, roster));
    const pages = await readPdfText(pack.bytes);
    const signOff = pages.slice(1, pack.pages - kit.pages);
    expect(signOff.length).toBeGreaterThan(1);
    expect(pages).toHaveLength(pack.pages);
    for (const name of roster) expect(signOff.filter((p) => p.includes(name)), name).toHaveLength(1);
    expect(signOff.slice(1).every((p) => p.startsWith('Signed: I was at the briefing (continued)'))).toBe(true);
  });
});
