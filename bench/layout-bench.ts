import { designSchema, type Design } from '../shared/design/index.ts';
import { layoutDesign } from '../shared/layout/index.ts';
import { vesselFromCatalogue } from '../shared/vessels/index.ts';
import { measure, report } from './measure.ts';

/**
 * Layout + checks of a 500-hole design (a No. 10 chamber: jets, two low rows, equal-pitch bottom
 * rings, and a shell). Target: under 1 ms median.
 */
export function buildBenchDesign(): Design {
  return designSchema.parse({
    schemaVersion: 1,
    name: 'Bench: 500 holes',
    parts: [
      {
        id: 'chamber',
        role: 'burn-chamber',
        vessel: vesselFromCatalogue('food-603x700'),
        sideRows: [
          { id: 'jets', group: 'secondary', drillId: 'frac:3/16', count: 40, height: { from: 'top', mm: 20 }, startDeg: 4.5 },
          { id: 'jets-2', group: 'secondary', drillId: 'frac:3/16', count: 40, height: { from: 'top', mm: 32 }, startDeg: 0 },
          { id: 'jets-3', group: 'secondary', drillId: 'frac:3/16', count: 40, height: { from: 'top', mm: 44 }, startDeg: 4.5 },
          { id: 'low-1', group: 'primary', drillId: 'frac:1/4', count: 40, height: { from: 'bottom', mm: 16 }, startDeg: 4.5 },
          { id: 'low-2', group: 'primary', drillId: 'frac:1/4', count: 40, height: { from: 'bottom', mm: 30 }, startDeg: 0, keepOuts: [{ label: 'seam', startDeg: -6, endDeg: 6 }], keepOutPolicy: 'respace' },
          { id: 'low-3', group: 'primary', drillId: 'frac:1/4', count: 40, height: { from: 'bottom', mm: 44 }, startDeg: 4.5, keepOuts: [{ label: 'handle', startDeg: 170, endDeg: 190 }] },
        ],
        endPatterns: [{ id: 'rings', group: 'primary', drillId: 'frac:3/16', centerHole: true, stagger: true, rings: { strategy: 'equal-pitch', ringCount: 7, targetPitchMm: 6.2, firstRadiusMm: 9, ringSpacingMm: 9.4 } }],
      },
      {
        id: 'shell',
        role: 'shell',
        vessel: vesselFromCatalogue('paint-gallon'),
        sideRows: [{ id: 'intake', group: 'intake', drillId: 'frac:3/8', count: 24, skip: [0], height: { from: 'bottom', mm: 20 }, startDeg: 0 }],
      },
    ],
  });
}

export function benchLayout(): void {
  const design = buildBenchDesign();
  const holes = layoutDesign(design).holes.length;
  const stats = measure(() => layoutDesign(design), { warmup: 200, runs: 2000 });
  report(`layout + checks, ${holes} holes`, stats, { targetMs: 1 });
}
