export type { Imposition, Orientation, PaperId, PaperSize, Placement, Rect, Sheet, SheetFurniture, StripTile } from './imposition-types.ts';
export {
  describeSheet,
  MAX_MARGIN_MM,
  MIN_MARGIN_MM,
  orientationSchema,
  paperIds,
  paperIdSchema,
  paperSizes,
  printOptionsSchema,
  sheetSize,
  type PrintOptions,
  type PrintOptionsInput,
} from './paper.ts';
export {
  CHECK_SQUARES_MM,
  DRILL_LEGEND_MM,
  FURNITURE_GAP_MM,
  layoutFurniture,
  NOTES_HEIGHT_MM,
  RULER_LENGTH_MM,
  RULER_WIDTH_MM,
  TITLE_BLOCK_MM,
  type FurnitureLayout,
} from './furniture.ts';
export { checkImposable, imposePieces, ImpositionError, MAX_SHEETS, PLACEMENT_GAP_MM } from './impose.ts';
export { DISC_LABEL_MM, FOOT_BAND_MM, LABEL_BAND_MM, measurePiece } from './footprint.ts';
export { countTiles, nameJoin, splitStrip, TILE_OVERLAP_MM } from './tile-strip.ts';
export { packShelves, type PackedItem, type PackItem } from './pack-shelves.ts';
export { suggestPaperFix, type PaperFix } from './suggest-paper-fix.ts';
