import { validateDesign, type Design, type DesignInput } from '../../../shared/design/index.ts';
import firstTry from '../../../templates/first-try-too-sparse.json';
import metricTin from '../../../templates/metric-tin-stove.json';
import no10Can from '../../../templates/no10-can-stove.json';
import pintCan from '../../../templates/pint-can-stove.json';
import seamKeepOut from '../../../templates/seam-keepout-concentrator.json';

export interface DemoDesign {
  id: string;
  design: Design;
}

/** The example designs shipped in templates/, validated as any file a maker opens would be. */
export function loadDemoDesigns(): DemoDesign[] {
  const files: [string, unknown][] = [
    ['pint-can-stove', pintCan],
    ['no10-can-stove', no10Can],
    ['metric-tin-stove', metricTin],
    ['seam-keepout-concentrator', seamKeepOut],
    ['first-try-too-sparse', firstTry],
  ];
  const designs = files.flatMap(([id, json]) => {
    const result = validateDesign(json);
    return result.ok ? [{ id, design: result.design }] : [];
  });
  return [...designs, { id: 'bench-500', design: buildBenchDesign() }];
}

/**
 * Stress cases for redraw and typing timing: `rows` rows of `perRow` x 1/16 in holes round a
 * No. 10 can (157.2 mm across, 177.8 mm tall: the catalogue's food-603x700), spread from 20 mm to
 * 140 mm above the bottom; the lower three fifths primary air, the rest jets.
 */
export function wallOfHoles(rows: number, perRow: number): DesignInput {
  return {
    schemaVersion: 1,
    name: `${rows * perRow}-hole test can`,
    units: 'in',
    parts: [
      {
        id: 'chamber',
        role: 'burn-chamber',
        name: 'Test can',
        vessel: { source: 'catalogue', catalogueId: 'food-603x700', name: 'No. 10 food can (603x700)', outerDiameterMm: 157.1625, heightMm: 177.8, wallThicknessMm: 0.25, seamAngleDeg: 0, bottomRimInsetMm: 4 },
        sideRows: Array.from({ length: rows }, (_, i) => ({
          id: `row-${i + 1}`,
          label: `Row ${i + 1}`,
          group: i < Math.ceil(rows * 0.6) ? ('primary' as const) : ('secondary' as const),
          drillId: 'frac:1/16',
          count: perRow,
          height: { from: 'bottom' as const, mm: rows === 1 ? 20 : 20 + (i * 120) / (rows - 1) },
          startDeg: 1.8,
        })),
      },
    ],
  };
}

/** The 500-hole redraw case: five rows of 100, 30 mm apart. */
export function buildBenchDesign(): Design {
  const result = validateDesign(wallOfHoles(5, 100));
  if (!result.ok) throw new Error(`The bench design is invalid: ${result.problems.map((p) => `${p.path} ${p.message}`).join('; ')}`);
  return result.design;
}
