import type { Piece } from '../layout/layout-types.ts';
import { layoutFurniture } from './furniture.ts';
import type { Rect } from './imposition-types.ts';
import { describeSheet, paperIds, sheetSize } from './paper.ts';
import { TILE_OVERLAP_MM } from './tile-strip.ts';

/** Room above a strip's top edge for its title and labels (the drawing puts the title 4 mm down). */
export const LABEL_BAND_MM = 8;
/** Room below a strip's bottom edge. */
export const FOOT_BAND_MM = 5;
/** Room round a disc for its title, index mark and cut note, on every side. */
export const DISC_LABEL_MM = 6;

/** Room left and right of a strip (or tile) for hole marks that straddle its ends; at least 4 mm. */
export function stripSideMm(piece: Extract<Piece, { kind: 'wrap-strip' }>): number {
  return Math.max(4, piece.markReachMm + 0.5);
}

/**
 * The box a whole piece takes with its labels: a disc's square, or a strip's full x range
 * (0 .. length + tab) and its side room, by its height and the two label bands.
 */
export function measurePiece(piece: Piece): { width: number; height: number } {
  if (piece.kind === 'disc') {
    const side = piece.diameterMm + 2 * DISC_LABEL_MM;
    return { width: side, height: side };
  }
  return { width: piece.lengthMm + piece.overlapTabMm + 2 * stripSideMm(piece), height: piece.heightMm + LABEL_BAND_MM + FOOT_BAND_MM };
}

/** Whether a piece fits the content rect on its own (a strip may be tiled to do so). */
function fitsContent(piece: Piece, content: Rect): boolean {
  const { width, height } = measurePiece(piece);
  if (piece.kind === 'wrap-strip') return height <= content.height && content.width > TILE_OVERLAP_MM + 2 * stripSideMm(piece);
  return width <= content.width && height <= content.height;
}

/**
 * Why a piece cannot go on any sheet of this paper, even alone, with the sheets where it would
 * fit at this margin; null if it fits.
 */
export function findFitProblem(piece: Piece, content: Rect, where: string, marginMm: number): string | null {
  const sizes = piece.kind === 'disc' ? [piece.diameterMm] : [piece.lengthMm, piece.heightMm, piece.overlapTabMm];
  if (!sizes.every((mm) => Number.isFinite(mm) && mm >= 0) || sizes.slice(0, 2).some((mm) => mm <= 0)) {
    return `${describePiece(piece)} has no printable size.`;
  }
  if (fitsContent(piece, content)) return null;
  const { height } = measurePiece(piece);
  const size =
    piece.kind === 'disc'
      ? `is ${round(piece.diameterMm)} mm across (a ${round(height)} mm square with its labels)`
      : `is ${round(piece.heightMm)} mm tall (${round(height)} mm with its labels)`;
  const elsewhere = listSheetsThatFit(piece, marginMm);
  const advice = elsewhere.length ? `It fits on ${elsewhere.join(', ')}.` : `No paper size fits it at a ${round(marginMm)} mm margin.`;
  return `${describePiece(piece)} ${size} but ${where} leaves ${round(content.width)} x ${round(content.height)} mm for pieces. ${advice}`;
}

function listSheetsThatFit(piece: Piece, marginMm: number): string[] {
  return paperIds.flatMap((paper) =>
    (['portrait', 'landscape'] as const).flatMap((orientation) => {
      const { widthMm, heightMm } = sheetSize(paper, orientation);
      return fitsContent(piece, layoutFurniture(widthMm, heightMm, marginMm).content) ? [describeSheet(paper, orientation)] : [];
    }),
  );
}

function describePiece(piece: Piece): string {
  return `${piece.kind === 'disc' ? 'Disc' : 'Wrap strip'} "${piece.name}"`;
}

function round(mm: number): number {
  return Math.round(mm * 10) / 10;
}
