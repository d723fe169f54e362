import { describe, expect, it } from 'vitest';
import { type Design } from '../../../shared/design/design-schema.ts';
import { findDrill } from '../../../shared/drills/index.ts';
import { layoutDesign } from '../../../shared/layout/layout-design.ts';
import { describeRowPositions } from '../../../shared/layout/describe-row.ts';
import { placeNextRing, placeNextRowHeight } from '../../../shared/layout/place-next.ts';
import { buildDesign } from '../../helpers/design-factory.ts';

const quarter = findDrill('frac:1/4')!.diameterMm; // 6.35 mm: 1/4 in x 25.4 (exact)
const diameterOf = (id: string) => findDrill(id)!.diameterMm;

function explicitDesign(rings: { radiusMm: number; count: number; phaseDeg: number }[]): Design {
  const design = buildDesign();
  design.parts[0]!.endPatterns = [{ id: 'floor', group: 'primary', face: 'bottom', drillId: 'frac:1/4', centerHole: true, stagger: false, phaseDeg: 0, rings: { strategy: 'explicit', rings } }];
  return design;
}

describe('adding a ring', () => {
  it('places each new ring clear of the others until the rim margin stops it', () => {
    const design = explicitDesign([]);
    const part = design.parts[0]!;
    const pattern = part.endPatterns[0]!;
    let added = 0;
    for (;;) {
      const ring = placeNextRing(pattern, part, quarter, design.rules);
      if (!ring) break;
      (pattern.rings as { rings: unknown[] }).rings.push(ring);
      added++;
      // Invariant: the layout finds no overlap and no thin metal after each ring (the checks are the judge).
      const bad = layoutDesign(design).findings.filter((f) => ['holes-overlap', 'thin-ligament', 'outside-usable-bottom', 'near-rim'].includes(f.rule));
      expect(bad).toEqual([]);
    }
    expect(added).toBeGreaterThan(1);
  });
});

describe('adding a row', () => {
  it('finds a height that does not overlap the rows there', () => {
    const design = buildDesign();
    const part = design.parts[0]!;
    for (let i = 0; i < 3; i++) {
      const height = placeNextRowHeight(part, quarter, diameterOf, design.rules);
      expect(height).not.toBeNull();
      part.sideRows.push({ id: `extra-${i}`, group: 'other', drillId: 'frac:1/4', count: 8, skip: [], height: height!, startDeg: 0, keepOuts: [], keepOutPolicy: 'drop' });
    }
    const overlaps = layoutDesign(design).findings.filter((f) => f.rule === 'holes-overlap' || f.rule === 'thin-ligament');
    expect(overlaps).toEqual([]);
  });
});

describe('a row in words', () => {
  it('says which position is left out and where', () => {
    const row = { id: 'r', group: 'secondary' as const, drillId: 'frac:3/16', count: 8, skip: [0], height: { from: 'top' as const, mm: 15 }, startDeg: 0, keepOuts: [], keepOutPolicy: 'drop' as const };
    expect(describeRowPositions(row, 4.7625, 80, 0)).toBe('8 positions, 7 holes: the one at the seam (position 1) left out');
    expect(describeRowPositions({ ...row, skip: [4] }, 4.7625, 80, 0)).toBe('8 positions, 7 holes: the one opposite the seam (position 5) left out');
    expect(describeRowPositions({ ...row, skip: [] }, 4.7625, 80, 0)).toBe('8 positions, 8 holes');
  });
});
