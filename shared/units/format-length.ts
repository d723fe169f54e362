import { convertMmToInches } from './length.ts';
import type { UnitSystem } from './length.ts';

/** A mixed number such as 1 5/8, reduced; a whole number has numerator 0 and denominator 1. */
export interface Fraction {
  whole: number;
  numerator: number;
  denominator: number;
}

const findGcd = (a: number, b: number): number => (b === 0 ? a : findGcd(b, a % b));

/**
 * Rounds inches to the nearest 1/denominator and reduces it (0.1875 -> 3/16).
 * A negative value carries its sign on both whole and numerator (-1 5/8 -> whole -1, numerator -5).
 */
export function nearestFraction(inches: number, denominator = 64): Fraction {
  const den = Math.max(1, Math.round(denominator));
  const steps = Math.round(Math.abs(inches) * den);
  const sign = inches < 0 && steps > 0 ? -1 : 1;
  const remainder = steps % den;
  const gcd = findGcd(remainder, den);
  return {
    whole: sign * Math.floor(steps / den) || 0,
    numerator: sign * (remainder / gcd) || 0,
    denominator: remainder === 0 ? 1 : den / gcd,
  };
}

/** Writes a fraction the way drills are marked: "3/16", "1 5/8", "2", "0". */
export function formatFraction({ whole, numerator, denominator }: Fraction): string {
  const sign = whole < 0 || numerator < 0 ? '-' : '';
  const wholePart = Math.abs(whole);
  const fractionPart = `${Math.abs(numerator)}/${denominator}`;
  if (numerator === 0) return `${sign}${wholePart}`;
  return wholePart === 0 ? `${sign}${fractionPart}` : `${sign}${wholePart} ${fractionPart}`;
}

/** To the nearest 1/64 in, the finest step of a fractional drill set: 4.7625 -> "3/16 in". */
export function formatInches(mm: number): string {
  if (!Number.isFinite(mm)) return `${mm} in`;
  return `${formatFraction(nearestFraction(convertMmToInches(mm), 64))} in`;
}

/** To 0.01 mm, trailing zeros dropped: 4.7625 -> "4.76 mm", 5 -> "5 mm", 4.8 -> "4.8 mm". */
export function formatMm(mm: number): string {
  if (!Number.isFinite(mm)) return `${mm} mm`;
  const text = mm.toFixed(2).replace(/\.?0+$/, '');
  return `${text === '-0' ? '0' : text} mm`;
}

export function formatLength(mm: number, units: UnitSystem): string {
  return units === 'in' ? formatInches(mm) : formatMm(mm);
}
