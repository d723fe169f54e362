import type { Design } from '../design/design-schema.ts';
import type { DrawingContext } from '../drawing/drawing-context.ts';
import { BUILD_ORDER } from '../layout/hole-numbers.ts';
import type { Layout } from '../layout/layout-types.ts';
import { pageWriter } from './draw-build-sheet.ts';
import { strokes, type } from './draw-style.ts';
import type { Imposition, Sheet } from './imposition-types.ts';
import { describeLength, type KitText } from './kit-text.ts';
import { describeSheet } from './paper.ts';

export interface SheetMapTile {
  sheet: number;
  number: number;
  fromXMm: number;
  toXMm: number;
  joinLeft?: string;
  joinRight?: string;
}

export interface SheetMapStrip {
  piece: string;
  /** Strip and tab, mm: what the tiles cover together. */
  totalMm: number;
  overlapMm: number;
  tiles: SheetMapTile[];
  /** One sentence a join: which sheet goes over which, at which letter. */
  joins: string[];
}

/** The page that says which sheet holds which piece, in which order to use them, and how tiles join. */
export interface SheetMapContent {
  title: string;
  /** "6 sheets of Letter, upright; use them in order: ..." */
  intro: string;
  sheets: { number: number; contents: string }[];
  strips: SheetMapStrip[];
  numbering: string;
}

/**
 * What the sheet map says: every sheet and what it holds (the sheets are already numbered in build
 * order, inner parts first), and for each strip printed in tiles, which sheet's end goes over which
 * at each join letter.
 */
export function sheetMapContent(design: Pick<Design, 'name' | 'parts'>, layout: Pick<Layout, 'pieces' | 'holes'>, imposition: Imposition, text: Pick<KitText, 'units'>): SheetMapContent {
  const sheets = imposition.sheets;
  const first = sheets[0];
  const where = first ? describeSheet(first.paper, first.orientation) : 'paper';
  const parts = [...design.parts].sort((a, b) => BUILD_ORDER.indexOf(a.role) - BUILD_ORDER.indexOf(b.role)).map((p) => p.name ?? p.role);
  const strips: SheetMapStrip[] = [];
  for (const piece of layout.pieces) {
    if (piece.kind !== 'wrap-strip') continue;
    const tiles = sheets.flatMap((sheet) =>
      sheet.placements.flatMap((p) =>
        p.pieceId === piece.id && p.tile && p.tile.count > 1
          ? [{ sheet: sheet.number, number: p.tile.number, fromXMm: p.tile.fromXMm, toXMm: p.tile.toXMm, ...(p.tile.joinLeft ? { joinLeft: p.tile.joinLeft } : {}), ...(p.tile.joinRight ? { joinRight: p.tile.joinRight } : {}) }]
          : [],
      ),
    );
    if (tiles.length === 0) continue;
    tiles.sort((a, b) => a.number - b.number);
    const overlapMm = sheets.flatMap((s) => s.placements).find((p) => p.pieceId === piece.id && p.tile)?.tile?.overlapMm ?? 0;
    const joins = tiles.flatMap((tile, i) => {
      const next = tiles[i + 1];
      if (!tile.joinRight || !next) return [];
      const letter = tile.joinRight;
      return [
        `Join ${letter} onto ${letter}: lay the left end of part ${next.number} (sheet ${next.sheet}) over the right end of part ${tile.number} (sheet ${tile.sheet}) so the two ${letter} crosses sit on each other (${describeLength(overlapMm, text)} overlap), then tape across the join.`,
      ];
    });
    strips.push({ piece: piece.name, totalMm: piece.lengthMm + piece.overlapTabMm, overlapMm, tiles, joins });
  }
  return {
    title: `${design.name}: sheet map`,
    intro: `${sheets.length} sheet${sheets.length === 1 ? '' : 's'} of ${where}, in the order of work: inner parts first (${parts.join(', then ')}). A sheet comes as early as the first piece it holds, so a later part may share an earlier sheet where it fitted. Cut and join each strip's parts before you tape it round its can.`,
    sheets: sheets.map((sheet) => ({ number: sheet.number, contents: describeSheetContents(sheet, layout.pieces) })),
    strips,
    numbering: `Holes are numbered 1 to ${layout.holes.length} in the same order; the build sheet and the hole table (CSV) use the same numbers.`,
  };
}

