import { describe, expect, it } from 'vitest';
import { layoutDocument } from '../layout/layout-design.ts';
import { blankDesign, freshId, newPart } from './new-design.ts';
import { validateDesign } from './validate-design.ts';

describe('a blank design', () => {
  it('is a valid one-can design with nothing to drill yet', () => {
    const blank = blankDesign('mm');
    expect(validateDesign(blank).ok).toBe(true);
    const result = layoutDocument(blank);
    expect(result.ok && result.layout.holes.length).toBe(0);
    expect(blank.parts).toHaveLength(1);
  });
});

describe('a new part', () => {
  it('puts a shell on a can that clears the chamber', () => {
    const design = blankDesign('in');
    const shell = newPart('shell', design);
    // The chamber is a 303 (80.96 mm, CMI can sizes); the smallest catalogue can at least 90.96 mm
    // across is the metric 99 x 118 tin (templates/catalogue/vessels.json).
    expect(shell.vessel.outerDiameterMm).toBe(99);
    expect(shell.id).toBe('shell');
    expect(validateDesign({ ...design, parts: [...design.parts!, shell] }).ok).toBe(true);
  });

  it('never reuses an id', () => {
    expect(freshId('shell', [{ id: 'shell' }, { id: 'shell-2' }])).toBe('shell-3');
    const design = blankDesign('in');
    const second = newPart('burn-chamber', design);
    expect(second.id).toBe('chamber-2');
    expect(second.name).toBe('Burn chamber 2');
  });
});
