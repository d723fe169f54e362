import type { KeepOut } from '../design/design-schema.ts';
import { arcSpanDeg, normalizeDeg } from './angles.ts';

export interface Arc {
  startDeg: number;
  spanDeg: number;
}

/**
 * The parts of the circle outside every keep-out, as arcs counter-clockwise from their start,
 * ordered starting with the first arc at or after `fromDeg`.
 */
export function findFreeArcs(keepOuts: KeepOut[], fromDeg = 0): Arc[] {
  if (keepOuts.length === 0) return [{ startDeg: normalizeDeg(fromDeg), spanDeg: 360 }];
  const intervals: [number, number][] = [];
  for (const keepOut of keepOuts) {
    const start = normalizeDeg(keepOut.startDeg);
    const end = start + arcSpanDeg(keepOut.startDeg, keepOut.endDeg);
    if (end <= 360) intervals.push([start, end]);
    else intervals.push([start, 360], [0, end - 360]);
  }
  intervals.sort((a, b) => a[0] - b[0]);
  const merged: [number, number][] = [];
  for (const [start, end] of intervals) {
    const last = merged[merged.length - 1];
    if (last && start <= last[1]) last[1] = Math.max(last[1], end);
    else merged.push([start, end]);
  }
  const arcs: Arc[] = [];
  for (let i = 0; i < merged.length; i++) {
    const end = merged[i]![1];
    const nextStart = i + 1 < merged.length ? merged[i + 1]![0] : merged[0]![0] + 360;
    if (nextStart - end > 1e-9) arcs.push({ startDeg: normalizeDeg(end), spanDeg: nextStart - end });
  }
  const from = normalizeDeg(fromDeg);
  return arcs.sort((a, b) => normalizeDeg(a.startDeg - from) - normalizeDeg(b.startDeg - from));
}
