import { describe, expect, it } from 'vitest';
import pint from '../../templates/pint-can-stove.json' with { type: 'json' };
import { describeProblem } from './describe-problem.ts';
import type { DesignInput } from './design-schema.ts';
import { validateDesign } from './validate-design.ts';

/** A design to break on purpose: any field may be set to anything. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- the tests write wrong types on purpose
type Loose = DesignInput & { parts: any[] };

/** The pint stove with one change, validated for real: the words come from zod's own issue data. */
function problemsAfter(change: (d: Loose) => void, units: 'in' | 'mm' = 'in'): string[] {
  const design = structuredClone(pint) as unknown as Loose;
  design.units = units;
  change(design);
  const result = validateDesign(design);
  if (result.ok) return [];
  return result.problems.map((p) => describeProblem(design, p));
}

/** Raw validator phrasing that must never reach a person (zod 4's messages, seen in its output). */
const RAW = /Too (big|small)|expected (string|number|int|array)|Invalid (input|option)|received (NaN|undefined|null)|Unrecognized key/;

describe('design problems in the form’s words', () => {
  it('names the part, the row and the field, and says the limit plainly', () => {
    expect(problemsAfter((d) => (d.parts[0].sideRows[0].count = 30.5))).toEqual(['Burn chamber › Secondary jets › Holes: needs a whole number']);
    expect(problemsAfter((d) => (d.parts[0].sideRows[0].count = Number.NaN))).toEqual(['Burn chamber › Secondary jets › Holes: needs a number']);
    expect(problemsAfter((d) => (d.parts[0].sideRows[0].count = 721))).toEqual(['Burn chamber › Secondary jets › Holes: at most 720']);
    expect(problemsAfter((d) => (d.name = ' '))).toEqual(['Design name: must not be empty']);
    expect(problemsAfter((d) => (d.parts[0].sideRows[0].drillId = ''))).toEqual(['Burn chamber › Secondary jets › Drill: choose one']);
  });

  it('gives a length limit in the design’s units', () => {
    // The plausible-can limit is 25.4 mm = exactly 1 in (shared/vessels/vessel.ts).
    expect(problemsAfter((d) => (d.parts[0].vessel.outerDiameterMm = 0.01))).toEqual(['Burn chamber › Diameter over the seam: at least 1 in']);
    expect(problemsAfter((d) => (d.parts[0].vessel.outerDiameterMm = 0.01), 'mm')).toEqual(['Burn chamber › Diameter over the seam: at least 25.4 mm']);
    expect(problemsAfter((d) => (d.parts[0].vessel.heightMm = 10_000), 'mm')).toEqual(['Burn chamber › Height: at most 1000 mm']);
  });

  it('names keep-outs, explicit rings and check limits', () => {
    const words = problemsAfter((d) => {
      d.parts[0].sideRows[0].keepOuts = [{ label: 'Seam', startDeg: 800, endDeg: 10 }];
      d.rules = { minLigamentMm: 60 };
      d.airflow = { targetRatio: 0.1 };
    });
    expect(words).toContain('Burn chamber › Secondary jets › Keep-out 1 › Keep-out from: at most 720°');
    expect(words).toContain('Check limits › Metal between holes: at most 1 31/32 in');
    expect(words).toContain('Target ratio: at least 0.5 : 1');
  });

  it('says a file from elsewhere is not a design, in words', () => {
    const result = validateDesign({ schemaVersion: 7, name: 'x', parts: [] });
    expect(result.ok).toBe(false);
    const words = result.ok ? [] : result.problems.map((p) => describeProblem({} as DesignInput, p));
    expect(words).toContain('File version: this file is for another version of Canwright (this one reads version 1)');
    expect(words).toContain('Parts: needs at least 1 part');
    for (const line of words) expect(line).not.toMatch(RAW);
  });

  it('never passes raw validator text through for any single bad field', () => {
    const bad: ((d: Loose) => void)[] = [
      (d) => (d.parts[0].vessel.extra = 1),
      (d) => (d.parts[0].role = 'kettle'),
      (d) => (d.parts[0].endPatterns[0].rings = { strategy: 'spiral' }),
      (d) => (d.parts[0].sideRows[0].height = undefined),
      (d) => ((d as Record<string, unknown>).paperThicknessMm = 'thin'),
      (d) => (d.parts[0].sideRows[0].skip = [99]),
      (d) => (d.parts = [...d.parts, ...d.parts, ...d.parts, ...d.parts]),
    ];
    for (const change of bad) {
      const words = problemsAfter(change);
      expect(words.length).toBeGreaterThan(0);
      for (const line of words) expect(line).not.toMatch(RAW);
    }
  });
});
