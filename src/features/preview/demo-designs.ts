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
 * A stress case for redraw timing: 500 holes on one wall strip, five rows of 100 x 1/16 in round
 * a No. 10 can (157.2 mm across, 177.8 mm tall: the catalogue's food-603x700).
 */
export function buildBenchDesign(): Design {
  const input: DesignInput = {
    schemaVersion: 1,
    name: '500-hole test can',
    units: 'in',
    parts: [
      {
        id: 'chamber',
        role: 'burn-chamber',
        name: 'Test can',
        vessel: { source: 'catalogue', catalogueId: 'food-603x700', name: 'No. 10 food can (603x700)', outerDiameterMm: 157.1625, heightMm: 177.8, wallThicknessMm: 0.25, seamAngleDeg: 0, bottomRimInsetMm: 4 },
        sideRows: [20, 50, 80, 110, 140].map((mm, i) => ({ id: `row-${i + 1}`, label: `Row ${i + 1}`, group: i < 3 ? 'primary' : 'secondary', drillId: 'frac:1/16', count: 100, height: { from: 'bottom', mm }, startDeg: 1.8 })),
      },
    ],
  };
  const result = validateDesign(input);
  if (!result.ok) throw new Error(`The bench design is invalid: ${result.problems.map((p) => `${p.path} ${p.message}`).join('; ')}`);
  return result.design;
}
