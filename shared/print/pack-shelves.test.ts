import { describe, expect, it } from 'vitest';
import { packShelves } from './pack-shelves.ts';

describe('packShelves', () => {
  it('puts the tallest first, and each item on the first shelf with room', () => {
    const { packed, binCount } = packShelves(
      [
        { width: 40, height: 20 },
        { width: 50, height: 60 },
        { width: 50, height: 30 },
      ],
      100,
      100,
      4,
    );
    expect(binCount).toBe(1);
    expect(packed).toEqual([
      // Worked arithmetic: the 60 mm item opens shelf 1; the 30 mm one needs 54 + 50 = 104 > 100,
      // so opens shelf 2 at 60 + 4; the 20 mm one fits shelf 1 at 54 + 40 = 94 <= 100.
      { bin: 0, x: 54, y: 0 },
      { bin: 0, x: 0, y: 0 },
      { bin: 0, x: 0, y: 64 },
    ]);
  });

  it('keeps the caller order between equal heights', () => {
    const { packed } = packShelves([{ width: 30, height: 10 }, { width: 30, height: 10 }], 100, 100, 4);
    expect(packed.map((p) => p.x)).toEqual([0, 34]);
  });

  it('opens another bin when a bin is full, and goes back to earlier bins first', () => {
    const { packed, binCount } = packShelves([{ width: 80, height: 80 }, { width: 80, height: 80 }, { width: 15, height: 15 }], 100, 100, 4);
    expect(binCount).toBe(2);
    expect(packed.map((p) => p.bin)).toEqual([0, 1, 0]);
  });

  it('refuses an item bigger than a bin', () => {
    expect(() => packShelves([{ width: 101, height: 10 }], 100, 100, 4)).toThrow(RangeError);
  });
});
