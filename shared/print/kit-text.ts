import type { Hole } from '../layout/layout-types.ts';
import { formatInches, formatMm } from '../units/index.ts';
import type { UnitSystem } from '../units/length.ts';

/** Every sentence printed on a kit, in one place (plain English; the maker's units for sizes). */
export interface KitText {
  units: UnitSystem;
  printNote: string;
  safetyNote: string;
  seamStart: string;
  bottomEdge: string;
  topEdge: string;
  tapeTab: string;
  /** Over an intake collar's scale. */
  collarScale: string;
  /** Beside the flag triangle in a sheet's drill legend. */
  flagLegend: string;
  cutOut: string;
  cutOpening: string;
  indexMark: string;
  tile(n: number, of: number): string;
  join(letter: string): string;
  sheet(n: number, of: number): string;
}

export function kitText(units: UnitSystem): KitText {
  return {
    units,
    printNote: 'Print at 100 % / actual size, then measure the ruler before drilling.',
    safetyNote:
      'Safety: eye protection, clamp the can, mind sharp edges; burn off coatings outdoors, never heat galvanized metal; never burn indoors or in a tent (carbon monoxide). Follow local codes.',
    seamStart: 'Start at the seam',
    bottomEdge: 'Bottom edge: level with the bottom of the can',
    topEdge: 'Top edge: level with the rim of the can',
    tapeTab: 'Tape over the start',
    collarScale: 'Intake: turn until the shell’s seam sits under a mark',
    flagLegend: 'a check flagged this hole: see the build sheet',
    cutOut: 'Cut on this line',
    cutOpening: 'Cut out the opening',
    indexMark: 'Line up with the seam',
    tile: (n, of) => `part ${n} of ${of}`,
    join: (letter) => `join ${letter} to ${letter}`,
    sheet: (n, of) => `Sheet ${n} of ${of}`,
  };
}

/** "3/16 in (4.76 mm)" in inch units, "4.76 mm (#13)"-style in mm: the drill's own label always shows. */
export function describeDrill(hole: Pick<Hole, 'drillLabel' | 'diameterMm'>, text: Pick<KitText, 'units'>): string {
  const mm = formatMm(hole.diameterMm);
  if (hole.drillLabel.endsWith(' in')) return text.units === 'in' ? `${hole.drillLabel} (${mm})` : `${mm} (${hole.drillLabel})`;
  if (hole.drillLabel.endsWith(' mm')) return text.units === 'mm' ? hole.drillLabel : `${hole.drillLabel} (${formatInches(hole.diameterMm)})`;
  return `${hole.drillLabel} (${text.units === 'in' ? formatInches(hole.diameterMm) + ', ' : ''}${mm})`;
}

/** A length in the maker's units first, the other in brackets: "2 1/16 in (52 mm)". */
export function describeLength(mm: number, text: Pick<KitText, 'units'>): string {
  return text.units === 'in' ? `${formatInches(mm)} (${formatMm(mm)})` : `${formatMm(mm)} (${formatInches(mm)})`;
}
