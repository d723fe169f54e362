export { unitSystems, MM_PER_INCH, convertInchesToMm, convertMmToInches } from './length.ts';
export type { UnitSystem } from './length.ts';
export { parseLength } from './parse-length.ts';
export type { ParseLengthResult } from './parse-length.ts';
export { formatFraction, formatInches, formatLength, formatMm, nearestFraction } from './format-length.ts';
export type { Fraction } from './format-length.ts';
