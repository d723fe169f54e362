import type { Hole } from '../layout/layout-types.ts';
import { printableOrReplaced } from './printable-text.ts';
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
  /** Over the arrow in a strip's label band. */
  wayUp: string;
  /** Beside the wrap check's ticks, under the strip. */
  wrapCheck: string;
  /** Under a strip: its length and the can it was made for. */
  stripLength(length: string, diameter: string, circumference: string): string;
  stripLengthShort(length: string, diameter: string): string;
  /** Which printer profile the kit was scaled for, on every sheet. */
  scaledFor(printer?: { name?: string | undefined; scaleX: number; scaleY: number }): string;
  /** "holes 25–48", after a row's label. */
  holeNumbers(range: string): string;
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
    wayUp: 'This way up, towards the rim',
    wrapCheck: units === 'in' ? 'Wrap check: the start edge meets 0; a tick is 1/16 in across' : 'Wrap check: the start edge meets 0; a tick is 1 mm across',
    stripLength: (length, diameter, circumference) => `Start line to end line ${length}: made for a can ${diameter} across, ${circumference} round`,
    stripLengthShort: (length, diameter) => `${length} long, for a can ${diameter} across`,
    holeNumbers: (range) => `holes ${range}`,
    scaledFor: (printer) => {
      if (!printer) return 'Printer: no profile, drawn at 100 %';
      // Drawn 1 / scale of true size, so the printer's error brings it back to true.
      const factor = (scale: number) => `${((1 / scale) * 100).toFixed(2)} %`;
      const name = printer.name ? `“${printableOrReplaced(printer.name)}”` : 'measured';
      return `Printer: ${name}, drawn ${factor(printer.scaleX)} × ${factor(printer.scaleY)}`;
    },
    tile: (n, of) => `part ${n} of ${of}`,
    join: (letter) => `${letter} onto ${letter}`,
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
