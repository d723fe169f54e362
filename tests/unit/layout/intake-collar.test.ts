import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { designSchema, newPart, type DesignInput } from '../../../shared/design/index.ts';
import { collarOpenAreaMm2, lensAreaMm2 } from '../../../shared/layout/collar.ts';
import { layoutDesign, layoutDocument, type Layout } from '../../../shared/layout/index.ts';

type PartInput = DesignInput['parts'][number];

/**
 * Equal circles of radius r whose centres are s apart share the lens
 * A = 2 r^2 acos(s / 2r) - (s / 2) sqrt(4 r^2 - s^2) (E. W. Weisstein, MathWorld, "Circle-Circle
 * Intersection"). A shell of 100 mm with 8 intake holes of 10 mm has a pitch of
 * pi x 100 / 8 = 39.27 mm, more than two hole widths, so a collar can close it: worked values below.
 */
const measured = (diameterMm: number, heightMm: number, name: string) => ({ source: 'measured' as const, name, outerDiameterMm: diameterMm, heightMm, wallThicknessMm: 0.25 });
const shell: PartInput = {
  id: 'shell',
  role: 'shell',
  name: 'Outer shell',
  vessel: measured(100, 120, 'Test shell'),
  sideRows: [{ id: 'intake', label: 'Intake', group: 'intake', drillId: 'mm:10', count: 8, height: { from: 'bottom', mm: 20 }, startDeg: 22.5 }],
};
const chamber: PartInput = { id: 'chamber', role: 'burn-chamber', name: 'Burn chamber', vessel: measured(80, 110, 'Test chamber'), sideRows: [{ id: 'jets', group: 'secondary', drillId: 'mm:4', count: 16, height: { from: 'top', mm: 15 }, startDeg: 11.25 }] };
const collar = (diameterMm = 100.5): PartInput => ({ id: 'collar', role: 'intake-collar', name: 'Intake collar', vessel: measured(diameterMm, 32, 'Band') });
const stove = (parts: PartInput[]) => designSchema.parse({ schemaVersion: 1, name: 'Collar test', parts });

const collarHoles = (layout: Layout) => layout.holes.filter((h) => h.pieceId === 'collar:wall');
const shellIntake = (layout: Layout) => layout.holes.filter((h) => h.pieceId.startsWith('shell:') && h.group === 'intake');

describe('the lens of two equal circles (MathWorld, Circle-Circle Intersection)', () => {
  it('is the whole circle at 0, 0 at one diameter apart, and 1.228370 r^2 at one radius apart', () => {
    // s = 0: 2 r^2 acos(0) = pi r^2 = 78.539816 mm^2 for r = 5.
    expect(lensAreaMm2(5, 0)).toBeCloseTo(78.539816, 5);
    // s = r: 2 r^2 acos(1/2) - (r / 2) sqrt(3 r^2) = r^2 (2 pi / 3 - sqrt(3) / 2) = 1.228370 r^2 = 30.709242 mm^2.
    expect(lensAreaMm2(5, 5)).toBeCloseTo(30.709242, 5);
    expect(lensAreaMm2(5, 10)).toBe(0);
    expect(lensAreaMm2(5, 12)).toBe(0);
  });
});

