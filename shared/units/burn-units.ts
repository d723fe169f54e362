import type { UnitSystem } from './length.ts';

/** The units a maker reads burn measurements in. The burn log stores grams, degrees Celsius and litres. */
export const massUnits = ['g', 'oz'] as const;
export const temperatureUnits = ['C', 'F'] as const;
export const volumeUnits = ['L', 'qt'] as const;
export type MassUnit = (typeof massUnits)[number];
export type TemperatureUnit = (typeof temperatureUnits)[number];
export type VolumeUnit = (typeof volumeUnits)[number];

export interface BurnUnits {
  mass: MassUnit;
  temperature: TemperatureUnit;
  volume: VolumeUnit;
}

/** The avoirdupois ounce is defined as exactly 28.349 523 125 g; the US liquid quart as exactly 0.946 352 946 L. */
export const GRAMS_PER_OUNCE = 28.349523125;
export const LITRES_PER_QUART = 0.946352946;

/** Until a maker chooses, burn units follow the length units: inches read ounces, degF and quarts. */
export function defaultBurnUnits(lengths: UnitSystem): BurnUnits {
  return lengths === 'in' ? { mass: 'oz', temperature: 'F', volume: 'qt' } : { mass: 'g', temperature: 'C', volume: 'L' };
}

export const unitLabels = { g: 'g', oz: 'oz', C: '°C', F: '°F', L: 'L', qt: 'qt' } as const;

export const massToShown = (grams: number, unit: MassUnit) => (unit === 'g' ? grams : grams / GRAMS_PER_OUNCE);
export const massFromShown = (value: number, unit: MassUnit) => (unit === 'g' ? value : value * GRAMS_PER_OUNCE);
export const temperatureToShown = (celsius: number, unit: TemperatureUnit) => (unit === 'C' ? celsius : (celsius * 9) / 5 + 32);
export const temperatureFromShown = (value: number, unit: TemperatureUnit) => (unit === 'C' ? value : ((value - 32) * 5) / 9);
export const volumeToShown = (litres: number, unit: VolumeUnit) => (unit === 'L' ? litres : litres / LITRES_PER_QUART);
export const volumeFromShown = (value: number, unit: VolumeUnit) => (unit === 'L' ? value : value * LITRES_PER_QUART);

/** Shown with the precision a kitchen scale or thermometer gives: whole grams and degrees, tenths of ounces and litres. */
export function formatMeasure(value: number, unit: MassUnit | TemperatureUnit | VolumeUnit): string {
  const digits = unit === 'g' || unit === 'C' || unit === 'F' ? 0 : unit === 'oz' ? 1 : 2;
  const rounded = Number(value.toFixed(digits));
  return `${rounded.toLocaleString('en', { maximumFractionDigits: digits })} ${unitLabels[unit]}`;
}

/** Seconds as m:ss, or h:mm:ss past an hour. */
export function formatDuration(seconds: number): string {
  const whole = Math.max(0, Math.round(seconds));
  const h = Math.floor(whole / 3600);
  const m = Math.floor((whole % 3600) / 60);
  const s = whole % 60;
  const pad = (n: number) => String(n).padStart(2, '0');
  return h > 0 ? `${h}:${pad(m)}:${pad(s)}` : `${m}:${pad(s)}`;
}

/** Reads "7:30", "7m30s", "450 s", "7.5 min" or a bare number of minutes; null when it is none of these. */
export function parseDuration(text: string): number | null {
  const t = text.trim().toLowerCase();
  if (t === '') return null;
  const clock = /^(?:(\d+):)?(\d+):(\d{1,2})$/.exec(t);
  if (clock) {
    const [, h, m, s] = clock;
    if (Number(s) >= 60 || (h !== undefined && Number(m) >= 60)) return null;
    return Number(h ?? 0) * 3600 + Number(m) * 60 + Number(s);
  }
  const parts = /^(?:(\d+(?:\.\d+)?)\s*h)?\s*(?:(\d+(?:\.\d+)?)\s*m(?:in)?)?\s*(?:(\d+(?:\.\d+)?)\s*s(?:ec)?)?$/.exec(t);
  if (parts && (parts[1] || parts[2] || parts[3])) return Math.round(Number(parts[1] ?? 0) * 3600 + Number(parts[2] ?? 0) * 60 + Number(parts[3] ?? 0));
  if (/^\d+(?:\.\d+)?$/.test(t)) return Math.round(Number(t) * 60);
  return null;
}
