import { describe, expect, it } from 'vitest';
import { MM_PER_INCH } from '../units/length.ts';
import { allDrills, drillsInSeries, findDrill } from './series.ts';

const inchesOf = (id: string): number | undefined => {
  const drill = findDrill(id);
  return drill && drill.diameterMm / MM_PER_INCH;
};

describe('published drill diameters', () => {
  it.each([
    ['num:1', 0.228], // ASME B94.11M twist-drill table
    ['num:7', 0.201], // ASME B94.11M twist-drill table
    ['num:60', 0.04], // ASME B94.11M twist-drill table
    ['num:80', 0.0135], // ASME B94.11M twist-drill table
    ['num:29', 0.136], // ASME B94.11M twist-drill table (from memory: the 8-32 tap drill)
    ['let:A', 0.234], // ASME B94.11M twist-drill table
    ['let:F', 0.257], // ASME B94.11M twist-drill table (from memory: the 1/4 in close-fit drill)
    ['let:Z', 0.413], // ASME B94.11M twist-drill table
  ])('%s is %s in', (id, inches) => {
    expect(inchesOf(id)).toBeCloseTo(inches, 9);
  });

  it('gives fractional and metric sizes exactly', () => {
    expect(findDrill('frac:3/16')?.diameterMm).toBeCloseTo(4.7625, 12); // 3/16 x 25.4, NIST SP 811
    expect(findDrill('frac:1/64')?.diameterMm).toBeCloseTo(0.396875, 12); // 1/64 x 25.4, NIST SP 811
    expect(findDrill('frac:1')?.diameterMm).toBe(25.4);
    // Built from integer tenths: the same double as the literal, unlike 0.1 + 0.1 + 0.1.
    expect(findDrill('mm:0.3')?.diameterMm).toBe(0.3);
    expect(findDrill('mm:4.8')?.diameterMm).toBe(4.8);
    expect(findDrill('mm:13')?.diameterMm).toBe(13);
  });
});

describe('series', () => {
  it('hold 64 fractional, 80 number, 26 letter and 130 metric drills', () => {
    // Counts follow from the ranges: 1/64-1 in by 64ths, #1-#80, A-Z, 0.1-13.0 mm by 0.1.
    expect(drillsInSeries('fractional')).toHaveLength(64);
    expect(drillsInSeries('number')).toHaveLength(80);
    expect(drillsInSeries('letter')).toHaveLength(26);
    expect(drillsInSeries('metric')).toHaveLength(130);
    expect(allDrills()).toHaveLength(300);
  });

  it('number drills get smaller from #1 to #80 (ASME B94.11M twist-drill table)', () => {
    const sizes = drillsInSeries('number').map((drill) => drill.diameterMm);
    sizes.slice(1).forEach((size, i) => expect(size).toBeLessThan(sizes[i] ?? 0));
  });

  it('letter drills get larger from A to Z, starting above #1 (ASME B94.11M twist-drill table)', () => {
    const sizes = drillsInSeries('letter').map((drill) => drill.diameterMm);
    sizes.slice(1).forEach((size, i) => expect(size).toBeGreaterThan(sizes[i] ?? Infinity));
    expect(findDrill('let:A')?.diameterMm).toBeGreaterThan(findDrill('num:1')?.diameterMm ?? Infinity);
  });

  it('uses the agreed ids and labels', () => {
    expect(findDrill('frac:3/16')).toEqual({ id: 'frac:3/16', series: 'fractional', label: '3/16 in', diameterMm: expect.any(Number) });
    expect(findDrill('frac:1/2')?.label).toBe('1/2 in');
    expect(findDrill('num:7')?.label).toBe('#7');
    expect(findDrill('let:A')?.label).toBe('letter A');
    expect(findDrill('mm:4.8')?.label).toBe('4.8 mm');
    expect(findDrill('mm:5')?.label).toBe('5 mm');
  });

  it('has unique ids and finds every drill by its id', () => {
    const drills = allDrills();
    expect(new Set(drills.map((drill) => drill.id)).size).toBe(drills.length);
    for (const drill of drills) expect(findDrill(drill.id)).toBe(drill);
  });

  it('answers undefined for an unknown id', () => {
    expect(findDrill('num:0')).toBeUndefined();
    expect(findDrill('frac:6/64')).toBeUndefined(); // ids use reduced fractions: frac:3/32
    expect(findDrill('mm:4.80')).toBeUndefined();
  });

  it('hands out copies, so callers cannot change the tables', () => {
    allDrills().pop();
    expect(allDrills()).toHaveLength(300);
    expect(Object.isFrozen(findDrill('num:7'))).toBe(true);
  });
});
