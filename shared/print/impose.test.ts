import { describe, expect, it } from 'vitest';
import type { DiscPiece, Piece, WrapStripPiece } from '../layout/layout-types.ts';
import { layoutFurniture } from './furniture.ts';
import { checkImposable, imposePieces, ImpositionError, MAX_SHEETS } from './impose.ts';
import { listImpositionFaults } from './imposition-faults.ts';
import { paperIds, sheetSize, type PrintOptions } from './paper.ts';
import { TILE_OVERLAP_MM } from './tile-strip.ts';

function makeStrip(overrides: Partial<WrapStripPiece> = {}): WrapStripPiece {
  const heightMm = overrides.heightMm ?? 100;
  return { kind: 'wrap-strip', id: 'strip', partId: 'p', role: 'burn-chamber', name: 'Burn chamber, wall', lengthMm: 200, heightMm, fromYMm: 0, toYMm: heightMm, reference: 'bottom', vesselHeightMm: heightMm, vesselDiameterMm: 63.6, overlapTabMm: 15, seamAngleDeg: 0, markReachMm: 5, ...overrides };
}

function makeDisc(overrides: Partial<DiscPiece> = {}): DiscPiece {
  return { kind: 'disc', id: 'disc', partId: 'p', role: 'burn-chamber', name: 'Burn chamber, bottom', face: 'bottom', diameterMm: 73, vesselDiameterMm: 80, indexAngleDeg: 0, ...overrides };
}

// No. 10 can, can code 603 x 700: 6 3/16 in = 157.16 mm across, 7 in = 177.8 mm tall (can codes
// give whole inches then sixteenths; from memory); strip length pi x (D + 0.1 mm paper), worked arithmetic.
const no10 = makeStrip({ id: 'no10', name: 'No. 10 wall', lengthMm: Math.PI * (157.16 + 0.1), heightMm: 177.8, vesselDiameterMm: 157.16 });
// Pint can, 303 x 406: 3 3/16 in = 80.96 mm, 4 6/16 in = 111.1 mm (from memory); pi x 81.06 = 254.7 mm.
const pint = makeStrip({ id: 'pint', name: 'Pint wall', lengthMm: 254.7, heightMm: 111.1, vesselDiameterMm: 80.96 });
const disc73 = makeDisc({ id: 'd73', name: 'Small end', diameterMm: 73 });
const disc149 = makeDisc({ id: 'd149', name: 'Large end', diameterMm: 149 });
const pieceSets: [string, Piece[]][] = [
  ['No. 10 strip', [no10]],
  ['pint strip', [pint]],
  ['73 mm disc', [disc73]],
  ['149 mm disc', [disc149]],
  ['two strips and two discs', [no10, pint, disc73, disc149]],
];
const options = (paper: PrintOptions['paper'], orientation: PrintOptions['orientation'] = 'portrait', marginMm = 12.7): PrintOptions => ({ paper, orientation, marginMm });
const matrix = paperIds.flatMap((paper) => (['portrait', 'landscape'] as const).flatMap((o) => pieceSets.map(([name, pieces]) => [paper, o, name, pieces] as const)));

describe.each(matrix)('imposePieces on %s %s: %s', (paper, orientation, _name, pieces) => {
  const opts = options(paper, orientation);
  const problems = checkImposable(pieces, opts);
  const { widthMm, heightMm } = sheetSize(paper, orientation);
  const { content } = layoutFurniture(widthMm, heightMm, 12.7);

  it('places every piece soundly, or refuses exactly the misfits, naming piece and paper', () => {
    // A strip needs its height + 8 + 5 mm of label bands; a disc a square of D + 2 x 6 mm.
    const misfits = pieces.filter((p) => (p.kind === 'disc' ? p.diameterMm + 12 > Math.min(content.width, content.height) : p.heightMm + 13 > content.height));
    expect(problems).toHaveLength(misfits.length);
    misfits.forEach((piece, i) => {
      expect(problems[i]).toContain(`"${piece.name}"`);
      expect(problems[i]).toMatch(new RegExp(`${paper} ${orientation}`, 'i'));
    });
    if (problems.length) {
      expect(() => imposePieces(pieces, opts)).toThrow(ImpositionError);
      return;
    }
    const imposition = imposePieces(pieces, opts);
    expect(listImpositionFaults(imposition, pieces)).toEqual([]);
    for (const sheet of imposition.sheets) {
      expect(sheet.content).toEqual(content);
      for (const p of sheet.placements) if (p.tile && p.tile.number > 1) expect(p.originX).toBeLessThan(content.x);
    }
  });
});

describe('imposePieces, which papers take the test kits', () => {
  it.each(['tabloid', 'a3'] as const)('takes every set on %s portrait', (paper) => {
    // Worked arithmetic: the tallest box is the No. 10 strip, 177.8 + 13 = 190.8 mm, and the
    // widest disc square 149 + 12 = 161 mm; Tabloid leaves 239 x 335.4, A3 256.6 x 323.6 mm.
    for (const [, pieces] of pieceSets) expect(checkImposable(pieces, options(paper))).toEqual([]);
  });

  it('takes the pint strip and both discs on Letter portrait', () => {
    // Worked arithmetic: 111.1 + 13 = 124.1 and 161 mm both fit 175.5 x 183 mm.
    expect(checkImposable([pint, disc73, disc149], options('letter'))).toEqual([]);
  });
});

