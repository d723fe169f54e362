/** Sheets of paper and what goes where on them. All mm, sheet origin top-left, y down. */

export type PaperId = 'letter' | 'legal' | 'tabloid' | 'a4' | 'a3';
export type Orientation = 'portrait' | 'landscape';

export interface PaperSize {
  id: PaperId;
  name: string;
  /** Portrait width and height. */
  widthMm: number;
  heightMm: number;
}

export interface Rect {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** Fixed furniture of every kit sheet: rulers on both axes, check squares, title, legend, notes. */
export interface SheetFurniture {
  /** Horizontal calibration ruler (100 mm and 4 in) along the bottom. */
  rulerX: Rect;
  /** Vertical calibration ruler along the left side. */
  rulerY: Rect;
  /** The 1 in and 25 mm check squares. */
  checkSquares: Rect;
  titleBlock: Rect;
  drillLegend: Rect;
  /** "Print at 100 %..." and the safety line. */
  notes: Rect;
}

/** Which part of a wrap strip a sheet shows, when the strip is longer than the sheet. */
export interface StripTile {
  /** 1-based. */
  number: number;
  count: number;
  /** Strip x range shown on this tile (the tab past the strip end counts as strip x > length). */
  fromXMm: number;
  toXMm: number;
  /** Join letters: this tile's left edge joins the previous tile's right edge at `left`. */
  joinLeft?: string;
  joinRight?: string;
  /** Width of the band shared with the neighbouring tile, where the alignment marks are. */
  overlapMm: number;
}

export interface Placement {
  pieceId: string;
  /** The area the piece and its labels take on the sheet. */
  rect: Rect;
  /** Sheet coordinates of the piece's origin: strip x = 0, y = 0 (bottom edge) / disc centre. */
  originX: number;
  originY: number;
  tile?: StripTile;
}

export interface Sheet {
  /** 1-based. */
  number: number;
  paper: PaperSize;
  orientation: Orientation;
  widthMm: number;
  heightMm: number;
  marginMm: number;
  furniture: SheetFurniture;
  /** Where pieces may go: the printable area less the furniture. */
  content: Rect;
  placements: Placement[];
}

export interface Imposition {
  sheets: Sheet[];
}
