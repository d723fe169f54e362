export type { AirflowSummary, DiscPiece, Finding, GroupTotal, Hole, Layout, Mark, Piece, Severity, WrapStripPiece } from './layout-types.ts';
export { countRequestedHoles, layoutDesign, layoutDocument, type LayoutResult } from './layout-design.ts';
export { formatHoleCsv, HOLE_CSV_HEADER } from './hole-csv.ts';
export { OVERLAP_TAB_MM } from './build-pieces.ts';
export { placeSideRow } from './side-row.ts';
export { planRings, placeEndPattern } from './end-pattern.ts';
