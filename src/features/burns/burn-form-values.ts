import { flameRingWords, type Burn, type BurnFields, type smokeLevels, type windLevels } from '../../../shared/burns/burn-schema.ts';
import {
  formatDuration,
  massFromShown,
  massToShown,
  parseDuration,
  temperatureFromShown,
  temperatureToShown,
  volumeFromShown,
  volumeToShown,
  type BurnUnits,
} from '../../../shared/units/burn-units.ts';

/** What the entry form holds: text as typed, in the maker's units. */
export interface BurnFormValues {
  date: string;
  fuelKind: string;
  fuelMass: string;
  starter: string;
  ambient: string;
  wind: '' | (typeof windLevels)[number];
  windscreen: '' | 'yes' | 'no';
  windFacing: string;
  timeToLight: string;
  timeToJets: string;
  timeToBoil: string;
  boilWater: string;
  boilStart: string;
  burnTime: string;
  char: string;
  smoke: '' | (typeof smokeLevels)[number];
  flameRing: string;
  notes: string;
}

export type BurnFormErrors = Partial<Record<keyof BurnFormValues, string>>;

const pad = (n: number) => String(n).padStart(2, '0');
/** A datetime-local value in the browser's own time zone. */
export function toLocalInput(iso: string): string {
  const d = new Date(iso);
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}T${pad(d.getHours())}:${pad(d.getMinutes())}`;
}

const shown = (value: number | null | undefined, convert: (v: number) => number, digits: number) => (value === null || value === undefined ? '' : String(Number(convert(value).toFixed(digits))));
const shownDuration = (seconds: number | null | undefined) => (seconds === null || seconds === undefined ? '' : formatDuration(seconds));

export function emptyFormValues(now: Date = new Date()): BurnFormValues {
  return {
    date: toLocalInput(now.toISOString()),
    fuelKind: '', fuelMass: '', starter: '', ambient: '', wind: '', windscreen: '', windFacing: '',
    timeToLight: '', timeToJets: '', timeToBoil: '', boilWater: '', boilStart: '', burnTime: '', char: '',
    smoke: '', flameRing: '', notes: '',
  };
}

export function formValuesOf(burn: Partial<Burn> & { date: string }, units: BurnUnits): BurnFormValues {
  return {
    date: toLocalInput(burn.date),
    fuelKind: burn.fuelKind ?? '',
    fuelMass: shown(burn.fuelMassG, (g) => massToShown(g, units.mass), units.mass === 'g' ? 0 : 1),
    starter: burn.starter ?? '',
    ambient: shown(burn.ambientC, (c) => temperatureToShown(c, units.temperature), 0),
    wind: burn.wind ?? '',
    windscreen: burn.windscreen === true ? 'yes' : burn.windscreen === false ? 'no' : '',
    windFacing: burn.windFacing ?? '',
    timeToLight: shownDuration(burn.timeToLightS),
    timeToJets: shownDuration(burn.timeToJetsS),
    timeToBoil: shownDuration(burn.timeToBoilS),
    boilWater: shown(burn.boilWaterL, (l) => volumeToShown(l, units.volume), 2),
    boilStart: shown(burn.boilStartC, (c) => temperatureToShown(c, units.temperature), 0),
    burnTime: shownDuration(burn.burnTimeS),
    char: shown(burn.charG, (g) => massToShown(g, units.mass), units.mass === 'g' ? 0 : 1),
    smoke: burn.smoke ?? '',
    flameRing: burn.flameRing ? String(burn.flameRing) : '',
    notes: burn.notes ?? '',
  };
}

type Parsed = { ok: true; date: string; fields: BurnFields } | { ok: false; errors: BurnFormErrors };

/**
 * Reads the form into SI fields, each mistake said in the maker's words; an empty box is "not
 * measured" (null), so clearing a box clears the value.
 */
export function readFormValues(values: BurnFormValues, units: BurnUnits): Parsed {
  const errors: BurnFormErrors = {};
  const number = (key: keyof BurnFormValues, toSi: (v: number) => number, min: number, max: number, unitWord: string): number | null => {
    const text = values[key].trim().replace(',', '.');
    if (text === '') return null;
    const value = Number(text);
    if (!Number.isFinite(value)) {
      errors[key] = `Type a number${unitWord ? ` in ${unitWord}` : ''}, such as 12.`;
      return null;
    }
    const si = toSi(value);
    if (si < min - 1e-9 || si > max + 1e-9) {
      errors[key] = `That is outside what a can stove test gives${unitWord ? ` (in ${unitWord})` : ''}. Check the number.`;
      return null;
    }
    return si;
  };
  const duration = (key: keyof BurnFormValues): number | null => {
    const text = values[key].trim();
    if (text === '') return null;
    const seconds = parseDuration(text);
    if (seconds === null) {
      errors[key] = 'Type minutes and seconds, such as 7:30, or minutes, such as 7.5.';
      return null;
    }
    if (seconds > 36_000) {
      errors[key] = 'That is over ten hours. Check the time.';
      return null;
    }
    return seconds;
  };
  const text = (key: keyof BurnFormValues, max = 80): string | null => {
    const value = values[key].trim();
    if (value.length > max) errors[key] = `Keep this under ${max} characters (it has ${value.length}).`;
    return value === '' ? null : value;
  };
  const massWord = units.mass === 'g' ? 'grams' : 'ounces';
  const temperatureWord = units.temperature === 'C' ? 'degrees Celsius' : 'degrees Fahrenheit';
  const date = new Date(values.date);
  if (values.date === '' || Number.isNaN(date.getTime())) errors.date = 'Give the date and time of the burn.';
  const fields: BurnFields = {
    fuelKind: text('fuelKind'),
    fuelMassG: number('fuelMass', (v) => massFromShown(v, units.mass), 0, 10_000, massWord),
    starter: text('starter'),
    ambientC: number('ambient', (v) => temperatureFromShown(v, units.temperature), -60, 60, temperatureWord),
    wind: values.wind || null,
    windscreen: values.windscreen === '' ? null : values.windscreen === 'yes',
    windFacing: text('windFacing'),
    timeToLightS: duration('timeToLight'),
    timeToJetsS: duration('timeToJets'),
    timeToBoilS: duration('timeToBoil'),
    boilWaterL: number('boilWater', (v) => volumeFromShown(v, units.volume), 0.05, 20, units.volume === 'L' ? 'litres' : 'quarts'),
    boilStartC: number('boilStart', (v) => temperatureFromShown(v, units.temperature), -10, 100, temperatureWord),
    burnTimeS: duration('burnTime'),
    charG: number('char', (v) => massFromShown(v, units.mass), 0, 10_000, massWord),
    smoke: values.smoke || null,
    flameRing: values.flameRing === '' ? null : Number(values.flameRing),
    notes: text('notes', 2000),
  };
  if (Object.keys(errors).length > 0) return { ok: false, errors };
  return { ok: true, date: date.toISOString(), fields };
}

/** The server's field names, mapped back onto the boxes that hold them. */
export const formKeyOfField: Record<string, keyof BurnFormValues> = {
  date: 'date', fuelKind: 'fuelKind', fuelMassG: 'fuelMass', starter: 'starter', ambientC: 'ambient', wind: 'wind', windscreen: 'windscreen',
  windFacing: 'windFacing', timeToLightS: 'timeToLight', timeToJetsS: 'timeToJets', timeToBoilS: 'timeToBoil', boilWaterL: 'boilWater',
  boilStartC: 'boilStart', burnTimeS: 'burnTime', charG: 'char', smoke: 'smoke', flameRing: 'flameRing', notes: 'notes',
};

export const windWords: Record<(typeof windLevels)[number], string> = { calm: 'Calm', light: 'Light', moderate: 'Moderate', strong: 'Strong' };
export const smokeWords: Record<(typeof smokeLevels)[number], string> = { none: 'None', some: 'Some', heavy: 'Heavy' };
export { flameRingWords };
