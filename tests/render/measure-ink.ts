import type { RasterImage } from '../helpers/rasterize-pdf.ts';

/**
 * Measuring marks on a rendered page, in sheet mm. Ink is 1 - grey level, so anti-aliased edge
 * pixels count by how much of them is covered: line ends come out to a fraction of a pixel.
 */
export interface RectMm {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** Pixels a mm at a resolution: 25.4 mm an inch (by definition, ISO 31-1). */
export const pxPerMm = (dpi: number): number => dpi / 25.4;

export function inkAt(image: RasterImage, col: number, row: number): number {
  const i = (row * image.width + col) * 4;
  const grey = ((image.data[i] ?? 255) + (image.data[i + 1] ?? 255) + (image.data[i + 2] ?? 255)) / 3;
  return 1 - grey / 255;
}

/** Pixel index range [first, last) that a mm range covers, clipped to the image. */
function pixelRange(fromMm: number, toMm: number, scale: number, size: number): [number, number] {
  return [Math.max(0, Math.floor(fromMm * scale)), Math.min(size, Math.ceil(toMm * scale))];
}

/**
 * A straight line along x (or y when `vertical`) inside `rect`: where its ends are and where its
 * centre line is, in mm. Column coverage is the column's ink over a fully covered column's.
 */
export function measureLine(image: RasterImage, dpi: number, rect: RectMm, vertical = false): { startMm: number; endMm: number; acrossMm: number } {
  const s = pxPerMm(dpi);
  const [a0, a1] = vertical ? pixelRange(rect.y, rect.y + rect.height, s, image.height) : pixelRange(rect.x, rect.x + rect.width, s, image.width);
  const [b0, b1] = vertical ? pixelRange(rect.x, rect.x + rect.width, s, image.width) : pixelRange(rect.y, rect.y + rect.height, s, image.height);
  const profile: number[] = [];
  let inkSum = 0;
  let weighted = 0;
  for (let a = a0; a < a1; a++) {
    let column = 0;
    for (let b = b0; b < b1; b++) {
      const ink = vertical ? inkAt(image, b, a) : inkAt(image, a, b);
      column += ink;
      weighted += ink * (b + 0.5);
    }
    inkSum += column;
    profile.push(column);
  }
  const full = [...profile].sort((p, q) => p - q)[Math.floor(profile.length * 0.75)] ?? 0;
  if (full <= 0) throw new Error('No line found');
  const cover = profile.map((p) => Math.min(1, p / full));
  const firstFull = cover.findIndex((c) => c > 0.98);
  const lastFull = cover.length - 1 - [...cover].reverse().findIndex((c) => c > 0.98);
  const before = cover.slice(0, firstFull).reduce((sum, c) => sum + c, 0);
  const after = cover.slice(lastFull + 1).reduce((sum, c) => sum + c, 0);
  return {
    startMm: (a0 + firstFull - before) / s,
    endMm: (a0 + lastFull + 1 + after) / s,
    acrossMm: weighted / inkSum / s,
  };
}

/** Ink-weighted centre of everything inside `rect` (a ring's centre is its circle's centre). */
export function inkCentroid(image: RasterImage, dpi: number, rect: RectMm): { x: number; y: number; ink: number } {
  const s = pxPerMm(dpi);
  const [c0, c1] = pixelRange(rect.x, rect.x + rect.width, s, image.width);
  const [r0, r1] = pixelRange(rect.y, rect.y + rect.height, s, image.height);
  let ink = 0;
  let sx = 0;
  let sy = 0;
  for (let r = r0; r < r1; r++) {
    for (let c = c0; c < c1; c++) {
      const v = inkAt(image, c, r);
      ink += v;
      sx += v * (c + 0.5);
      sy += v * (r + 0.5);
    }
  }
  return { x: ink > 0 ? sx / ink / s : NaN, y: ink > 0 ? sy / ink / s : NaN, ink };
}

/** Bounds (mm) of the pixels inside `rect` that are at least half inked, or null if none. */
export function inkBounds(image: RasterImage, dpi: number, rect: RectMm): RectMm | null {
  const s = pxPerMm(dpi);
  const [c0, c1] = pixelRange(rect.x, rect.x + rect.width, s, image.width);
  const [r0, r1] = pixelRange(rect.y, rect.y + rect.height, s, image.height);
  let [minC, minR, maxC, maxR] = [Infinity, Infinity, -Infinity, -Infinity];
  for (let r = r0; r < r1; r++) {
    for (let c = c0; c < c1; c++) {
      if (inkAt(image, c, r) < 0.5) continue;
      minC = Math.min(minC, c);
      maxC = Math.max(maxC, c);
      minR = Math.min(minR, r);
      maxR = Math.max(maxR, r);
    }
  }
  if (minC === Infinity) return null;
  return { x: minC / s, y: minR / s, width: (maxC + 1 - minC) / s, height: (maxR + 1 - minR) / s };
}
