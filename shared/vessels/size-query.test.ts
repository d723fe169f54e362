import { describe, expect, it } from 'vitest';
import { parseSizeQuery } from './size-query.ts';

describe('parseSizeQuery', () => {
  it.each([
    ['81 mm', 81],
    ['81mm', 81],
    ['81', 81],
    ['99.5 mm', 99.5],
  ])('reads %j as millimetres', (text, mm) => {
    expect(parseSizeQuery(text)).toMatchObject({ mm, unit: 'mm', toleranceMm: 2 });
  });

  it.each([
    // Worked arithmetic: 3 3/16 in = 3.1875 x 25.4 = 80.9625 mm
    ['3 3/16', 80.9625],
    ['3-3/16', 80.9625],
    ['3 3/16 in', 80.9625],
    ['3 3/16"', 80.9625],
    ['3.1875 inches', 80.9625],
    // Worked arithmetic: 33/16 in = 2.0625 x 25.4 = 52.3875 mm (not 3 3/16)
    ['33/16', 52.3875],
    // Worked arithmetic: 6 in = 152.4 mm
    ['6 in', 152.4],
  ])('reads %j as inches', (text, mm) => {
    const size = parseSizeQuery(text);
    expect(size?.unit).toBe('in');
    expect(size?.mm).toBeCloseTo(mm, 6);
    expect(size?.toleranceMm).toBeCloseTo(25.4 / 16, 9); // 1/16 in, the can code's step
  });

  it.each(['paint', 'no. 10', '', '3 3/0', '3/16 3', '1 2 3', '3 3/16 mm', '0', '303x406'])('is not a size: %j', (text) => {
    expect(parseSizeQuery(text)).toBeUndefined();
  });
});
