import { describe, expect, it } from 'vitest';
import pintCanStove from '../../templates/pint-can-stove.json' with { type: 'json' };
import { designSchema } from '../design/design-schema.ts';
import { diffSummaries } from './diff-summaries.ts';
import type { DesignSummary } from './library-schemas.ts';
import { summarizeDesign } from './summarize-design.ts';

/** The pint-can stove as its notes describe it: 16 jets of 3/16 in, 45 primary holes of 1/4 in. */
function buildSummary(overrides: Partial<DesignSummary> = {}): DesignSummary {
  return {
    holes: 75,
    bySize: [
      { group: 'primary', drillLabel: '1/4 in', count: 45 },
      { group: 'secondary', drillLabel: '3/16 in', count: 16 },
      { group: 'intake', drillLabel: '1/2 in', count: 14 },
    ],
    parts: [
      { id: 'chamber', role: 'burn-chamber', vesselName: 'No. 303 food can (303x406)', canCode: '303x406' },
      { id: 'shell', role: 'shell', vesselName: 'No. 2 1/2 food can (401x411)', canCode: '401x411' },
    ],
    ratio: 5,
    ...overrides,
  };
}

describe('summarizeDesign', () => {
  it('counts the pint-can stove the way its notes describe it', () => {
    const summary = summarizeDesign(designSchema.parse(pintCanStove));
    // templates/pint-can-stove.json notes: 16 jets of 3/16 in; 16 low + 1 + 4 + 8 + 16 = 45 primary of 1/4 in;
    // worked arithmetic: the intake row is 15 positions with position 0 skipped, so 14; 45 + 16 + 14 = 75.
    expect(summary.holes).toBe(75);
    expect(summary.bySize).toEqual(buildSummary().bySize);
    // CMI can codes: 303 = 3 3/16 in across, 406 = 4 6/16 in tall, as the catalogue names them.
    expect(summary.parts.map((part) => part.canCode)).toEqual(['303x406', '401x411']);
    // Worked arithmetic: 45 x (1/4)^2 / (16 x (3/16)^2) = 2.8125 / 0.5625 = 5 (areas go with d^2).
    expect(summary.ratio).toBeCloseTo(5, 3);
  });
});

describe('diffSummaries', () => {
  it('has nothing to say about two equal summaries', () => {
    expect(diffSummaries(buildSummary(), buildSummary())).toEqual([]);
  });

  it('reports a changed jet count with its drill', () => {
    const newer = buildSummary({
      bySize: [
        { group: 'primary', drillLabel: '1/4 in', count: 45 },
        { group: 'secondary', drillLabel: '3/16 in', count: 20 },
        { group: 'intake', drillLabel: '1/2 in', count: 14 },
      ],
    });
    // Worked arithmetic: 2.8125 / (20 x (3/16)^2) = 2.8125 / 0.703125 = 4.0.
    newer.ratio = 4;
    expect(diffSummaries(buildSummary(), newer)).toEqual(['jets: 16 -> 20 holes of 3/16 in', 'primary ratio 5.0 : 1 -> 4.0 : 1']);
  });

  it('reports a new drill size as one size going to zero and another from zero', () => {
    const newer = buildSummary({
      bySize: [
        { group: 'primary', drillLabel: '1/4 in', count: 45 },
        { group: 'secondary', drillLabel: '7/32 in', count: 16 },
        { group: 'intake', drillLabel: '1/2 in', count: 14 },
      ],
    });
    expect(diffSummaries(buildSummary(), newer)).toEqual(['jets: 16 -> 0 holes of 3/16 in', 'jets: 0 -> 16 holes of 7/32 in']);
  });

  it('shows the ratio to one decimal and ignores changes below it', () => {
    // Worked arithmetic: 4.44 and 4.41 both round to 4.4; 4.96 rounds to 5.0.
    expect(diffSummaries(buildSummary({ ratio: 4.44 }), buildSummary({ ratio: 4.41 }))).toEqual([]);
    expect(diffSummaries(buildSummary({ ratio: 4.44 }), buildSummary({ ratio: 4.96 }))).toEqual(['primary ratio 4.4 : 1 -> 5.0 : 1']);
    expect(diffSummaries(buildSummary({ ratio: 5 }), buildSummary({ ratio: null }))).toEqual(['primary ratio 5.0 : 1 -> none (no jets)']);
  });

  it('names a part whose can changed by its role and can code', () => {
    const newer = buildSummary();
    newer.parts = [{ id: 'chamber', role: 'burn-chamber', vesselName: 'Measured can', canCode: '307x409' }, newer.parts[1]!];
    expect(diffSummaries(buildSummary(), newer)).toEqual(['burn chamber can: 303x406 -> 307x409']);
  });

  it('falls back to the vessel name when the can code stays the same or is missing', () => {
    const older = buildSummary({ parts: [{ id: 'chamber', role: 'burn-chamber', vesselName: 'Soup can', canCode: '303x406' }] });
    const newer = buildSummary({ parts: [{ id: 'chamber', role: 'burn-chamber', vesselName: 'Bean can', canCode: '303x406' }] });
    expect(diffSummaries(older, newer)).toEqual(['burn chamber can: Soup can -> Bean can']);
    const tiny = buildSummary({ parts: [{ id: 'chamber', role: 'burn-chamber', vesselName: 'Thimble', canCode: null }] });
    expect(diffSummaries(older, tiny)).toEqual(['burn chamber can: 303x406 -> Thimble']);
  });

  it('reports parts added and removed', () => {
    const older = buildSummary();
    const newer = buildSummary({
      parts: [older.parts[0]!, { id: 'ring', role: 'concentrator', vesselName: 'Tuna can (307x109)', canCode: '307x109' }],
    });
    expect(diffSummaries(older, newer)).toEqual(['shell removed: 401x411', 'concentrator added: 307x109']);
  });
});
