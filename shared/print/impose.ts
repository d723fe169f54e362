import { orderPieces } from '../layout/hole-numbers.ts';
import type { Piece } from '../layout/layout-types.ts';
import { findFitProblem, LABEL_BAND_MM, measurePiece, stripSideMm } from './footprint.ts';
import { layoutFurniture } from './furniture.ts';
import type { Imposition, Placement, Rect, Sheet, StripTile } from './imposition-types.ts';
import { packShelves } from './pack-shelves.ts';
import { describeSheet, paperSizes, printOptionsSchema, sheetSize, type PrintOptions } from './paper.ts';
import { countTiles, splitStrip } from './tile-strip.ts';

/** Clear space between pieces on a sheet, for the scissors (common practice, no source). */
export const PLACEMENT_GAP_MM = 4;
/** Hard cap: beyond this a kit is an error, not a stack of paper. */
export const MAX_SHEETS = 40;

/** A kit that cannot be printed on the chosen paper: one message per problem. */
export class ImpositionError extends Error {
  readonly problems: string[];
  constructor(problems: string[]) {
    super(problems.join(' '));
    this.name = 'ImpositionError';
    this.problems = problems;
  }
}

/** One box to place: a whole piece or one tile of a strip. */
interface Footprint {
  piece: Piece;
  tile?: StripTile;
  width: number;
  height: number;
}

/**
 * Puts the pieces of a layout on as few sheets as fit, tiling strips longer than the content is
 * wide, and numbers the sheets in build order (inner parts first). Throws ImpositionError if a piece cannot fit a sheet on its own or the kit needs more
 * than MAX_SHEETS sheets.
 */
export function imposePieces(pieces: readonly Piece[], options: PrintOptions): Imposition {
  const plan = planImposition(pieces, options);
  if ('problems' in plan) throw new ImpositionError(plan.problems);
  return plan.imposition;
}

/** The messages imposePieces would throw with, or [] when the kit prints. */
export function checkImposable(pieces: readonly Piece[], options: PrintOptions): string[] {
  const plan = planImposition(pieces, options);
  return 'problems' in plan ? plan.problems : [];
}

function planImposition(pieces: readonly Piece[], options: PrintOptions): { imposition: Imposition } | { problems: string[] } {
  const opts = printOptionsSchema.parse(options);
  const paper = paperSizes[opts.paper];
  const { widthMm, heightMm } = sheetSize(paper, opts.orientation);
  const { content } = layoutFurniture(widthMm, heightMm, opts.marginMm);
  const where = describeSheet(paper, opts.orientation);

  const problems = pieces.flatMap((piece) => findFitProblem(piece, content, where, opts.marginMm) ?? []);
  if (problems.length) return { problems };
  const tooMany = `The kit needs more than ${MAX_SHEETS} sheets of ${where}; choose larger paper.`;
  if (pieces.some((piece) => countSheetsAtLeast(piece, content) > MAX_SHEETS)) return { problems: [tooMany] };

  // Footprints in build order (inner parts first), each strip's tiles in order.
  const footprints = orderPieces(pieces).flatMap((piece) => cutFootprints(piece, content.width));
  const { packed, binCount } = packShelves(footprints, content.width, content.height, PLACEMENT_GAP_MM);
  if (binCount > MAX_SHEETS) return { problems: [tooMany] };

  // The packer fills sheets tallest piece first; the kit is numbered in build order instead: a
  // sheet comes as early as the earliest footprint it holds, so inner parts come first and a
  // strip's tiles keep their order.
  const firstOnBin = new Array<number>(binCount).fill(Infinity);
  packed.forEach((spot, i) => (firstOnBin[spot.bin] = Math.min(firstOnBin[spot.bin]!, i)));
  const binOrder = firstOnBin.map((first, bin) => ({ first, bin })).sort((a, b) => a.first - b.first);
  const sheetOfBin = new Array<number>(binCount);
  binOrder.forEach(({ bin }, i) => (sheetOfBin[bin] = i));

  const sheets: Sheet[] = Array.from({ length: binCount }, (_, i) => {
    const { furniture, content: sheetContent } = layoutFurniture(widthMm, heightMm, opts.marginMm);
    return { number: i + 1, paper, orientation: opts.orientation, widthMm, heightMm, marginMm: opts.marginMm, furniture, content: sheetContent, placements: [] };
  });
  footprints.forEach((footprint, i) => {
    const spot = packed[i]!;
    const rect = { x: content.x + spot.x, y: content.y + spot.y, width: footprint.width, height: footprint.height };
    sheets[sheetOfBin[spot.bin]!]!.placements.push(placeFootprint(footprint, rect));
  });
  return { imposition: { sheets } };
}

/**
 * Sheets one strip needs at least, counted before its tiles are made (a runaway length could
 * make millions): tiles are wider than half the content, so each takes a shelf of its own.
 */
function countSheetsAtLeast(piece: Piece, content: Rect): number {
  if (piece.kind === 'disc') return 1;
  const { height } = measurePiece(piece);
  const side = stripSideMm(piece);
  const shelvesPerSheet = Math.floor((content.height + PLACEMENT_GAP_MM) / (height + PLACEMENT_GAP_MM));
  return Math.ceil(countTiles(piece.lengthMm + piece.overlapTabMm, content.width - 2 * side) / shelvesPerSheet);
}

/** A piece's box, or one box per tile for a strip longer than the content is wide. */
function cutFootprints(piece: Piece, contentWidth: number): Footprint[] {
  const { width, height } = measurePiece(piece);
  if (piece.kind === 'disc') return [{ piece, width, height }];
  // Tiles split the strip itself; each keeps the side room for marks at its ends.
  const side = stripSideMm(piece);
  const tiles = splitStrip(piece.lengthMm + piece.overlapTabMm, contentWidth - 2 * side);
  if (tiles.length === 1) return [{ piece, width, height }];
  return tiles.map((tile) => ({ piece, tile, width: tile.toXMm - tile.fromXMm + 2 * side, height }));
}

/**
 * The drawing contract: strip x maps to sheet x = originX + x and strip y (up from the bottom
 * edge) to sheet y = originY - y; the shown strip starts stripSideMm in from the rect's left
 * edge, so a later tile's origin lies left of its rect; a disc's
 * origin is its centre, in the middle of its square.
 */
function placeFootprint(footprint: Footprint, rect: Rect): Placement {
  const { piece, tile } = footprint;
  if (piece.kind === 'disc') {
    return { pieceId: piece.id, rect, originX: rect.x + rect.width / 2, originY: rect.y + rect.height / 2 };
  }
  // The strip's bottom edge: under the label band and the strip's height.
  const originY = rect.y + LABEL_BAND_MM + piece.heightMm;
  const placement: Placement = { pieceId: piece.id, rect, originX: rect.x + stripSideMm(piece) - (tile?.fromXMm ?? 0), originY };
  if (tile) placement.tile = tile;
  return placement;
}
