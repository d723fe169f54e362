import { describe, expect, it } from 'vitest';
import type { DesignInput } from '../../../shared/design/design-schema.ts';
import { describeProblem } from '../../../src/features/designer/describe-problem.ts';
import pint from '../../../templates/pint-can-stove.json';

const design = pint as DesignInput;

describe('problems on the design form, in the form’s words', () => {
  it('names the part, the row and the field, and says the limit plainly', () => {
    // zod 4's own wording for a max(8) integer (library behaviour, checked against its output here).
    expect(describeProblem(design, 'parts.0.endPatterns.0.rings.ringCount', 'Too big: expected number to be <=8')).toBe('Burn chamber › Primary rings › Number of rings: at most 8');
    expect(describeProblem(design, 'parts.0.sideRows.0.count', 'Invalid input: expected number, received NaN')).toBe('Burn chamber › Secondary jets › Holes: needs a number');
    expect(describeProblem(design, 'name', 'Too small: expected string to have >=1 characters')).toBe('Design name: must not be empty');
  });
});