/** "Burn chamber, bottom; Outer shell, wall: parts 1–2 of 4": a sheet's pieces, a strip's tiles on it together. */
function describeSheetContents(sheet: Sheet, pieces: Layout['pieces']): string {
  const byPiece = new Map<string, { name: string; tiles: number[]; count: number }>();
  for (const p of sheet.placements) {
    const name = pieces.find((piece) => piece.id === p.pieceId)?.name ?? p.pieceId;
    const entry = byPiece.get(p.pieceId) ?? { name, tiles: [], count: p.tile?.count ?? 1 };
    if (p.tile && p.tile.count > 1) entry.tiles.push(p.tile.number);
    byPiece.set(p.pieceId, entry);
  }
  return [...byPiece.values()]
    .map(({ name, tiles, count }) => {
      if (tiles.length === 0) return name;
      const sorted = [...tiles].sort((a, b) => a - b);
      const parts = sorted.length === 1 ? `part ${sorted[0]}` : `parts ${sorted[0]}–${sorted[sorted.length - 1]}`;
      return `${name}: ${parts} of ${count}`;
    })
    .join('; ');
}

/** Height of a strip's tile drawing on the map, with the staggered tiles and their letters. */
const DRAWING_MM = 22;

/**
 * Draws the sheet map from item `from` on (the sheet lines, then each tiled strip), and answers
 * the first item that did not fit the page (the item count when all did), for a next page.
 */
export function drawSheetMap(ctx: DrawingContext, content: SheetMapContent, page: { widthMm: number; heightMm: number; marginMm: number }, from = 0): number {
  const write = pageWriter(ctx, page);
  const bottom = page.heightMm - page.marginMm - 2;
  const left = page.marginMm;
  const width = page.widthMm - 2 * page.marginMm;
  if (from === 0) {
    write.line(content.title, { ...type.title, sizeMm: 5.2 }, 0, 8);
    write.line(content.intro);
    write.line(content.numbering);
    write.heading('Sheets');
  } else write.line(`${content.title} (continued)`, { ...type.title, sizeMm: 4 }, 0, 6);

  const items = sheetMapItems(content);
  let item = from;
  for (; item < items.length; item++) {
    const next = items[item]!;
    if (next.kind === 'sheet') {
      if (write.y + 4.6 > bottom) break;
      write.line(`Sheet ${next.sheet.number}: ${next.sheet.contents}`, type.label, 3);
      continue;
    }
    const { strip } = next;
    const needed = 12 + DRAWING_MM + strip.joins.length * 9.2;
    if (write.y + needed > bottom && item > from) break;
    if (next.first) write.heading('How the parts of a strip join');
    else write.y += 2;
    write.line(`${strip.piece}: ${strip.tiles.length} parts`, { ...type.label, weight: 'bold' });
    drawTiles(ctx, strip, left + 3, write.y, width - 6);
    write.y += DRAWING_MM;
    for (const join of strip.joins) write.line(join, type.label, 3);
  }
  return item;
}

type SheetMapItem = { kind: 'sheet'; sheet: SheetMapContent['sheets'][number] } | { kind: 'strip'; strip: SheetMapStrip; first: boolean };

export function sheetMapItems(content: SheetMapContent): SheetMapItem[] {
  return [...content.sheets.map((sheet) => ({ kind: 'sheet' as const, sheet })), ...content.strips.map((strip, i) => ({ kind: 'strip' as const, strip, first: i === 0 }))];
}

/**
 * The tiles of one strip to scale along its length, every other one set lower, so each shared band
 * shows as the part two sheets lie over each other; each band carries its join letter, each tile
 * its sheet number.
 */
function drawTiles(ctx: DrawingContext, strip: SheetMapStrip, x: number, y: number, widthMm: number): void {
  const scale = widthMm / strip.totalMm;
  const boxHeight = 11;
  strip.tiles.forEach((tile, i) => {
    const top = y + (i % 2) * 4;
    const x0 = x + tile.fromXMm * scale;
    const x1 = x + tile.toXMm * scale;
    ctx.rect(x0, top, x1 - x0, boxHeight, { stroke: strokes.cut, fill: 'paper' });
    const own0 = tile.joinLeft ? tile.fromXMm + strip.overlapMm : tile.fromXMm;
    const own1 = tile.joinRight ? tile.toXMm - strip.overlapMm : tile.toXMm;
    ctx.text(x + ((own0 + own1) / 2) * scale, top + 6.8, `Part ${tile.number} · sheet ${tile.sheet}`, { ...type.label, anchor: 'middle' });
  });
  // Bands over the boxes: hatched where two sheets overlap, the letter above.
  strip.tiles.forEach((tile) => {
    if (!tile.joinRight) return;
    const b0 = x + (tile.toXMm - strip.overlapMm) * scale;
    const b1 = x + tile.toXMm * scale;
    ctx.rect(b0, y, b1 - b0, boxHeight + 4, { stroke: strokes.guide });
    for (let hx = b0 + 1; hx < b1; hx += 1.2) ctx.line(hx, y + 0.4, hx, y + boxHeight + 3.6, { widthMm: 0.15, color: 'guide' });
    ctx.text((b0 + b1) / 2, y + boxHeight + 4 + 3.4, `${tile.joinRight} onto ${tile.joinRight}`, { ...type.small, anchor: 'middle', weight: 'bold', color: 'ink' });
  });
}
