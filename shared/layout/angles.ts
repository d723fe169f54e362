/** Angle helpers, in degrees. */

export function normalizeDeg(deg: number): number {
  const r = deg % 360;
  return r < 0 ? r + 360 : r;
}

/** Length of the arc from start counter-clockwise to end, 0 to 360. */
export function arcSpanDeg(startDeg: number, endDeg: number): number {
  const span = normalizeDeg(endDeg - startDeg);
  return span === 0 && endDeg !== startDeg ? 360 : span;
}

/** True when angle lies on the arc from start counter-clockwise to end (ends included). */
export function isOnArc(angleDeg: number, startDeg: number, endDeg: number): boolean {
  return normalizeDeg(angleDeg - startDeg) <= arcSpanDeg(startDeg, endDeg);
}

/** Shortest angular distance between two angles, 0 to 180. */
export function angularDistanceDeg(a: number, b: number): number {
  const d = normalizeDeg(a - b);
  return d > 180 ? 360 - d : d;
}

export const degToRad = (deg: number) => (deg * Math.PI) / 180;
