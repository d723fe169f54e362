import { describe, expect, it } from 'vitest';
import { validateDesign } from '../../../shared/design/index.ts';
import { layoutDesign, layoutDocument, type Finding } from '../../../shared/layout/index.ts';
import { vesselFromCatalogue } from '../../../shared/vessels/index.ts';
import { buildDesign, inchToMm } from '../../helpers/design-factory.ts';

const rules = (findings: Finding[]) => findings.map((f) => `${f.severity}:${f.rule}`);

/** n jets round a can of diameter D sit pi D / n apart. */
const jetsAtPitch = (pitchMm: number, diameterMm: number) => Math.round((Math.PI * diameterMm) / pitchMm);

describe('jet pitch (warn above 5/8 in, error above 3/4 in: common practice, no source)', () => {
  const D = vesselFromCatalogue('food-603x700').outerDiameterMm; // No. 10 can, 157.16 mm (CMI)
  const withJets = (count: number) =>
    layoutDesign(buildDesign({ vessel: vesselFromCatalogue('food-603x700'), sideRows: [{ id: 'jets', group: 'secondary', drillId: 'frac:3/16', count, height: { from: 'top', mm: 20 }, startDeg: 3 }] }));

  it('passes jets 9/16 in apart', () => {
    expect(rules(withJets(jetsAtPitch(inchToMm(9 / 16), D)).findings)).not.toContain('warning:jet-pitch');
  });
  it('warns when jets are between 5/8 and 3/4 in apart', () => {
    const count = jetsAtPitch(inchToMm(0.69), D);
    const finding = withJets(count).findings.find((f) => f.rule === 'jet-pitch');
    expect(finding?.severity).toBe('warning');
    expect(finding!.numbers.pitchMm).toBeCloseTo((Math.PI * D) / count, 1);
  });
  it('errs when jets are more than 3/4 in apart', () => {
    expect(rules(withJets(jetsAtPitch(inchToMm(0.8), D)).findings)).toContain('error:jet-pitch');
  });
});

