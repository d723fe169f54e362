import { describe, expect, it } from 'vitest';
import { MM_PER_INCH } from '../units/length.ts';
import type { Drill } from './drill.ts';
import { commonDrillSets, nearestDrill, nearestDrillNotOver, resolveDrillSet } from './drill-set.ts';
import type { DrillSet } from './drill-set.ts';
import { findDrill } from './series.ts';

// Fraction-to-mm expectations use 1 in = 25.4 mm exactly (NIST SP 811, appendix B).
const inch = (inches: number): number => inches * MM_PER_INCH;
const setNamed = (name: string): DrillSet => {
  const set = commonDrillSets.find((candidate) => candidate.name === name);
  if (!set) throw new Error(`no set named ${name}`);
  return set;
};
const fractional29 = resolveDrillSet(setNamed('29-piece fractional 1/16-1/2 in by 64ths'));
const metric19 = resolveDrillSet(setNamed('metric 1-10 mm by 0.5 mm'));
const drill = (id: string): Drill => {
  const found = findDrill(id);
  if (!found) throw new Error(`no drill ${id}`);
  return found;
};

describe('commonDrillSets', () => {
  it.each([
    ['29-piece fractional 1/16-1/2 in by 64ths', 29, 'frac:1/16', 'frac:1/2'], // (32 - 4) + 1 sixty-fourths
    ['13-piece fractional 1/16-1/4 in by 64ths', 13, 'frac:1/16', 'frac:1/4'], // (16 - 4) + 1 sixty-fourths
    ['metric 1-10 mm by 0.5 mm', 19, 'mm:1', 'mm:10'], // (10 - 1) / 0.5 + 1
    ['every drill', 300, 'mm:0.1', 'frac:1'], // 64 + 80 + 26 + 130; 0.1 mm is under #80 (0.0135 in)
  ])('%s has %i drills from %s to %s', (name, count, first, last) => {
    const drills = resolveDrillSet(setNamed(name));
    expect(drills).toHaveLength(count);
    expect(drills[0]?.id).toBe(first);
    expect(drills.at(-1)?.id).toBe(last);
  });

  it('lists only ids that exist', () => {
    for (const set of commonDrillSets) expect(resolveDrillSet(set)).toHaveLength(set.drillIds.length);
  });
});

describe('resolveDrillSet', () => {
  it('sorts by diameter and drops unknown and repeated ids', () => {
    const drills = resolveDrillSet({ name: 'mine', drillIds: ['frac:1/4', 'num:7', 'bogus', 'mm:3', 'num:7', 'let:Z'] });
    expect(drills.map((d) => d.id)).toEqual(['mm:3', 'num:7', 'frac:1/4', 'let:Z']);
  });
});

describe('nearestDrill', () => {
  it('picks the closest drill and says how far off it is', () => {
    const match = nearestDrill(4.8, fractional29);
    expect(match?.drill.id).toBe('frac:3/16'); // 4.7625 mm vs 13/64 = 5.159 mm
    expect(match?.offMm).toBeCloseTo(4.7625 - 4.8, 9);
  });

  it('reports a positive offset when the drill is larger', () => {
    const match = nearestDrill(4.76, metric19);
    expect(match?.drill.id).toBe('mm:5'); // 5 is 0.24 over; 4.5 is 0.26 under
    expect(match?.offMm).toBeCloseTo(0.24, 9);
  });

  it('gives a tie to the smaller drill', () => {
    // 25/128 in lies exactly between 3/16 (24/128) and 13/64 (26/128).
    expect(nearestDrill(inch(25 / 128), fractional29)?.drill.id).toBe('frac:3/16');
    expect(nearestDrill(4.75, metric19)?.drill.id).toBe('mm:4.5');
    // Order of the set does not matter.
    expect(nearestDrill(4.75, [...metric19].reverse())?.drill.id).toBe('mm:4.5');
  });

  it('matches an exact size with zero offset', () => {
    expect(nearestDrill(inch(1 / 4), fractional29)).toEqual({ drill: drill('frac:1/4'), offMm: 0 });
  });

  it('goes to the ends of the set when the target is outside it', () => {
    expect(nearestDrill(0.5, fractional29)?.drill.id).toBe('frac:1/16');
    expect(nearestDrill(30, fractional29)?.drill.id).toBe('frac:1/2');
  });

  it('answers undefined for an empty set or a target that is not a number', () => {
    expect(nearestDrill(4.8, [])).toBeUndefined();
    expect(nearestDrill(Number.NaN, fractional29)).toBeUndefined();
  });
});

describe('nearestDrillNotOver', () => {
  it('takes the largest drill that does not exceed the target', () => {
    const match = nearestDrillNotOver(5, fractional29);
    expect(match?.drill.id).toBe('frac:3/16'); // 13/64 = 5.159 mm would be over
    expect(match?.offMm).toBeCloseTo(4.7625 - 5, 9);
  });

  it('takes an exact size', () => {
    expect(nearestDrillNotOver(inch(1 / 4), fractional29)).toEqual({ drill: drill('frac:1/4'), offMm: 0 });
    expect(nearestDrillNotOver(4.5, metric19)?.drill.id).toBe('mm:4.5');
  });

  it('answers undefined when every drill is too big', () => {
    expect(nearestDrillNotOver(1, fractional29)).toBeUndefined(); // smallest is 1/16 in = 1.5875 mm
    expect(nearestDrillNotOver(4.8, [])).toBeUndefined();
  });
});
