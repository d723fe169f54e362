import type { Layout } from './layout-types.ts';

export const HOLE_CSV_HEADER = 'piece,group,index,x_mm,y_mm,diameter_mm,drill';

/**
 * The hole table for makers who mark out with a CNC or a drawing program (RFC 4180 CSV):
 * strips from the seam and the bottom edge, discs from their centre, all in mm.
 */
export function formatHoleCsv(layout: Layout): string {
  const lines = [HOLE_CSV_HEADER];
  for (const hole of layout.holes) {
    lines.push([hole.pieceId, hole.group, hole.index, fixed(hole.xMm), fixed(hole.yMm), fixed(hole.diameterMm), hole.drillLabel].map(csvField).join(','));
  }
  return lines.join('\r\n') + '\r\n';
}

const fixed = (value: number) => (Math.abs(value) < 5e-5 ? 0 : value).toFixed(4);

function csvField(value: string | number): string {
  const text = String(value);
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}
