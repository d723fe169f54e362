import { parseLength } from '../units/parse-length.ts';
import type { Drill, DrillSeries } from './drill.ts';
import { allDrills, findDrill } from './series.ts';

// "#7", "no 7", "No. 7", "num 7", "number 7", "7 (number)", "#7 drill".
const NUMBER_DRILL = /^(?:#|no\.?|num\.?|number)\s*(\d{1,2})(?:\s*drill)?$|^(\d{1,2})\s*\((?:#|no\.?|number)\)$/;
// "F", "letter F", "F drill", "letter F drill".
const LETTER_DRILL = /^(?:letter\s*)?([a-z])(?:\s*drill)?$/;
const METRIC_WORDS = /mm|cm|millimet|centimet/;
// Within a millionth of a millimetre counts as the same size: far below any drill tolerance.
const SAME_SIZE_MM = 1e-6;

function findBySize(mm: number, preferred: readonly DrillSeries[]): Drill | undefined {
  const matches = allDrills().filter((drill) => Math.abs(drill.diameterMm - mm) < SAME_SIZE_MM);
  const rank = (drill: Drill) => preferred.indexOf(drill.series);
  return matches.filter((drill) => rank(drill) >= 0).sort((a, b) => rank(a) - rank(b))[0];
}

/**
 * Reads a drill as a maker names it: "#7", "no 7", "letter F", "F", "3/16", "3/16 in", "4.8 mm".
 * A size must match a drill exactly; inch sizes prefer the fractional series (1/4 in, not letter E).
 * A bare decimal such as "7" or "4.8" is ambiguous (number drill, inches or mm), so it gives undefined.
 */
export function parseDrill(text: string): Drill | undefined {
  const cleaned = String(text ?? '').trim().toLowerCase().replace(/\s+/g, ' ');
  const number = NUMBER_DRILL.exec(cleaned);
  if (number) return findDrill(`num:${Number(number[1] ?? number[2])}`);
  const letter = LETTER_DRILL.exec(cleaned);
  if (letter?.[1]) return findDrill(`let:${letter[1].toUpperCase()}`);

  const isMetric = METRIC_WORDS.test(cleaned);
  const hasUnit = isMetric || /in|["'\u2033\u201C\u201D]/.test(cleaned);
  const isFraction = /[/\u2044\u2215½¼¾⅛⅜⅝⅞]/.test(cleaned);
  if (!hasUnit && !isFraction) return undefined;
  const length = parseLength(cleaned, 'in');
  if (!length.ok) return undefined;
  return findBySize(length.mm, isMetric ? ['metric'] : ['fractional', 'number', 'letter']);
}
