/** Angle helpers, in degrees. */

/** An angle in [0, 360). A tiny negative angle wraps to 360 in floating point, so that becomes 0. */
export function normalizeDeg(deg: number): number {
  const r = deg % 360;
  if (r >= 0) return r;
  const wrapped = r + 360;
  return wrapped >= 360 ? 0 : wrapped;
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