describe('an intake collar over the shell intake row', () => {
  it('has holes that line up with the shell intake holes when fully open: same count, angles, drill and height on the stove', () => {
    const design = stove([chamber, shell, collar()]);
    const layout = layoutDesign(design);
    const ours = collarHoles(layout);
    const theirs = shellIntake(layout);
    expect(ours).toHaveLength(8);
    expect(theirs).toHaveLength(8);
    // Centred on the 20 mm intake row, a 32 mm band stands at 20 - 16 = 4 mm.
    const at = layout.assembly.find((p) => p.partId === 'collar')!;
    expect(at.bottomMm).toBeCloseTo(4, 9);
    const strip = layout.pieces.find((p) => p.id === 'collar:wall')!;
    expect(strip.kind).toBe('wrap-strip');
    for (const [index, hole] of theirs.entries()) {
      const mine = ours[index]!;
      expect(mine.angleDeg).toBeCloseTo(hole.angleDeg, 9);
      expect(mine.diameterMm).toBe(hole.diameterMm);
      expect(mine.drillId).toBe(hole.drillId);
      expect(at.bottomMm + mine.yMm).toBeCloseTo(hole.yMm, 9);
      // Along its own strip: the angle's share of pi x (100.5 + 0.1 paper) mm.
      if (strip.kind === 'wrap-strip') expect(mine.xMm).toBeCloseTo((hole.angleDeg / 360) * Math.PI * 100.6, 6);
    }
  });

  it('leaves its holes out of the air totals: the intake is counted once, at the shell', () => {
    const layout = layoutDesign(stove([chamber, shell, collar()]));
    const intake = layout.groups.find((g) => g.group === 'intake')!;
    expect(intake.holeCount).toBe(8);
    // 8 x pi x 10^2 / 4 = 628.318531 mm^2.
    expect(intake.openAreaMm2).toBeCloseTo(628.318531, 5);
  });

  it('gives the right open area at three settings: open, one radius turned, one diameter turned', () => {
    const layout = layoutDesign(stove([chamber, shell, collar()]));
    const range = layout.collars[0]!;
    const holes = shellIntake(layout);
    // mm per degree on the shell's outside: pi x 100 / 360 = 0.872665.
    const degFor = (mm: number) => mm / ((Math.PI * 100) / 360);
    // Open: 8 x 78.539816 = 628.318531 mm^2.
    expect(collarOpenAreaMm2(holes, 100, 0)).toBeCloseTo(628.318531, 5);
    expect(range.fullAreaMm2).toBeCloseTo(628.318531, 5);
    // Turned 5 mm (5.729578 deg): 8 x 30.709242 = 245.673940 mm^2, 0.391002 of open.
    expect(degFor(5)).toBeCloseTo(5.729578, 6);
    expect(collarOpenAreaMm2(holes, 100, degFor(5))).toBeCloseTo(245.67394, 4);
    // Turned 10 mm, one hole width: closed.
    expect(collarOpenAreaMm2(holes, 100, degFor(10))).toBeCloseTo(0, 5);
    expect(range.closes).toBe(true);
    expect(range.leastAreaMm2).toBeCloseTo(0, 6);
    expect(range.settings.map((s) => s.label)).toEqual(['open', '3/4', '1/2', '1/4', 'closed']);
    // Half open where the lens is half the circle: s = 0.807946 r = 4.039728 mm (solving the lens
    // equation above for A = pi r^2 / 2).
    const half = range.settings.find((s) => s.label === '1/2')!;
    expect(half.offsetMm).toBeCloseTo(4.039728, 4);
    expect(half.openAreaMm2).toBeCloseTo(314.159265, 3);
    expect(range.settings.at(-1)!.offsetMm).toBeCloseTo(10, 4);
    // The scale printed on the band: a tick at each setting's turn, along the band's strip.
    const scale = layout.marks.find((m) => m.kind === 'collar-scale');
    expect(scale?.kind === 'collar-scale' && scale.ticks.map((t) => t.label)).toEqual(['open', '3/4', '1/2', '1/4', 'closed']);
  });

  it('tells the range when neighbouring holes overlap before it can close (the No. 10 example)', () => {
    const result = layoutDocument(JSON.parse(readFileSync('templates/no10-can-stove.json', 'utf8')));
    if (!result.ok) throw new Error('the example should lay out');
    const range = result.layout.collars[0]!;
    // 22 positions of 1/2 in (12.7 mm) on 157.1625 mm: pitch pi x 157.1625 / 22 = 22.443 mm, under
    // two hole widths (25.4 mm), so turning never shuts every hole.
    expect(range.closes).toBe(false);
    expect(range.settings.at(-1)!.label).toBe('least');
    // Half a pitch (11.22 mm) turned, each hole overlaps two neighbours at 11.22 mm: 2 x lens(6.35, 11.22) = 2 x 6.02 mm^2 per
    // hole, about 9 % open (the seam gap, position 0 left out, shifts the least a little).
    expect(range.leastAreaMm2 / range.fullAreaMm2).toBeGreaterThan(0.08);
    expect(range.leastAreaMm2 / range.fullAreaMm2).toBeLessThan(0.1);
    expect(result.layout.findings.find((f) => f.rule === 'collar-range')?.message).toContain('at its tightest');
    expect(result.layout.findings.filter((f) => f.rule.startsWith('collar-') && f.severity !== 'note')).toEqual([]);
  });

  it('is an error when it cannot go round the shell, a warning when it hangs loose, an error with no intake to follow', () => {
    // Inside 99.5 - 0.5 = 99 mm against a 100 mm shell.
    const tight = layoutDesign(stove([chamber, shell, collar(99.5)])).findings.find((f) => f.rule === 'collar-too-tight');
    expect(tight?.severity).toBe('error');
    // Inside 104 - 0.5 = 103.5 mm: 3.5 mm loose, over 3 mm (common practice, no source).
    const loose = layoutDesign(stove([chamber, shell, collar(104)])).findings.find((f) => f.rule === 'collar-loose');
    expect(loose?.severity).toBe('warning');
    expect(loose!.numbers.looseMm).toBeCloseTo(3.5, 6);
    const bare = layoutDesign(stove([chamber, { ...shell, sideRows: [] }, collar()])).findings.find((f) => f.rule === 'collar-without-intake');
    expect(bare?.severity).toBe('error');
  });

  it('comes new from the part list sized to go snugly round the shell', () => {
    const part = newPart('intake-collar', { schemaVersion: 1, name: 'x', parts: [chamber, shell] });
    // 100 + 2 x 0.25 mm band (typical tinplate, from memory).
    expect(part.vessel.outerDiameterMm).toBeCloseTo(100.5, 9);
    const layout = layoutDesign(stove([chamber, shell, part]));
    expect(layout.findings.filter((f) => f.rule === 'collar-too-tight' || f.rule === 'collar-loose')).toEqual([]);
  });

  it('refuses rows and rings of its own, which the collar would not drill', () => {
    const withRow = { ...collar(), sideRows: [{ id: 'extra', group: 'intake' as const, drillId: 'mm:10', count: 4, height: { from: 'bottom' as const, mm: 10 }, startDeg: 0 }] };
    const refused = layoutDocument({ schemaVersion: 1, name: 'Collar test', parts: [chamber, shell, withRow] });
    expect(refused.ok).toBe(false);
    if (refused.ok) return;
    expect(refused.problems).toContainEqual({ path: 'parts.2.sideRows', message: 'an intake collar takes its holes from the shell’s intake row: remove its own rows' });
  });
});
