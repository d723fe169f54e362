import type { Piece } from '../layout/layout-types.ts';
import { DISC_LABEL_MM, FOOT_BAND_MM, LABEL_BAND_MM, stripSideMm } from './footprint.ts';
import type { Imposition, Placement, Rect } from './imposition-types.ts';
import { PLACEMENT_GAP_MM } from './impose.ts';
import { TILE_OVERLAP_MM } from './tile-strip.ts';

/** Float slack for comparing positions: far below anything a printer shows. */
const EPS = 1e-6;

/**
 * Everything wrong with an imposition, as sentences (empty when sound): rects outside their
 * areas or overlapping, pieces missing or tiled with gaps, origins off the drawing contract.
 * Used by the tests; cheap enough to run as a self-check before printing.
 */
export function listImpositionFaults(imposition: Imposition, pieces: readonly Piece[]): string[] {
  const faults: string[] = [];
  imposition.sheets.forEach((sheet, i) => {
    const at = `sheet ${sheet.number}`;
    if (sheet.number !== i + 1) faults.push(`${at} is numbered out of order`);
    if (sheet.placements.length === 0) faults.push(`${at} is empty`);
    const m = sheet.marginMm;
    const printable = { x: m, y: m, width: sheet.widthMm - 2 * m, height: sheet.heightMm - 2 * m };
    const furniture = Object.entries(sheet.furniture);
    for (const [name, r] of furniture) if (!containsRect(printable, r)) faults.push(`${at}: ${name} leaves the printable area`);
    for (const [j, [a, ra]] of furniture.entries()) {
      for (const [b, rb] of furniture.slice(j + 1)) if (overlapRects(ra, rb)) faults.push(`${at}: ${a} overlaps ${b}`);
      if (overlapRects(ra, sheet.content)) faults.push(`${at}: ${a} overlaps the content area`);
    }
    for (const [j, p] of sheet.placements.entries()) {
      const what = `${at}: ${p.pieceId}${p.tile ? ` tile ${p.tile.number}` : ''}`;
      if (!containsRect(sheet.content, p.rect)) faults.push(`${what} leaves the content area`);
      for (const q of sheet.placements.slice(j + 1)) {
        if (overlapRects(p.rect, q.rect, PLACEMENT_GAP_MM)) faults.push(`${what} is closer than ${PLACEMENT_GAP_MM} mm to ${q.pieceId}`);
      }
      const piece = pieces.find((candidate) => candidate.id === p.pieceId);
      if (!piece) faults.push(`${what} is not one of the pieces`);
      else faults.push(...checkContract(piece, p).map((fault) => `${what}: ${fault}`));
    }
  });
  for (const piece of pieces) faults.push(...checkCoverage(piece, imposition).map((fault) => `${piece.id}: ${fault}`));
  return faults;
}

/** Sheet x = originX + strip x, sheet y = originY - strip y; a disc's centre mid-square. */
function checkContract(piece: Piece, p: Placement): string[] {
  const faults: string[] = [];
  const near = (a: number, b: number, what: string) => Math.abs(a - b) > EPS && faults.push(`${what} is ${a}, expected ${b}`);
  if (piece.kind === 'disc') {
    const half = piece.diameterMm / 2 + DISC_LABEL_MM;
    near(p.rect.width, 2 * half, 'square side');
    near(p.rect.height, 2 * half, 'square side');
    near(p.originX, p.rect.x + half, 'centre x');
    near(p.originY, p.rect.y + half, 'centre y');
    return faults;
  }
  const from = p.tile?.fromXMm ?? 0;
  const to = p.tile?.toXMm ?? piece.lengthMm + piece.overlapTabMm;
  const side = stripSideMm(piece);
  near(p.originX + from, p.rect.x + side, 'left edge of the shown strip');
  near(p.originX + to, p.rect.x + p.rect.width - side, 'right edge of the shown strip');
  near(p.originY - piece.heightMm, p.rect.y + LABEL_BAND_MM, 'top edge');
  near(p.originY + FOOT_BAND_MM, p.rect.y + p.rect.height, 'bottom band');
  return faults;
}

/** A disc placed once; a strip placed once whole, or in tiles covering 0..length + tab. */
function checkCoverage(piece: Piece, imposition: Imposition): string[] {
  const placements = imposition.sheets.flatMap((s) => s.placements).filter((p) => p.pieceId === piece.id);
  if (piece.kind === 'disc' || placements.length === 1) {
    return placements.length === 1 && !placements[0]!.tile ? [] : [`placed ${placements.length} times`];
  }
  const tiles = placements.map((p) => p.tile).filter((t) => t !== undefined).sort((a, b) => a.number - b.number);
  if (tiles.length !== placements.length || tiles.length < 2) return ['tiled placements lack tile data'];
  const faults: string[] = [];
  const total = piece.lengthMm + piece.overlapTabMm;
  if (Math.abs(tiles[0]!.fromXMm) > EPS) faults.push('first tile does not start at 0');
  if (Math.abs(tiles[tiles.length - 1]!.toXMm - total) > EPS) faults.push('last tile does not end at length + tab');
  tiles.forEach((tile, k) => {
    if (tile.number !== k + 1 || tile.count !== tiles.length) faults.push(`tile ${k + 1} is numbered ${tile.number} of ${tile.count}`);
    if (tile.overlapMm !== TILE_OVERLAP_MM) faults.push(`tile ${tile.number} overlap is ${tile.overlapMm}`);
    if ((k === 0) !== (tile.joinLeft === undefined)) faults.push(`tile ${tile.number} left join is ${tile.joinLeft}`);
    const next = tiles[k + 1];
    if (!next) {
      if (tile.joinRight !== undefined) faults.push(`last tile has a right join`);
      return;
    }
    if (Math.abs(tile.toXMm - next.fromXMm - TILE_OVERLAP_MM) > EPS) faults.push(`tiles ${k + 1} and ${k + 2} overlap by ${tile.toXMm - next.fromXMm}`);
    if (!tile.joinRight || tile.joinRight !== next.joinLeft) faults.push(`join ${k + 1}: ${tile.joinRight} vs ${next.joinLeft}`);
  });
  return faults;
}

/** True if the rects come closer than gap (0: share area; touching edges do not count). */
function overlapRects(a: Rect, b: Rect, gap = 0): boolean {
  return a.x < b.x + b.width + gap - EPS && b.x < a.x + a.width + gap - EPS && a.y < b.y + b.height + gap - EPS && b.y < a.y + a.height + gap - EPS;
}

function containsRect(outer: Rect, inner: Rect): boolean {
  return inner.x >= outer.x - EPS && inner.y >= outer.y - EPS && inner.x + inner.width <= outer.x + outer.width + EPS && inner.y + inner.height <= outer.y + outer.height + EPS;
}
