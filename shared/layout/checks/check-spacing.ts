import type { Hole } from '../layout-types.ts';
import type { Design } from '../../design/design-schema.ts';
import { FindingGroups, mm, type Check } from './check-context.ts';
import { nameSource } from '../../design/name-source.ts';

/**
 * Holes that overlap (error) and ligaments, the metal left between hole edges, thinner than the
 * design's minimum (warning: thin webs tear or crack when drilled and heated). Sweep and prune
 * along x keeps this near-linear; on a wrap strip x wraps round at the strip length.
 */
export const checkSpacing: Check = ({ design, pieces, holesByPiece }) => {
  const minLigament = design.rules.minLigamentMm;
  const found = new FindingGroups();
  for (const piece of pieces) {
    const holes = [...(holesByPiece.get(piece.id) ?? [])].sort((a, b) => a.xMm - b.xMm);
    const period = piece.kind === 'wrap-strip' ? piece.lengthMm : Infinity;
    // The strip is a touch longer than the can's circumference (paper thickness); metal is measured on the can.
    const toMetal = piece.kind === 'wrap-strip' ? (Math.PI * piece.vesselDiameterMm) / piece.lengthMm : 1;
    const reach = Math.max(0, ...holes.map((h) => h.diameterMm)) + minLigament;
    const report = (a: Hole, b: Hole, ligament: number) => {
      const overlap = ligament < 0;
      const [first, second] = a.sourceId <= b.sourceId ? [a, b] : [b, a];
      found.add(
        `${overlap ? 'o' : 'l'}|${piece.id}|${first.sourceId}|${second.sourceId}`,
        () => ({
          rule: overlap ? 'holes-overlap' : 'thin-ligament',
          severity: overlap ? 'error' : 'warning',
          pieceId: piece.id,
          message: overlap
            ? `Holes of ${describe(design, first, second)} overlap on ${piece.name}: they would merge into one ragged hole.`
            : `Only ${mm(ligament)} mm of metal between holes of ${describe(design, first, second)} on ${piece.name} (minimum ${minLigament} mm): thin webs tear when drilled and crack when hot.`,
          numbers: { ligamentMm: mm(ligament), minimumMm: minLigament },
        }),
        [a.id, b.id],
        (finding) => {
          if (ligament < finding.numbers.ligamentMm!) finding.numbers.ligamentMm = mm(ligament);
        },
      );
    };
    for (let i = 0; i < holes.length; i++) {
      const a = holes[i]!;
      for (let j = i + 1; j < holes.length && holes[j]!.xMm - a.xMm < reach; j++) compare(a, holes[j]!, period, toMetal, minLigament, report);
      if (period !== Infinity) {
        // Near the end of the strip, neighbours sit at its start.
        for (let j = 0; j < i && holes[j]!.xMm + period - a.xMm < reach; j++) compare(a, holes[j]!, period, toMetal, minLigament, report);
      }
    }
  }
  return found.list();
};

function compare(a: Hole, b: Hole, period: number, toMetal: number, minLigament: number, report: (a: Hole, b: Hole, ligament: number) => void): void {
  let dx = Math.abs(a.xMm - b.xMm);
  if (period !== Infinity) dx = Math.min(dx, period - dx) * toMetal;
  const ligament = Math.hypot(dx, a.yMm - b.yMm) - (a.diameterMm + b.diameterMm) / 2;
  if (ligament < minLigament - 1e-6) report(a, b, ligament);
}

function describe(design: Design, a: Hole, b: Hole): string {
  const [first, second] = [nameSource(design, a.sourceId), nameSource(design, b.sourceId)];
  return a.sourceId === b.sourceId ? `"${first}"` : `"${first}" and "${second}"`;
}

