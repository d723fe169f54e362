import { describe, expect, it } from 'vitest';
import { MM_PER_INCH } from '../units/length.ts';
import { commonDrillSets, resolveDrillSet } from './drill-set.ts';
import { suggestPilot } from './pilot.ts';
import { findDrill } from './series.ts';
import type { Drill } from './drill.ts';

// Rule under test: pilot of about 1/8 in, at most half the final size, none for 1/8 in or
// smaller (common practice, no source). Inch sizes use 1 in = 25.4 mm exactly (NIST SP 811).
const inch = (inches: number): number => inches * MM_PER_INCH;
const [fractional29, fractional13, metric19] = commonDrillSets.map(resolveDrillSet) as [Drill[], Drill[], Drill[]];

describe('suggestPilot', () => {
  it.each([
    [1 / 4, 'frac:1/8'], // half of 1/4 is 1/8, which is also the cap
    [3 / 16, 'frac:3/32'], // half of 3/16
    [1 / 2, 'frac:1/8'], // capped at 1/8
    [5 / 32, 'frac:5/64'], // half of 5/32
    [9 / 64, 'frac:1/16'], // half is 9/128; the largest 64th under it is 4/64
  ])('final %s in -> %s from the 29-piece set', (finalInches, id) => {
    expect(suggestPilot(inch(finalInches), fractional29)?.id).toBe(id);
  });

  it('needs no pilot for 1/8 in or smaller', () => {
    expect(suggestPilot(inch(1 / 8), fractional29)).toBeUndefined();
    expect(suggestPilot(inch(3 / 32), fractional29)).toBeUndefined();
    expect(suggestPilot(3.175, fractional29)).toBeUndefined(); // 1/8 in written in mm
  });

  it('works from a metric set', () => {
    expect(suggestPilot(6, metric19)?.id).toBe('mm:3'); // half of 6 mm, under the 3.175 mm cap
    expect(suggestPilot(10, metric19)?.id).toBe('mm:3'); // 3.5 mm would exceed the 1/8 in cap
    expect(suggestPilot(5, metric19)?.id).toBe('mm:2.5');
    expect(suggestPilot(3.5, metric19)?.id).toBe('mm:1.5'); // half is 1.75 mm
  });

  it('answers undefined when no drill in the set is small enough', () => {
    expect(suggestPilot(inch(1 / 2), [findDrill('frac:1/4') as Drill])).toBeUndefined();
    expect(suggestPilot(inch(1 / 2), [])).toBeUndefined();
    expect(suggestPilot(inch(9 / 64), fractional13.filter((d) => d.id !== 'frac:1/16'))).toBeUndefined();
  });
});
