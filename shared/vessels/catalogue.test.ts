import { describe, expect, it } from 'vitest';
import { parseCanCode } from './can-code.ts';
import { parseCatalogue } from './catalogue-entry.ts';
import { findCatalogueVessel, searchCatalogue, vesselCatalogue, vesselFromCatalogue } from './catalogue.ts';

const ids = (query: string) => searchCatalogue(query).map((entry) => entry.id);

describe('vesselCatalogue', () => {
  it('has unique kebab-case ids', () => {
    const all = vesselCatalogue.map((entry) => entry.id);
    expect(new Set(all).size).toBe(all.length);
    for (const id of all) expect(id).toMatch(/^[a-z0-9]+(-[a-z0-9]+)*$/);
  });

  it('agrees with parseCanCode for every entry with a code', () => {
    const coded = vesselCatalogue.filter((entry) => entry.code !== undefined);
    expect(coded.length).toBeGreaterThanOrEqual(10);
    for (const entry of coded) {
      const parsed = parseCanCode(entry.code ?? '');
      if (!parsed.ok) throw new Error(`${entry.id}: ${parsed.error}`);
      expect(Math.abs(parsed.diameterMm - entry.diameterMm), entry.id).toBeLessThanOrEqual(0.01);
      expect(Math.abs(parsed.heightMm - entry.heightMm), entry.id).toBeLessThanOrEqual(0.01);
    }
  });

  it('holds the sizes the brief asks for', () => {
    // CMI Voluntary Can and End Dimension Reference Manual food table (202x214: sizes.com can table);
    // paint sizes from memory (quart) and a container maker's example (gallon).
    const codes = vesselCatalogue.map((entry) => entry.code);
    for (const code of ['202x214', '211x300', '211x304', '211x400', '300x407', '303x406', '307x409', '401x411', '603x700', '404x414', '610x708']) {
      expect(codes).toContain(code);
    }
    expect(vesselCatalogue.filter((entry) => entry.kind === 'metric').length).toBeGreaterThanOrEqual(4);
  });
});

describe('parseCatalogue', () => {
  const good = { id: 'demo-can', name: 'Demo can', kind: 'food', diameterMm: 80, heightMm: 100, wallThicknessMm: 0.25, bottomRimInsetMm: 4 };

  it('accepts good data', () => {
    expect(parseCatalogue([good])).toHaveLength(1);
  });

  it.each([
    ['a duplicate id', [good, good], /duplicate id "demo-can"/],
    ['a code that disagrees with its size', [{ ...good, code: '303x406' }], /303x406 means 80\.96/],
    ['an impossible code', [{ ...good, code: '317x406' }], /sixteenths/],
    ['a code spelt loosely', [{ ...good, code: '303 X 406', diameterMm: 80.9625, heightMm: 111.125 }], /write the code as 303x406/],
    ['an id that is not kebab-case', [{ ...good, id: 'Demo Can' }], /kebab-case/],
    ['a missing height', [{ ...good, heightMm: undefined }], /heightMm/],
    ['not an array', { ...good }, /array/],
  ])('throws a clear message for %s', (_label, data, message) => {
    expect(() => parseCatalogue(data, 'test catalogue')).toThrow(/test catalogue is invalid/);
    expect(() => parseCatalogue(data)).toThrow(message);
  });
});

describe('findCatalogueVessel and vesselFromCatalogue', () => {
  it('finds by id', () => {
    expect(findCatalogueVessel('food-603x700')?.name).toBe('No. 10 food can (603x700)');
    expect(findCatalogueVessel('no-such-can')).toBeUndefined();
  });

  it('makes a catalogue vessel', () => {
    const vessel = vesselFromCatalogue('food-303x406');
    expect(vessel).toMatchObject({ source: 'catalogue', catalogueId: 'food-303x406', seamAngleDeg: 0, bottomRimInsetMm: 4 });
    // CMI Voluntary Can and End Dimension Reference Manual: 303x406 = 80.96 x 111.13 mm
    expect(Math.abs(vessel.outerDiameterMm - 80.96)).toBeLessThanOrEqual(0.01);
    expect(Math.abs(vessel.heightMm - 111.13)).toBeLessThanOrEqual(0.01);
  });

  it('throws on an unknown id', () => {
    expect(() => vesselFromCatalogue('no-such-can')).toThrow(/no-such-can/);
  });
});

describe('searchCatalogue', () => {
  it('finds a full trade code in any spelling, best first', () => {
    for (const query of ['303x406', '303 X 406', '303×406']) expect(ids(query)[0]).toBe('food-303x406');
  });

  it('finds a diameter prefix, smallest can first among equals', () => {
    expect(ids('211')).toEqual(['food-211x300', 'food-211x304', 'food-211x400', 'food-211x414']);
    expect(ids('404')).toEqual(expect.arrayContaining(['food-404x700', 'paint-quart']));
  });

  it('offers same-diameter cans for a code not in the catalogue', () => {
    // 303x509 is the No. 303 cylinder (CMI manual food table); not in our catalogue
    expect(ids('303x509')).toEqual(['food-303x406']);
  });

  it('finds name fragments, whole words before parts of words', () => {
    expect(ids('no. 10')[0]).toBe('food-603x700');
    expect(ids('No 10')[0]).toBe('food-603x700');
    expect(ids('no. 1')[0]).toBe('food-211x400');
    expect(ids('paint')).toEqual(['paint-quart', 'paint-gallon']);
    expect(ids('soup')).toEqual(['food-211x400']);
  });

  it('finds a diameter in mm within 2 mm, nearest first', () => {
    // 80.96 mm (303, CMI manual) and 83 mm (metric tin, from memory) are both within 2 mm of 81
    expect(ids('81 mm')).toEqual(['food-303x406', 'metric-83x114']);
    expect(ids('153')).toEqual(['metric-153x176']);
  });

  it('finds a diameter in inches within 1/16 in', () => {
    // 3 3/16 in = 80.96 mm (CMI code rule); 83 mm is 2.04 mm off, more than 1/16 in (1.59 mm)
    expect(ids('3 3/16')).toEqual(['food-303x406']);
    expect(ids('6 5/8 in')).toEqual(['paint-gallon']);
  });

  it('lists everything by diameter for an empty query and nothing for nonsense', () => {
    const all = searchCatalogue('  ');
    expect(all).toHaveLength(vesselCatalogue.length);
    const diameters = all.map((entry) => entry.diameterMm);
    expect(diameters).toEqual([...diameters].sort((a, b) => a - b));
    expect(searchCatalogue('zebra')).toEqual([]);
  });
});
