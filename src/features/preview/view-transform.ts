/**
 * Where the drawing sits on screen: sheet mm map to CSS pixels as px = mm * scale + offset.
 * The canvas context multiplies by devicePixelRatio on top, so views stay in CSS pixels.
 */
export interface ViewTransform {
  /** CSS pixels per mm. */
  scale: number;
  offsetX: number;
  offsetY: number;
}

/** Zoom limits in CSS px per mm: a can-sized strip still shows at 0.2, a 1/16 in hole fills a phone at 60. */
export const MIN_SCALE = 0.2;
export const MAX_SCALE = 60;

/**
 * Scales by `factor` about the screen point (px, py), so the mm under it stays put. A view
 * already past a limit (a fit on a tiny screen) may stay there but not go further.
 */
export function zoomAt(view: ViewTransform, factor: number, px: number, py: number): ViewTransform {
  const scale = Math.min(Math.max(MAX_SCALE, view.scale), Math.max(Math.min(MIN_SCALE, view.scale), view.scale * factor));
  const applied = scale / view.scale;
  return { scale, offsetX: px - (px - view.offsetX) * applied, offsetY: py - (py - view.offsetY) * applied };
}

/** Moves the drawing by (dx, dy) CSS pixels. */
export function panView(view: ViewTransform, dx: number, dy: number): ViewTransform {
  return { scale: view.scale, offsetX: view.offsetX + dx, offsetY: view.offsetY + dy };
}

/** The sheet point under a screen point. */
export function screenToMm(view: ViewTransform, px: number, py: number): [number, number] {
  return [(px - view.offsetX) / view.scale, (py - view.offsetY) / view.scale];
}