describe('imposePieces, No. 10 strip', () => {
  it('cannot go on Letter landscape at any margin', () => {
    // Worked arithmetic: 215.9 - 2 x 12.7 = 190.5 mm printable < 177.8 + 8 + 5 = 190.8 mm.
    expect(checkImposable([no10], options('letter', 'landscape'))).toHaveLength(1);
  });

  it('tiles into 4 on A4 portrait with joins A, B, C', () => {
    // Worked arithmetic: content 210 - 25.4 - 15 = 169.6 mm wide; 3 tiles cover at most
    // 3 x 169.6 - 24 = 484.8 < 494.07 + 15, so 4; 2 x 190.8 + 4 > 200.6 tall, so a sheet each.
    const imposition = imposePieces([no10], options('a4'));
    const tiles = imposition.sheets.flatMap((s) => s.placements.map((p) => p.tile!));
    expect(imposition.sheets).toHaveLength(4);
    expect(tiles.map((t) => `${t.joinLeft ?? '-'}${t.number}/${t.count}${t.joinRight ?? '-'}`)).toEqual(['-1/4A', 'A2/4B', 'B3/4C', 'C4/4-']);
    for (let k = 0; k + 1 < tiles.length; k++) expect(tiles[k]!.toXMm - tiles[k + 1]!.fromXMm).toBeCloseTo(TILE_OVERLAP_MM, 9);
    expect(tiles[3]!.toXMm).toBeCloseTo(Math.PI * 157.26 + 15, 9);
  });

  it('lets a small disc share a sheet with a tile', () => {
    // Worked arithmetic, A3 portrait: content 297 - 25.4 - 15 = 256.6 mm wide; 3 tiles of
    // (509.07 + 24) / 3 = 177.7 mm; 177.7 + 4 + (60 + 12) = 253.7 <= 256.6.
    const small = makeDisc({ id: 'd60', diameterMm: 60 });
    const imposition = imposePieces([no10, small], options('a3'));
    expect(imposition.sheets).toHaveLength(3);
    expect(imposition.sheets[0]!.placements.map((p) => p.pieceId)).toEqual(['no10', 'd60']);
  });
});

describe('imposePieces, sharing sheets', () => {
  it('puts two 73 mm discs side by side on one Letter sheet, in layout order', () => {
    // Worked arithmetic: 85 + 4 + 85 = 174 <= 175.5 mm content width.
    const second = makeDisc({ id: 'd73b', diameterMm: 73 });
    const imposition = imposePieces([disc73, second], options('letter'));
    expect(imposition.sheets).toHaveLength(1);
    const [a, b] = imposition.sheets[0]!.placements;
    expect([a!.pieceId, b!.pieceId]).toEqual(['d73', 'd73b']);
    expect(b!.rect.x - (a!.rect.x + a!.rect.width)).toBeCloseTo(4, 9);
  });

  it('needs a sheet each for two 149 mm discs on Letter, one sheet on Tabloid', () => {
    // Worked arithmetic: 161 + 4 + 161 = 326 > 175.5 wide and > 183 tall on Letter; <= 335.4 tall on Tabloid.
    const second = makeDisc({ id: 'd149b', diameterMm: 149 });
    expect(imposePieces([disc149, second], options('letter')).sheets).toHaveLength(2);
    expect(imposePieces([disc149, second], options('tabloid')).sheets).toHaveLength(1);
  });

  it('fits a whole pint strip and a disc on one A3 landscape sheet', () => {
    // Worked arithmetic: 254.7 + 15 + 4 + 85 = 358.7 <= 420 - 25.4 - 15 = 379.6 mm.
    const imposition = imposePieces([pint, disc73], options('a3', 'landscape'));
    expect(imposition.sheets).toHaveLength(1);
    expect(imposition.sheets[0]!.placements[0]!.tile).toBeUndefined();
  });

  it('returns no sheets for no pieces', () => {
    expect(imposePieces([], options('letter')).sheets).toEqual([]);
  });
});

describe('imposePieces, refusals', () => {
  it('names a disc too big for the paper and where it would fit', () => {
    const big = makeDisc({ name: 'Big end', diameterMm: 200 });
    const [message] = checkImposable([big], options('letter'));
    expect(message).toMatch(/Disc "Big end" is 200 mm across .* Letter portrait/);
    expect(message).toContain('Tabloid portrait'); // 212 <= 239 x 335.4 mm content
    try {
      imposePieces([big], options('letter'));
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(ImpositionError);
      expect((error as ImpositionError).problems).toEqual([message]);
    }
  });

  it(`stops at ${MAX_SHEETS} sheets`, () => {
    // A 149 mm disc takes a Letter sheet to itself (161 + 4 + 161 exceeds both content sides).
    const discs = (n: number) => Array.from({ length: n }, (_, i) => makeDisc({ id: `d${i}`, diameterMm: 149 }));
    expect(imposePieces(discs(MAX_SHEETS), options('letter')).sheets).toHaveLength(MAX_SHEETS);
    expect(checkImposable(discs(MAX_SHEETS + 1), options('letter'))[0]).toMatch(/more than 40 sheets of Letter portrait/);
  });

  it('refuses a runaway strip without making its tiles', () => {
    expect(checkImposable([makeStrip({ lengthMm: 1e12 })], options('letter'))).toHaveLength(1);
  });

  it('refuses pieces with no printable size', () => {
    expect(checkImposable([makeStrip({ heightMm: Number.NaN }), makeDisc({ diameterMm: 0 })], options('letter'))).toHaveLength(2);
  });
});
