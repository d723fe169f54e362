import type { Design } from '../../design/design-schema.ts';
import type { Assembly } from '../assembly.ts';
import type { CollarRange } from '../collar.ts';
import type { Finding, Hole, Piece } from '../layout-types.ts';

export interface CheckContext {
  design: Design;
  pieces: Piece[];
  holesByPiece: Map<string, Hole[]>;
  /** Side-row positions dropped in keep-outs, by "partId/rowId". */
  dropped: Map<string, number>;
  /** Where each part stands in the put-together stove. */
  assembly: Assembly;
  /** The intake range of each intake collar. */
  collars?: CollarRange[];
}

export type Check = (context: CheckContext) => Finding[];

/** Collects findings of one rule per key, so 40 tight holes make one finding, not 40. */
export class FindingGroups {
  private groups = new Map<string, { finding: Finding; holeIds: Set<string> }>();

  add(key: string, make: () => Omit<Finding, 'holeIds'>, holeIds: string[], merge?: (finding: Finding) => void): void {
    let group = this.groups.get(key);
    if (!group) {
      group = { finding: { ...make(), holeIds: [] }, holeIds: new Set() };
      this.groups.set(key, group);
    } else merge?.(group.finding);
    for (const id of holeIds) group.holeIds.add(id);
  }

  list(): Finding[] {
    return [...this.groups.values()].map(({ finding, holeIds }) => ({ ...finding, holeIds: [...holeIds] }));
  }
}

export const mm = (value: number) => Math.round(value * 100) / 100;

/** Every hole of one part, on any of its pieces. */
export function holesOfPart(context: Pick<CheckContext, 'pieces' | 'holesByPiece'>, partId: string): Hole[] {
  return context.pieces.filter((p) => p.partId === partId).flatMap((p) => context.holesByPiece.get(p.id) ?? []);
}

/** Holes on a part's wall strips only (their yMm is up from the can's bottom). */
export function wallHolesOfPart(context: Pick<CheckContext, 'pieces' | 'holesByPiece'>, partId: string): Hole[] {
  return context.pieces.filter((p) => p.partId === partId && p.kind === 'wrap-strip').flatMap((p) => context.holesByPiece.get(p.id) ?? []);
}
