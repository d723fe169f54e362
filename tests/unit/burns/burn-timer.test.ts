import { describe, expect, it } from 'vitest';
import { elapsedSeconds, loadTimer, markEvent, saveTimer, startTimer, timerSummary, togglePause, undoEvent } from '../../../src/features/burns/burn-timer.ts';
import { dropUnsaved, keepUnsaved, listUnsaved } from '../../../src/features/burns/unsaved-burns.ts';

function memoryStorage() {
  const items = new Map<string, string>();
  return { getItem: (k: string) => items.get(k) ?? null, setItem: (k: string, v: string) => void items.set(k, v), removeItem: (k: string) => void items.delete(k) };
}

const t0 = Date.parse('2026-11-30T10:00:00Z');
const s = (seconds: number) => t0 + seconds * 1000;

describe('burn timer', () => {
  it('counts from the clock, so time passes while the page is away', () => {
    const timer = startTimer('d1', 'Class stove', t0);
    expect(elapsedSeconds(timer, s(0))).toBe(0);
    expect(elapsedSeconds(timer, s(754))).toBe(754);
  });

  it('marks each event once, at the elapsed time, and leaves paused time out', () => {
    let timer = startTimer('d1', 'Class stove', t0);
    timer = markEvent(timer, 'jets', s(95));
    timer = markEvent(timer, 'jets', s(120)); // a second tap changes nothing
    timer = togglePause(timer, s(200));
    expect(elapsedSeconds(timer, s(260))).toBe(200);
    timer = togglePause(timer, s(260));
    timer = markEvent(timer, 'boil', s(560)); // 560 - 60 paused
    timer = markEvent(timer, 'out', s(1260));
    expect(timer.events).toEqual({ jets: 95, boil: 500, out: 1200 });
    expect(markEvent(timer, 'boil', s(1300))).toBe(timer);
    expect(timerSummary(timer, s(2000))).toEqual({ date: '2026-11-30T10:00:00.000Z', timeToJetsS: 95, timeToBoilS: 500, burnTimeS: 1200 });
  });

  it('ends a pause when the fire goes out, and takes back an event', () => {
    let timer = togglePause(startTimer('d1', 'x', t0), s(100));
    timer = markEvent(timer, 'out', s(160));
    expect(timer.pausedAt).toBeNull();
    expect(timer.events.out).toBe(100);
    expect(undoEvent(timer, 'out').events).toEqual({});
  });

  it('survives a reload through storage, and refuses what is not a timer', () => {
    const storage = memoryStorage();
    const timer = markEvent(startTimer('d1', 'Class stove', t0), 'jets', s(80));
    saveTimer(timer, storage);
    expect(loadTimer(storage)).toEqual(timer);
    storage.setItem('canwright.burn-timer.v1', '{"nonsense":true');
    expect(loadTimer(storage)).toBeNull();
    saveTimer(null, storage);
    expect(loadTimer(storage)).toBeNull();
  });
});

describe('entries kept until saved', () => {
  it('keeps, replaces and drops by key', () => {
    const storage = memoryStorage();
    keepUnsaved({ key: 'a', designId: 'd1', input: { date: '2026-11-30T10:00:00Z' }, keptAt: '' }, storage);
    keepUnsaved({ key: 'b', designId: 'd1', input: { date: '2026-11-30T11:00:00Z' }, keptAt: '' }, storage);
    keepUnsaved({ key: 'a', designId: 'd1', input: { date: '2026-11-30T10:00:00Z', notes: 'windy' }, keptAt: '' }, storage);
    expect(listUnsaved(storage).map((u) => [u.key, u.input.notes])).toEqual([['b', undefined], ['a', 'windy']]);
    dropUnsaved('b', storage);
    expect(listUnsaved(storage).map((u) => u.key)).toEqual(['a']);
    storage.setItem('canwright.unsaved-burns.v1', 'not json');
    expect(listUnsaved(storage)).toEqual([]);
  });
});

describe('entry form values', async () => {
  const { emptyFormValues, formValuesOf, readFormValues } = await import('../../../src/features/burns/burn-form-values.ts');
  const metric = { mass: 'g', temperature: 'C', volume: 'L' } as const;
  const us = { mass: 'oz', temperature: 'F', volume: 'qt' } as const;

  it('stores what a maker types in ounces, degF and quarts in SI', () => {
    const values = { ...emptyFormValues(new Date(t0)), fuelMass: '8', ambient: '50', boilWater: '1', boilStart: '59', timeToBoil: '9:30', burnTime: '25', flameRing: '4', wind: 'light' as const };
    const read = readFormValues(values, us);
    if (!read.ok) throw new Error(JSON.stringify(read.errors));
    expect(read.fields.fuelMassG).toBeCloseTo(226.796, 3); // 8 x 28.349523125 g, NIST Handbook 44 appendix C
    expect(read.fields.ambientC).toBeCloseTo(10, 9); // (50 - 32) / 1.8, NIST SP 811
    expect(read.fields.boilWaterL).toBeCloseTo(0.946353, 6); // 1 US quart, NIST Handbook 44 appendix C
    expect(read.fields.boilStartC).toBeCloseTo(15, 9);
    expect(read.fields).toMatchObject({ timeToBoilS: 570, burnTimeS: 1500, flameRing: 4, wind: 'light', charG: null, smoke: null });
  });

  it('shows stored SI values back in the maker units', () => {
    const values = formValuesOf({ date: '2026-11-30T10:00:00Z', fuelMassG: 226.796185, ambientC: 10, timeToJetsS: 95 }, us);
    expect(values).toMatchObject({ fuelMass: '8', ambient: '50', timeToJets: '1:35' });
    expect(formValuesOf({ date: '2026-11-30T10:00:00Z', fuelMassG: 120.4 }, metric).fuelMass).toBe('120');
  });

  it('says each mistake in words, per box', () => {
    const read = readFormValues({ ...emptyFormValues(new Date(t0)), fuelMass: 'lots', timeToJets: 'soon', ambient: '300', date: '' }, metric);
    expect(read.ok).toBe(false);
    if (read.ok) return;
    expect(read.errors).toEqual({
      fuelMass: 'Type a number in grams, such as 12.',
      timeToJets: 'Type minutes and seconds, such as 7:30, or minutes, such as 7.5.',
      ambient: 'That is outside what a can stove test gives (in degrees Celsius). Check the number.',
      date: 'Give the date and time of the burn.',
    });
  });
});
