import type { PartRole } from '../design/design-schema.ts';
import type { Hole, Layout, Piece } from './layout-types.ts';

/**
 * The order a stove is built and its kit is used: inner parts first. The burn chamber is drilled
 * and stood in place before the shell goes round it, the collar rides on the shell, and the top
 * parts come last (common practice, no source).
 */
export const BUILD_ORDER: readonly PartRole[] = ['burn-chamber', 'shell', 'intake-collar', 'concentrator', 'pot-stand'];

/** Pieces in build order, the layout's own order among the pieces of one role. */
export function orderPieces<P extends Pick<Piece, 'role'>>(pieces: readonly P[]): P[] {
  return pieces
    .map((piece, i) => ({ piece, i }))
    .sort((a, b) => BUILD_ORDER.indexOf(a.piece.role) - BUILD_ORDER.indexOf(b.piece.role) || a.i - b.i)
    .map(({ piece }) => piece);
}

export interface NumberedHole {
  hole: Hole;
  /** 1-based, unique in the kit: the same number on the template, the build sheet and the CSV. */
  number: number;
  /** The row's or pattern's own name, as the template labels it ("Secondary jets"). */
  rowName: string;
}

/**
 * Numbers every hole of a layout 1..n in the order of work: pieces in build order, the rows of a
 * piece in the order the layout places them, the holes of a row by their index round the can
 * (or out from the centre, ring by ring, on a disc). A row's holes get consecutive numbers, so a
 * row reads as one range ("holes 25-48").
 */
export function numberHoles(layout: Pick<Layout, 'pieces' | 'holes' | 'marks'>): NumberedHole[] {
  const byPiece = new Map<string, Map<string, Hole[]>>();
  for (const hole of layout.holes) {
    let rows = byPiece.get(hole.pieceId);
    if (!rows) byPiece.set(hole.pieceId, (rows = new Map()));
    let row = rows.get(hole.sourceId);
    if (!row) rows.set(hole.sourceId, (row = []));
    row.push(hole);
  }
  const numbered: NumberedHole[] = [];
  for (const piece of orderPieces(layout.pieces)) {
    for (const [sourceId, holes] of byPiece.get(piece.id) ?? []) {
      const rowName = nameRow(layout, piece.id, sourceId);
      for (const hole of [...holes].sort((a, b) => a.index - b.index)) numbered.push({ hole, number: numbered.length + 1, rowName });
    }
  }
  return numbered;
}

/** The name a piece's row or ring pattern carries on its template, else its id. */
export function nameRow(layout: Pick<Layout, 'marks'>, pieceId: string, sourceId: string): string {
  for (const mark of layout.marks) {
    if ((mark.kind === 'row-line' || mark.kind === 'ring-circle') && mark.pieceId === pieceId && mark.sourceId === sourceId) return mark.label;
  }
  return sourceId;
}

/** "12" for one hole, "25–48" for a run. */
export function describeNumberRange(numbers: readonly number[]): string {
  if (numbers.length === 0) return '';
  let low = Infinity;
  let high = -Infinity;
  for (const n of numbers) [low, high] = [Math.min(low, n), Math.max(high, n)];
  return low === high ? String(low) : `${low}–${high}`;
}
