import { describe, expect, it } from 'vitest';
import type { Piece } from '../layout/layout-types.ts';
import { imposePieces } from './impose.ts';
import type { Imposition } from './imposition-types.ts';
import { listImpositionFaults } from './imposition-faults.ts';

// The fault finder is what the imposition tests lean on, so it must itself catch faults.
const strip: Piece = { kind: 'wrap-strip', id: 's', partId: 'p', role: 'shell', name: 'Wall', lengthMm: 300, heightMm: 50, fromYMm: 0, toYMm: 50, reference: 'bottom', vesselHeightMm: 50, vesselDiameterMm: 127, overlapTabMm: 15, seamAngleDeg: 0, markReachMm: 5 };
const disc: Piece = { kind: 'disc', id: 'd', partId: 'p', role: 'shell', name: 'End', face: 'bottom', diameterMm: 30, vesselDiameterMm: 127, indexAngleDeg: 0 };
const pieces = [strip, disc];

function impose(): Imposition {
  return imposePieces(pieces, { paper: 'letter', orientation: 'portrait', marginMm: 12.7 });
}

describe('listImpositionFaults', () => {
  it('finds none in a real imposition', () => {
    const imposition = impose();
    // Two tiles and the disc on one sheet (worked arithmetic: 63 + 4 + 63 + 4 + 42 = 176 <= 183 mm).
    expect(imposition.sheets.map((s) => s.placements.length)).toEqual([3]);
    expect(listImpositionFaults(imposition, pieces)).toEqual([]);
  });

  it.each<[string, (imposition: Imposition) => void, RegExp]>([
    ['a piece off the content', (i) => void (i.sheets[0]!.placements[0]!.rect.y -= 20), /leaves the content area/],
    ['pieces too close', (i) => void (i.sheets[0]!.placements[1]!.rect.y -= 2), /closer than 4 mm/],
    ['an origin off the contract', (i) => void (i.sheets[0]!.placements[0]!.originX += 0.5), /left edge of the shown strip/],
    ['a tile missing', (i) => void i.sheets[0]!.placements.splice(1, 1), /tile|placed/],
    ['a tile gap', (i) => void (i.sheets[0]!.placements[0]!.tile!.toXMm -= 1), /overlap by/],
    ['furniture on the content', (i) => void (i.sheets[0]!.furniture.notes.height = 60), /notes overlaps/],
    ['furniture off the page', (i) => void (i.sheets[0]!.furniture.rulerX.y += 20), /rulerX leaves the printable area/],
  ])('finds %s', (_what, spoil, expected) => {
    const imposition = impose();
    spoil(imposition);
    expect(listImpositionFaults(imposition, pieces).join('\n')).toMatch(expected);
  });
});
