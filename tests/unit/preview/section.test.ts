import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { RecordingContext, type DrawCall } from '../../../shared/drawing/recording-context.ts';
import { layoutDocument, type Layout } from '../../../shared/layout/index.ts';
import { drawSection } from '../../../shared/print/draw-section.ts';
import { kitText } from '../../../shared/print/kit-text.ts';
import { planScene } from '../../../src/features/preview/preview-scene.ts';

const load = (name: string): Layout => {
  const result = layoutDocument(JSON.parse(readFileSync(new URL(`../../../templates/${name}.json`, import.meta.url), 'utf8')));
  if (!result.ok) throw new Error(`${name} should lay out`);
  return result.layout;
};

type Line = Extract<DrawCall, { op: 'line' }>;
const lines = (calls: DrawCall[]) => calls.filter((c): c is Line => c.op === 'line');
/** Vertical wall lines at x, as [top, bottom] runs in sheet mm. */
const runsAt = (calls: DrawCall[], x: number) =>
  lines(calls)
    .filter((l) => Math.abs(l.x1 - x) < 1e-9 && Math.abs(l.x2 - x) < 1e-9 && l.stroke.widthMm >= 0.5)
    .map((l) => [Math.min(l.y1, l.y2), Math.max(l.y1, l.y2)] as const)
    .sort((a, b) => a[0] - b[0]);

describe('the section through the stove', () => {
  it('nests the pint stove true to scale: walls at half each can across, the jets a gap at their height', () => {
    const layout = load('pint-can-stove');
    const rec = new RecordingContext();
    const plan = drawSection(rec, layout, kitText('mm'), new Set());
    const y = (mm: number) => plan.groundY - mm;
    // CMI can codes: 303 = 80.9625 mm and 401 = 103.1875 mm across; 406 = 111.125 mm, 411 = 119.0625 mm tall.
    const chamberRight = runsAt(rec.calls, plan.axisX + 80.9625 / 2);
    const shellRight = runsAt(rec.calls, plan.axisX + 103.1875 / 2);
    // The chamber hangs with its top level with the shell's: from 7.9375 mm to 119.0625 mm.
    expect(chamberRight[0]![0]).toBeCloseTo(y(119.0625), 9);
    expect(chamberRight.at(-1)![1]).toBeCloseTo(y(7.9375), 9);
    expect(shellRight[0]![0]).toBeCloseTo(y(119.0625), 9);
    expect(shellRight.at(-1)![1]).toBeCloseTo(y(0), 9);
    // Jets: 15 mm under the chamber top = 104.0625 mm up, 3/16 in = 4.7625 mm across: the wall breaks
    // from 106.44375 mm down to 101.68125 mm (worked arithmetic).
    const jetGap = chamberRight.findIndex((run, i) => i > 0 && Math.abs(run[0] - y(101.68125)) < 1e-9);
    expect(jetGap).toBeGreaterThan(0);
    expect(chamberRight[jetGap - 1]![1]).toBeCloseTo(y(106.44375), 9);
    // The shell's intake (1/2 in at 18 mm): a gap from 24.35 mm down to 11.65 mm.
    expect(shellRight.some((run) => Math.abs(run[1] - y(24.35)) < 1e-9)).toBe(true);
    expect(plan.dimensions.gapMm).toBeCloseTo((103.1875 - 0.5 - 80.9625) / 2, 9);
    expect(plan.dimensions.jetsMm).toBeCloseTo(104.0625, 9);
    expect(plan.dimensions.intakeMm).toBeCloseTo(18, 9);
    const words = rec.calls.flatMap((c) => (c.op === 'text' ? [c.text] : []));
    expect(words).toEqual(expect.arrayContaining(['gap 10.86 mm (27/64 in)', 'jets 104.06 mm (4 3/32 in)', 'intake 18 mm (45/64 in)']));
  });

  it('draws the parts a finding names heavier and names them, so the mark survives a black-and-white print', () => {
    const layout = load('metric-tin-stove'); // a 99 mm tin in a 153 mm one: a 26.75 mm gap, over the 25 mm rule
    const lit = new Set(layout.findings.filter((f) => f.rule === 'gap-wide').flatMap((f) => f.partIds ?? []));
    expect([...lit].sort()).toEqual(['chamber', 'shell']);
    const scene = planScene(layout, 'mm', 'assembled');
    const heavy = lines(scene.calls).filter((l) => l.stroke.widthMm > 0.5);
    expect(heavy.length).toBeGreaterThan(0);
    expect(scene.calls.filter((c) => c.op === 'text' && c.text.endsWith('(see the checks)'))).toHaveLength(2);
    expect(scene.label).toContain('(named by the checks)');
  });

  it('says where every part stands, for screen readers', () => {
    expect(planScene(load('seam-keepout-concentrator'), 'mm', 'assembled').label).toBe(
      // The chamber stands 7 mm up (its template says so); 146.05 mm tall, its top at 153.05 mm, the concentrator (40 mm) on it.
      'Section through the stove: Burn chamber from 7 mm (9/32 in) to 153.05 mm (6 1/32 in); Outer shell from 0 mm (0 in) to 142.88 mm (5 5/8 in); Flame concentrator from 153.05 mm (6 1/32 in) to 193.05 mm (7 19/32 in); gap 21.18 mm (53/64 in), jets at 137.05 mm (5 25/64 in), intake at 18 mm (45/64 in)',
    );
  });
});
