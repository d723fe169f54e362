import { numberHoles } from './hole-numbers.ts';
import type { Layout } from './layout-types.ts';

export const HOLE_CSV_HEADER = 'number,piece,group,index,x_mm,y_mm,diameter_mm,drill,piece_name,row';

/**
 * The hole table for makers who mark out with a CNC or a drawing program (RFC 4180 CSV):
 * strips from the seam and the bottom edge, discs from their centre, all in mm. Rows come in the
 * kit's order of work and `number` is the hole number printed on the template and the build
 * sheet; the names (last, as they may hold commas) are the ones the templates print.
 */
export function formatHoleCsv(layout: Pick<Layout, 'pieces' | 'holes' | 'marks'>): string {
  const names = new Map(layout.pieces.map((p) => [p.id, p.name]));
  const lines = [HOLE_CSV_HEADER];
  for (const { hole, number, rowName } of numberHoles(layout)) {
    lines.push(
      [number, hole.pieceId, hole.group, hole.index, fixed(hole.xMm), fixed(hole.yMm), fixed(hole.diameterMm), hole.drillLabel, names.get(hole.pieceId) ?? hole.pieceId, rowName]
        .map(csvField)
        .join(','),
    );
  }
  return lines.join('\r\n') + '\r\n';
}

const fixed = (value: number) => (Math.abs(value) < 5e-5 ? 0 : value).toFixed(4);

function csvField(value: string | number): string {
  const text = String(value);
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}