describe('spacing, edges and fit', () => {
  it('flags overlapping holes as an error and thin ligaments as a warning (3 mm default: common practice, no source)', () => {
    const tight = (count: number) =>
      layoutDesign(buildDesign({ sideRows: [{ id: 'row', group: 'primary', drillId: 'frac:1/4', count, height: { from: 'bottom', mm: 30 }, startDeg: 5 }] }));
    // pi x 80.96 mm / 40 = 6.36 mm pitch for 6.35 mm holes: 0.01 mm of metal.
    expect(rules(tight(40).findings)).toContain('warning:thin-ligament');
    expect(tight(40).findings.find((f) => f.rule === 'thin-ligament')!.numbers.ligamentMm).toBeCloseTo((Math.PI * 80.9625) / 40 - 6.35, 2);
    expect(rules(tight(41).findings)).toContain('error:holes-overlap');
    expect(rules(tight(24).findings)).not.toContain('warning:thin-ligament');
  });

  it('flags holes that run off the wall and holes outside the usable bottom', () => {
    const off = layoutDesign(
      buildDesign({
        sideRows: [{ id: 'row', group: 'primary', drillId: 'frac:1/4', count: 8, height: { from: 'bottom', mm: 2 }, startDeg: 10 }],
        endPatterns: [{ id: 'ring', group: 'primary', drillId: 'frac:1/4', rings: { strategy: 'explicit', rings: [{ radiusMm: 35, count: 12 }] } }],
      }),
    );
    expect(rules(off.findings)).toEqual(expect.arrayContaining(['error:leaves-part', 'error:outside-usable-bottom']));
  });

  it('warns near the top edge, the bottom chime and the seam', () => {
    const near = layoutDesign(
      buildDesign({
        sideRows: [
          { id: 'top', group: 'secondary', drillId: 'frac:3/16', count: 16, height: { from: 'top', mm: 5 }, startDeg: 11.25 },
          { id: 'low', group: 'primary', drillId: 'frac:1/4', count: 8, height: { from: 'bottom', mm: 6 }, startDeg: 0 },
        ],
      }),
    );
    expect(rules(near.findings)).toEqual(expect.arrayContaining(['warning:near-top-edge', 'warning:near-bottom-chime', 'warning:near-seam']));
  });

  it('turns an impossible request into findings, not exceptions: a hole larger than the bottom', () => {
    const result = layoutDocument({
      schemaVersion: 1,
      name: 'Too big',
      parts: [{ id: 'c', role: 'burn-chamber', vessel: vesselFromCatalogue('food-202x214'), endPatterns: [{ id: 'e', group: 'primary', drillId: 'frac:1', centerHole: true, rings: { strategy: 'explicit', rings: [{ radiusMm: 20, count: 6 }] } }] }],
    });
    expect(result.ok).toBe(true);
    if (result.ok) expect(rules(result.layout.findings)).toEqual(expect.arrayContaining(['error:outside-usable-bottom', 'error:holes-overlap']));
  });

  it('caps a design at 2,000 holes with a clear error', () => {
    const layout = layoutDesign(buildDesign({ endPatterns: [{ id: 'e', group: 'primary', drillId: 'mm:1', rings: { strategy: 'equal-pitch', ringCount: 20, targetPitchMm: 0.5, firstRadiusMm: 1, ringSpacingMm: 1.5 } }] }));
    expect(layout.holes).toHaveLength(0);
    expect(layout.findings[0]).toMatchObject({ rule: 'too-many-holes', severity: 'error' });
    expect(layout.findings[0]!.message).toContain('at most 2000');
  });

  it('notes a drill the maker does not own and names the nearest one they do', () => {
    const layout = layoutDesign(
      buildDesign(
        { sideRows: [{ id: 'row', group: 'secondary', drillId: 'num:7', count: 16, height: { from: 'top', mm: 15 }, startDeg: 11.25 }] },
        { drillSet: { name: 'small set', drillIds: ['frac:3/16', 'frac:1/4'] } },
      ),
    );
    const finding = layout.findings.find((f) => f.rule === 'drill-not-in-set');
    expect(finding?.severity).toBe('warning');
    // #7 = 0.2010 in = 5.105 mm (ASME B94.11M); 13/64 in is not in the set, 3/16 in (4.76) is nearer than 1/4 in (6.35).
    expect(finding!.numbers.nearestMm).toBeCloseTo(inchToMm(3 / 16), 6);
  });

  it('judges a flame concentrator opening against about 0.6 D (Aprovecho Research Center newsletter)', () => {
    const concentrator = (openingDiameterMm: number) =>
      layoutDesign(
        designWithConcentrator(openingDiameterMm),
      ).findings.find((f) => f.rule === 'concentrator-opening');
    expect(concentrator(0.6 * 80.9625)?.severity).toBe('note');
    expect(concentrator(0.3 * 80.9625)?.severity).toBe('warning');
  });
});

function designWithConcentrator(openingDiameterMm: number) {
  const base = buildDesign();
  return { ...base, parts: [...base.parts, { id: 'conc', role: 'concentrator' as const, vessel: vesselFromCatalogue('food-401x411'), sideRows: [], endPatterns: [], openingDiameterMm }] };
}

describe('bad input', () => {
  it('lists field paths for an invalid design and never throws', () => {
    const result = validateDesign({ schemaVersion: 1, name: '', parts: [{ id: 'c', role: 'kettle', vessel: { source: 'measured', name: 'x', outerDiameterMm: -5, heightMm: 100 } }] });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.problems.map((p) => p.path)).toEqual(expect.arrayContaining(['name', 'parts.0.role', 'parts.0.vessel.outerDiameterMm']));
    for (const junk of [null, 42, 'design', [], { schemaVersion: 2 }]) expect(validateDesign(junk).ok).toBe(false);
  });

  it('names an unknown drill and a skip outside the row by path', () => {
    const result = validateDesign({
      schemaVersion: 1,
      name: 'x',
      parts: [{ id: 'c', role: 'burn-chamber', vessel: vesselFromCatalogue('food-303x406'), sideRows: [{ id: 'r', group: 'primary', drillId: 'frac:1/3', count: 4, skip: [4], height: { from: 'bottom', mm: 20 } }] }],
    });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.problems.map((p) => p.path).sort()).toEqual(['parts.0.sideRows.0.drillId', 'parts.0.sideRows.0.skip.0']);
  });
});
