import { describe, expect, it } from 'vitest';
import { planRings, placeSideRow } from '../../../shared/layout/index.ts';
import { layoutDesign } from '../../../shared/layout/index.ts';
import { vesselFromCatalogue } from '../../../shared/vessels/index.ts';
import { buildDesign } from '../../helpers/design-factory.ts';

const row = (over: object) => ({ id: 'r', group: 'primary' as const, drillId: 'frac:1/4', count: 12, skip: [], height: { from: 'bottom' as const, mm: 20 }, startDeg: 0, keepOuts: [], keepOutPolicy: 'drop' as const, ...over });

describe('side rows', () => {
  it('drop policy leaves out the positions a keep-out touches and keeps the others in place', () => {
    const { positions, dropped } = placeSideRow(row({ keepOuts: [{ label: 'seam', startDeg: -20, endDeg: 20 }] }), 6.35, 80);
    expect(dropped.map((p) => p.angleDeg)).toEqual([0]);
    expect(positions.map((p) => p.angleDeg)).toEqual([30, 60, 90, 120, 150, 180, 210, 240, 270, 300, 330]);
  });

  it('respace policy puts all holes on the free arc at one pitch, half a pitch from the keep-out', () => {
    const { positions } = placeSideRow(row({ count: 10, keepOuts: [{ label: 'handle', startDeg: 80, endDeg: 100 }], keepOutPolicy: 'respace' }), 6.35, 80);
    expect(positions).toHaveLength(10);
    const pitch = 340 / 10; // 360 deg less the 20 deg keep-out, shared by 10 holes (worked arithmetic)
    expect(positions[0]!.angleDeg).toBeCloseTo(100 + pitch / 2, 9);
    const angles = positions.map((p) => p.angleDeg);
    for (const a of angles) expect(a > 80 && a < 100).toBe(false);
  });

  it('a row measured from the top sits below the top edge', () => {
    const layout = layoutDesign(buildDesign({ sideRows: [row({ height: { from: 'top', mm: 15 } })] }));
    expect(layout.holes[0]!.yMm).toBeCloseTo(111.125 - 15, 9); // 303x406: 4 6/16 in = 111.125 mm high (CMI)
  });

  it('measures the strip from the seam: a hole at the seam angle is at x = 0', () => {
    const vessel = { ...vesselFromCatalogue('food-303x406'), seamAngleDeg: 90 };
    const layout = layoutDesign(buildDesign({ vessel, sideRows: [row({ count: 4, startDeg: 0 })] }));
    const byAngle = Object.fromEntries(layout.holes.map((h) => [h.angleDeg, h.xMm]));
    const L = Math.PI * (vessel.outerDiameterMm + 0.1);
    expect(byAngle[90]).toBeCloseTo(0, 9);
    expect(byAngle[180]).toBeCloseTo(L / 4, 9);
    expect(byAngle[0]).toBeCloseTo((3 * L) / 4, 9);
  });
});

describe('end rings', () => {
  it('divider-friendly counts double ring by ring: 4, 8, 16, 32', () => {
    expect(planRings({ strategy: 'divider', ringCount: 4, firstCount: 4, firstRadiusMm: 8, ringSpacingMm: 8 }).map((r) => r.count)).toEqual([4, 8, 16, 32]);
  });

  it('equal-pitch counts grow with the radius to keep the pitch', () => {
    const rings = planRings({ strategy: 'equal-pitch', ringCount: 3, targetPitchMm: 12, firstRadiusMm: 10, ringSpacingMm: 10 });
    expect(rings.map((r) => r.count)).toEqual([5, 10, 16]); // round(2 pi r / 12) for r = 10, 20, 30 (worked arithmetic)
  });

  it('places a centre hole and the index mark straight up, and stagger keeps neighbouring rings off each other', () => {
    const layout = layoutDesign(
      buildDesign({ endPatterns: [{ id: 'e', group: 'primary', drillId: 'frac:1/4', centerHole: true, stagger: true, rings: { strategy: 'divider', ringCount: 3, firstCount: 4, firstRadiusMm: 10, ringSpacingMm: 10 } }] }),
    );
    const holes = layout.holes;
    expect(holes[0]).toMatchObject({ xMm: 0, yMm: 0, radiusMm: 0 });
    expect(holes[1]!.xMm).toBeCloseTo(0, 9);
    expect(holes[1]!.yMm).toBeCloseTo(10, 9);
    const anglesOf = (radius: number) => new Set(holes.filter((h) => h.radiusMm === radius).map((h) => Math.round(h.angleDeg * 1000)));
    const [r10, r20, r30] = [anglesOf(10), anglesOf(20), anglesOf(30)];
    for (const a of r20) expect(r10.has(a) || r30.has(a)).toBe(false);
  });
});

describe('wall bands on tall cans', () => {
  const jets = { id: 'jets', group: 'secondary' as const, drillId: 'frac:3/16', count: 24, height: { from: 'top' as const, mm: 20 }, startDeg: 7.5 };
  const low = { id: 'low', group: 'primary' as const, drillId: 'frac:1/4', count: 16, height: { from: 'bottom' as const, mm: 16 }, startDeg: 0 };

  it('a No. 10 can wall (177.8 mm, CMI) becomes a rim band and a bottom band, each as tall as its rows need', () => {
    const layout = layoutDesign(buildDesign({ vessel: vesselFromCatalogue('food-603x700'), sideRows: [jets, low] }));
    const strips = layout.pieces.filter((p) => p.kind === 'wrap-strip');
    expect(strips.map((s) => s.id)).toEqual(['chamber:wall-top', 'chamber:wall-bottom']);
    const [top, bottom] = strips;
    if (top?.kind !== 'wrap-strip' || bottom?.kind !== 'wrap-strip') throw new Error('strips expected');
    // Top band: from 12 mm below the lowest jet edge (177.8 - 20 - 2.38) to the rim (worked arithmetic).
    expect(top).toMatchObject({ reference: 'top', toYMm: 177.8 });
    expect(top.fromYMm).toBeCloseTo(177.8 - 20 - 4.7625 / 2 - 12, 9);
    expect(bottom).toMatchObject({ reference: 'bottom', fromYMm: 0 });
    expect(bottom.toYMm).toBeCloseTo(16 + 6.35 / 2 + 12, 9);
    expect(layout.holes.filter((h) => h.pieceId === 'chamber:wall-top')).toHaveLength(24);
  });

  it('a short can keeps one full-height strip with both edges', () => {
    const layout = layoutDesign(buildDesign({ sideRows: [jets, low] }));
    expect(layout.pieces.filter((p) => p.kind === 'wrap-strip').map((p) => p.id)).toEqual(['chamber:wall']);
  });
});
