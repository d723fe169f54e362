import type { HoleGroup, PartRole } from '../design/design-schema.ts';
import type { PlacedPart } from './assembly.ts';
import type { CollarRange } from './collar.ts';

/**
 * The result of laying out a design: plain data in millimetres. The preview, the PDF and the
 * SVG all draw this same value, so what the maker sees is what prints.
 */

/**
 * The wall of a vessel unrolled: x along the strip from the seam. Hole y is measured up from the
 * can's bottom; a strip covers the band fromYMm..toYMm of the wall and lines up with one edge of
 * the can (its bottom, or its top rim for a band of jets on a tall can).
 */
export interface WrapStripPiece {
  kind: 'wrap-strip';
  id: string;
  partId: string;
  role: PartRole;
  name: string;
  /** pi x (D + paper thickness): the paper's centre line round the can. */
  lengthMm: number;
  /** toYMm - fromYMm. */
  heightMm: number;
  fromYMm: number;
  toYMm: number;
  /** The can edge this strip's edge is set level with. */
  reference: 'bottom' | 'top';
  vesselHeightMm: number;
  vesselDiameterMm: number;
  /** Extra paper past the end, to tape over the start. */
  overlapTabMm: number;
  seamAngleDeg: number;
  /** How far a hole mark (circle and crosshair) reaches from its centre, at most: room kept at the strip's ends. */
  markReachMm: number;
}

/** A can end (bottom or lid): x, y from its centre, y towards the index mark's side. */
export interface DiscPiece {
  kind: 'disc';
  id: string;
  partId: string;
  role: PartRole;
  name: string;
  face: 'bottom' | 'lid';
  /** The paper disc is cut to the usable flat end, inside the rim. */
  diameterMm: number;
  vesselDiameterMm: number;
  /** The index mark sits at this angle; it lines up with the seam on the wall. */
  indexAngleDeg: number;
}

export type Piece = WrapStripPiece | DiscPiece;

export interface Hole {
  id: string;
  pieceId: string;
  group: HoleGroup;
  /** The side row or end pattern the hole belongs to. */
  sourceId: string;
  index: number;
  xMm: number;
  yMm: number;
  diameterMm: number;
  drillId: string;
  drillLabel: string;
  /** Around the wall (strips) or from the index mark (discs), degrees. */
  angleDeg: number;
  /** Discs only: distance from the centre. */
  radiusMm?: number;
}

/** Construction and reference marks the templates draw. */
export type Mark =
  | { kind: 'seam-line'; pieceId: string; xMm: number }
  | { kind: 'row-line'; pieceId: string; sourceId: string; label: string; yMm: number }
  | { kind: 'ring-circle'; pieceId: string; sourceId: string; label: string; radiusMm: number }
  | { kind: 'centre-cross'; pieceId: string }
  /** A circle to cut out whole: a flame concentrator's opening. */
  | { kind: 'opening-circle'; pieceId: string; radiusMm: number }
  | { kind: 'index-mark'; pieceId: string; angleDeg: number }
  /** An intake collar's scale along its top edge: read against the shell's seam (shared/layout/collar.ts). */
  | { kind: 'collar-scale'; pieceId: string; ticks: { xMm: number; label: string; fraction: number }[] };

export type Severity = 'error' | 'warning' | 'note';

export interface Finding {
  rule: string;
  severity: Severity;
  /** One line: what is wrong and why it matters. */
  message: string;
  numbers: Record<string, number>;
  holeIds: string[];
  pieceId?: string;
  /** The parts a finding across parts is about (the fit of a chamber in its shell names both). */
  partIds?: string[];
}

export interface GroupTotal {
  group: HoleGroup;
  holeCount: number;
  openAreaMm2: number;
  sizes: { drillId: string; drillLabel: string; diameterMm: number; count: number }[];
}

export interface AirflowSummary {
  primaryAreaMm2: number;
  secondaryAreaMm2: number;
  /** primary / secondary, or null without secondary holes. */
  ratio: number | null;
  targetRatio: number;
}

export interface Layout {
  designName: string;
  pieces: Piece[];
  holes: Hole[];
  marks: Mark[];
  groups: GroupTotal[];
  airflow: AirflowSummary;
  findings: Finding[];
  /** Where each part stands in the put-together stove (shared/layout/assembly.ts). */
  assembly: PlacedPart[];
  /** The intake range each intake collar gives (its holes are not in `groups`). */
  collars: CollarRange[];
}
