import type { Part } from '../design/design-schema.ts';
import { resolveDrill, type DrillLookup } from './drill-lookup.ts';

/**
 * A wall strip taller than this is cut into a band at the rim (rows measured from the top) and a
 * band at the bottom, each only as tall as its rows need: a No. 10 can's full wall (178 mm) does
 * not fit a Letter sheet with its rulers, and a short band is easier to tape on straight.
 * Common practice, no source.
 */
export const FULL_STRIP_MAX_MM = 150;
/** Paper kept beyond a band's outermost hole edge, for its crosshairs and label. */
export const BAND_MARGIN_MM = 12;

export interface WallBand {
  fromYMm: number;
  toYMm: number;
  reference: 'bottom' | 'top';
  rows: Part['sideRows'];
}

export const rowHeight = (row: Part['sideRows'][number], vesselHeightMm: number) => (row.height.from === 'bottom' ? row.height.mm : vesselHeightMm - row.height.mm);

/** One full-height strip, or a top band and a bottom band on a tall can whose rows leave a gap. */
export function planWallBands(part: Part, drills: DrillLookup): WallBand[] {
  const H = part.vessel.heightMm;
  const whole: WallBand[] = [{ fromYMm: 0, toYMm: H, reference: 'bottom', rows: part.sideRows }];
  if (H <= FULL_STRIP_MAX_MM) return whole;
  const extent = (rows: Part['sideRows']) =>
    rows.map((row) => {
      const y = rowHeight(row, H);
      const r = resolveDrill(drills, row.drillId).diameterMm / 2;
      return [y - r, y + r] as const;
    });
  const top = part.sideRows.filter((row) => row.height.from === 'top');
  const bottom = part.sideRows.filter((row) => row.height.from === 'bottom');
  const bottomTo = bottom.length ? Math.min(H, Math.max(...extent(bottom).map(([, hi]) => hi)) + BAND_MARGIN_MM) : 0;
  const topFrom = top.length ? Math.max(0, Math.min(...extent(top).map(([lo]) => lo)) - BAND_MARGIN_MM) : H;
  if (bottomTo >= topFrom) return whole;
  const bands: WallBand[] = [];
  if (top.length) bands.push({ fromYMm: topFrom, toYMm: H, reference: 'top', rows: top });
  if (bottom.length) bands.push({ fromYMm: 0, toYMm: bottomTo, reference: 'bottom', rows: bottom });
  return bands;
}
