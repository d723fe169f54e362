import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { boundsOfCalls } from '../../shared/drawing/drawing-bounds.ts';
import { RecordingContext } from '../../shared/drawing/recording-context.ts';
import { ORDER_OF_WORK, SAFETY_NOTES } from '../../shared/print/build-sheet.ts';
import { prepareKit } from '../../server/render/render-kit.ts';

const design = JSON.parse(readFileSync(new URL('../../templates/pint-can-stove.json', import.meta.url), 'utf8'));

describe('the build sheet printed with every kit', () => {
  it('lists materials, each hole group with drill and pilot, the order of work and every safety note, inside the margins', () => {
    const { plan } = prepareKit({ design, print: { paper: 'letter' } });
    const recording = new RecordingContext();
    plan.drawBuildSheet(recording, { widthMm: 215.9, marginMm: 12.7 }); // ANSI Letter width
    const text = recording.calls.flatMap((c) => (c.op === 'text' ? [c.text] : [])).join('\n');
    expect(text).toContain('No. 303 food can (303x406)');
    expect(text).toContain('Secondary jets (holes 1–16): 16 × 3/16 in (4.76 mm), pilot 3/32 in');
    expect(text).toMatch(/Primary rings \(holes \d+–\d+\): 29 × 1\/4 in \(6\.35 mm\), pilot 1\/8 in/);
    for (const words of [...ORDER_OF_WORK, ...SAFETY_NOTES].map((s) => s.split(' ').slice(0, 4).join(' '))) expect(text).toContain(words);
    const bounds = boundsOfCalls(recording.calls)!;
    expect(bounds.minX).toBeGreaterThanOrEqual(12.7 - 0.5);
    expect(bounds.maxX).toBeLessThanOrEqual(215.9 - 12.7 + 0.5);
    expect(bounds.maxY).toBeLessThanOrEqual(279.4 - 12.7);
  });

  it('gives the print screen the same words as structured content, every hole counted once', () => {
    const { plan, layout } = prepareKit({ design, print: { paper: 'letter' } });
    const groups = plan.buildSheet.holes.flatMap((p) => p.groups);
    // Worked arithmetic from the example: 16 secondary jets + 29 primary holes = 45 holes.
    expect(groups.reduce((sum, g) => sum + g.count, 0)).toBe(layout.holes.length);
    expect(groups).toContainEqual({ label: 'Secondary jets', count: 16, numbers: '1–16', drill: '3/16 in (4.76 mm)', pilot: '3/32 in' });
    expect(plan.buildSheet.orderOfWork).toEqual(ORDER_OF_WORK);
    expect(plan.buildSheet.safety).toEqual(SAFETY_NOTES);
  });

  it('names what each sheet holds, in the words printed on it', () => {
    const { plan } = prepareKit({ design, print: { paper: 'letter' } });
    expect(plan.sheetContents).toHaveLength(plan.imposition.sheets.length);
    // A strip longer than the sheet is tiled; every tile is named "part n of m" (kit-text.ts).
    expect(plan.sheetContents.some((c) => /part 1 of \d/.test(c))).toBe(true);
    expect(plan.sheetContents.join(' ')).not.toMatch(/undefined/);
  });
});
