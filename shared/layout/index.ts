export type { AirflowSummary, DiscPiece, Finding, GroupTotal, Hole, Layout, Mark, Piece, Severity, WrapStripPiece } from './layout-types.ts';
export { countRequestedHoles, layoutDesign, layoutDocument, type LayoutResult } from './layout-design.ts';
export { formatHoleCsv, HOLE_CSV_HEADER } from './hole-csv.ts';
export { OVERLAP_TAB_MM } from './build-pieces.ts';
export { placeSideRow } from './side-row.ts';
export { planRings, placeEndPattern } from './end-pattern.ts';
export { solveJetCount, type JetCountAnswer } from './solve-jets.ts';
export { placeNextRing, placeNextRowHeight } from './place-next.ts';
export { describePosition, describeRowPositions } from './describe-row.ts';
