import type { KeepOut, SideRow } from '../design/design-schema.ts';
import { angularDistanceDeg, isOnArc, normalizeDeg } from './angles.ts';
import { findFreeArcs } from './free-arcs.ts';

export interface RowPosition {
  /** Position number in the row (0 = first position), kept when others are dropped or skipped. */
  index: number;
  angleDeg: number;
}

export interface RowGeometry {
  positions: RowPosition[];
  /** Positions that fell inside a keep-out and were dropped. */
  dropped: RowPosition[];
}

/**
 * Where the holes of a side row go around the wall. Equal pitch from startDeg; keep-outs either
 * drop the holes that touch them or re-space every hole over the free arcs.
 */
export function placeSideRow(row: SideRow, holeDiameterMm: number, wallDiameterMm: number): RowGeometry {
  const halfHoleDeg = (holeDiameterMm / 2 / (wallDiameterMm / 2)) * (180 / Math.PI);
  const skipped = new Set(row.skip);
  const candidates = row.keepOutPolicy === 'respace' && row.keepOuts.length > 0 ? respace(row) : equalPitch(row);
  const positions: RowPosition[] = [];
  const dropped: RowPosition[] = [];
  for (const position of candidates) {
    if (skipped.has(position.index)) continue;
    if (row.keepOutPolicy === 'drop' && row.keepOuts.some((keepOut) => touchesKeepOut(position.angleDeg, halfHoleDeg, keepOut))) dropped.push(position);
    else positions.push(position);
  }
  return { positions, dropped };
}

function equalPitch(row: SideRow): RowPosition[] {
  const pitch = 360 / row.count;
  return Array.from({ length: row.count }, (_, index) => ({ index, angleDeg: normalizeDeg(row.startDeg + index * pitch) }));
}

/** All `count` holes share the free arcs at one pitch, half a pitch in from each keep-out edge. */
function respace(row: SideRow): RowPosition[] {
  const arcs = findFreeArcs(row.keepOuts, row.startDeg);
  const free = arcs.reduce((sum, arc) => sum + arc.spanDeg, 0);
  if (free <= 0) return [];
  const pitch = free / row.count;
  const positions: RowPosition[] = [];
  let arcIndex = 0;
  let before = 0; // free degrees in the arcs before arcIndex
  for (let index = 0; index < row.count; index++) {
    const along = (index + 0.5) * pitch;
    while (arcIndex < arcs.length - 1 && along > before + arcs[arcIndex]!.spanDeg) before += arcs[arcIndex++]!.spanDeg;
    positions.push({ index, angleDeg: normalizeDeg(arcs[arcIndex]!.startDeg + (along - before)) });
  }
  return positions;
}

function touchesKeepOut(angleDeg: number, halfHoleDeg: number, keepOut: KeepOut): boolean {
  return (
    isOnArc(angleDeg, keepOut.startDeg, keepOut.endDeg) ||
    angularDistanceDeg(angleDeg, keepOut.startDeg) < halfHoleDeg ||
    angularDistanceDeg(angleDeg, keepOut.endDeg) < halfHoleDeg
  );
}
