import { describe, expect, it } from 'vitest';
import { designSchema } from '../../../shared/design/design-schema.ts';
import { layoutDesign } from '../../../shared/layout/layout-design.ts';
import { solveJetCount } from '../../../shared/layout/solve-jets.ts';
import pint from '../../../templates/pint-can-stove.json' with { type: 'json' };

const design = designSchema.parse(pint);
const chamber = design.parts[0]!;
const jets = chamber.sideRows.find((r) => r.group === 'secondary')!;
const D = chamber.vessel.outerDiameterMm; // 80.9625 mm: 3 3/16 in, the 303 can code (CMI can sizes)
const drill = 4.7625; // 3/16 in

describe('the fewest jets for the warning pitch', () => {
  it('matches the worked arithmetic on a 303 can', () => {
    // pi x 80.9625 = 254.35 mm round; under 5/8 in (15.875 mm) needs ceil(254.35 / 15.875) = 17 jets.
    const answer = solveJetCount(jets, drill, D, design.rules);
    expect(answer.fewest?.count).toBe(17);
    expect(answer.fewest?.pitchMm).toBeCloseTo((Math.PI * D) / 17, 9);
    // 3 mm of metal between 3/16 in holes: floor(254.35 / (4.7625 + 3)) = 32.
    expect(answer.most).toBe(32);
  });

  it('gives a count the jet-pitch check then passes, and one fewer fails it', () => {
    const answer = solveJetCount(jets, drill, D, design.rules);
    const withCount = (count: number) => {
      const next = structuredClone(design);
      next.parts[0]!.sideRows.find((r) => r.id === jets.id)!.count = count;
      return layoutDesign(next).findings.filter((f) => f.rule === 'jet-pitch');
    };
    expect(withCount(answer.fewest!.count)).toEqual([]);
    expect(withCount(answer.fewest!.count - 1)).toHaveLength(1);
  });

  it('counts a position left out at the seam as a wider gap', () => {
    // One position out doubles one gap: 2 x 254.35 / n <= 15.875 needs n >= 32.04, so 33.
    const answer = solveJetCount({ ...jets, skip: [0] }, drill, D, design.rules);
    expect(answer.fewest?.count).toBe(33);
  });
});

describe('the warning limit applies exactly', () => {
  it('warns for a pitch 0.02 mm over the limit and not at the limit', () => {
    // 16 jets on the 303 can are 15.897 mm apart: set the limit 0.02 mm under that, then at it.
    const pitch = (Math.PI * D) / 16;
    const at = (limit: number) => {
      const next = structuredClone(design);
      next.rules.jetPitchWarnMm = limit;
      return layoutDesign(next).findings.filter((f) => f.rule === 'jet-pitch' && f.severity === 'warning');
    };
    expect(at(pitch - 0.02)).toHaveLength(1);
    expect(at(pitch)).toHaveLength(0);
  });
});
