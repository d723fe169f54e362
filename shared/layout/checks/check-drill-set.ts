import { nearestDrill, resolveDrillSet } from '../../drills/index.ts';
import type { Check } from './check-context.ts';

/** A hole whose drill the maker does not own (warning), with the nearest one they do. */
export const checkDrillSet: Check = ({ design, pieces, holesByPiece }) => {
  if (design.drillSet.drillIds.length === 0) return [];
  const owned = resolveDrillSet(design.drillSet);
  const ownedIds = new Set(owned.map((drill) => drill.id));
  const missing = new Map<string, { label: string; diameterMm: number; holeIds: string[] }>();
  for (const piece of pieces) {
    for (const hole of holesByPiece.get(piece.id) ?? []) {
      if (ownedIds.has(hole.drillId)) continue;
      const entry = missing.get(hole.drillId) ?? { label: hole.drillLabel, diameterMm: hole.diameterMm, holeIds: [] };
      entry.holeIds.push(hole.id);
      missing.set(hole.drillId, entry);
    }
  }
  return [...missing.values()].map((entry) => {
    const nearest = nearestDrill(entry.diameterMm, owned);
    const hint = nearest ? ` The nearest you have is ${nearest.drill.label} (${nearest.offMm >= 0 ? '+' : ''}${Math.round(nearest.offMm * 100) / 100} mm).` : '';
    return {
      rule: 'drill-not-in-set',
      severity: 'warning' as const,
      message: `${entry.holeIds.length} holes need a ${entry.label} drill, which is not in "${design.drillSet.name}".${hint}`,
      numbers: { diameterMm: entry.diameterMm, holes: entry.holeIds.length, ...(nearest ? { nearestMm: nearest.drill.diameterMm } : {}) },
      holeIds: entry.holeIds,
    };
  });
};
