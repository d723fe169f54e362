import { describe, expect, it } from 'vitest';
import { countTiles, nameJoin, splitStrip, TILE_OVERLAP_MM } from './tile-strip.ts';

describe('splitStrip', () => {
  it('keeps a strip that fits in one tile without joins', () => {
    expect(splitStrip(150, 175.5)).toEqual([{ number: 1, count: 1, fromXMm: 0, toXMm: 150, overlapMm: TILE_OVERLAP_MM }]);
  });

  it('splits into the fewest equal tiles, each overlapping the next by 12 mm', () => {
    // Worked arithmetic: a No. 10 can strip, pi x (157.16 + 0.1) + 15 mm tab = 509.07 mm, on
    // 175.5 mm: 3 tiles cover at most 3 x 175.5 - 2 x 12 = 502.5 mm, so 4 tiles of
    // (509.07 + 3 x 12) / 4 = 136.27 mm.
    const total = Math.PI * (157.16 + 0.1) + 15;
    const tiles = splitStrip(total, 175.5);
    expect(tiles).toHaveLength(4);
    for (const tile of tiles) expect(tile.toXMm - tile.fromXMm).toBeCloseTo((total + 36) / 4, 9);
    expect(tiles[0]!.fromXMm).toBe(0);
    expect(tiles[3]!.toXMm).toBe(total);
    for (let k = 0; k + 1 < tiles.length; k++) expect(tiles[k]!.toXMm - tiles[k + 1]!.fromXMm).toBeCloseTo(TILE_OVERLAP_MM, 9);
  });

  it('letters the joins A, B, C from the seam end', () => {
    const tiles = splitStrip(500, 140);
    expect(tiles.map((t) => [t.number, t.count, t.joinLeft, t.joinRight])).toEqual([
      [1, 4, undefined, 'A'],
      [2, 4, 'A', 'B'],
      [3, 4, 'B', 'C'],
      [4, 4, 'C', undefined],
    ]);
  });

  it('needs a tile wider than the overlap', () => {
    expect(countTiles(100, 12)).toBe(Infinity);
    expect(() => splitStrip(100, 12)).toThrow(RangeError);
  });

  it('uses one tile more exactly when the next millimetre no longer fits', () => {
    // Worked arithmetic: 2 tiles of 100 mm cover 2 x 100 - 12 = 188 mm.
    expect(countTiles(188, 100)).toBe(2);
    expect(countTiles(188.001, 100)).toBe(3);
  });
});

describe('nameJoin', () => {
  it('counts like spreadsheet columns past Z', () => {
    expect([0, 1, 25, 26, 27, 51, 52].map(nameJoin)).toEqual(['A', 'B', 'Z', 'AA', 'AB', 'AZ', 'BA']);
  });
});
