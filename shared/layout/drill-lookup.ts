import { findDrill, type Drill } from '../drills/index.ts';

export type DrillLookup = Map<string, Drill>;

export function createDrillLookup(): DrillLookup {
  return new Map();
}

/** The drill for an id; validateDesign has already refused unknown ids. */
export function resolveDrill(lookup: DrillLookup, id: string): Drill {
  let drill = lookup.get(id);
  if (!drill) {
    drill = findDrill(id);
    if (!drill) throw new Error(`Unknown drill "${id}" (validateDesign should have refused it)`);
    lookup.set(id, drill);
  }
  return drill;
}
