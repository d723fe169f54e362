import { describe, expect, it } from 'vitest';
import { holeAreaMm2, holesForArea, openAreaMm2, proposePrimarySplits } from '../../../shared/airflow/index.ts';
import { layoutDesign } from '../../../shared/layout/index.ts';
import { buildDesign, inchToMm, sqInToMm2 } from '../../helpers/design-factory.ts';

// A maker's worked example (common practice, no source): 16 jet holes of 3/16 in give 0.44 sq in;
// five times that is 2.2 sq in of primary air; 1/4 in holes (0.049 sq in each) make that 45 holes;
// 16 of them in a low side row leaves 29 for the bottom as rings of 1 + 4 + 8 + 16.
describe('the 5 : 1 worked example', () => {
  const jets = openAreaMm2(16, inchToMm(3 / 16));

  it('16 jets of 3/16 in open 0.44 sq in', () => {
    expect(jets / 645.16).toBeCloseTo(0.44, 2);
  });

  it('a 1/4 in hole opens 0.049 sq in, and 2.2 sq in needs 45 of them', () => {
    expect(holeAreaMm2(inchToMm(1 / 4)) / 645.16).toBeCloseTo(0.049, 3);
    expect(sqInToMm2(2.2) / holeAreaMm2(inchToMm(1 / 4))).toBeCloseTo(44.8, 1);
    expect(holesForArea(jets * 5, inchToMm(1 / 4))).toBe(45);
  });

  it('proposes 16 in a low side row and 1 + 4 + 8 + 16 on the bottom first, and it passes the checks', () => {
    const design = buildDesign({
      sideRows: [{ id: 'jets', group: 'secondary', drillId: 'frac:3/16', count: 16, height: { from: 'top', mm: 15 }, startDeg: 11.25 }],
    });
    const [best] = proposePrimarySplits(design, { partId: 'chamber', drillId: 'frac:1/4' });
    expect(best).toBeDefined();
    expect(best!.sideCount).toBe(16);
    expect(best!.bottomCounts).toEqual([1, 4, 8, 16]);
    expect(best!.totalHoles).toBe(45);
    expect(best!.ratio).toBeCloseTo(5, 6);
  });

  it('the shell intake is 8 equal positions with the one at the seam skipped', () => {
    const design = buildDesign({
      role: 'shell',
      sideRows: [{ id: 'intake', group: 'intake', drillId: 'frac:3/8', count: 8, skip: [0], height: { from: 'bottom', mm: 18 }, startDeg: 0 }],
    });
    const holes = layoutDesign(design).holes;
    expect(holes.map((h) => h.angleDeg)).toEqual([45, 90, 135, 180, 225, 270, 315]);
    expect(holes.map((h) => h.index)).toEqual([1, 2, 3, 4, 5, 6, 7]);
  });
});
