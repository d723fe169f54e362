import { describe, expect, it } from 'vitest';
import {
  defaultBurnUnits,
  formatDuration,
  formatMeasure,
  massFromShown,
  massToShown,
  parseDuration,
  temperatureFromShown,
  temperatureToShown,
  volumeFromShown,
  volumeToShown,
} from './burn-units.ts';

describe('burn measurement units', () => {
  it('converts mass, temperature and volume by their definitions', () => {
    expect(massFromShown(1, 'oz')).toBeCloseTo(28.349523125, 9); // 1 oz (avoirdupois) = 28.349 523 125 g exactly, NIST Handbook 44 appendix C
    expect(massToShown(453.59237, 'oz')).toBeCloseTo(16, 9); // 1 lb = 453.592 37 g = 16 oz, NIST Handbook 44 appendix C
    expect(temperatureToShown(100, 'F')).toBeCloseTo(212, 9); // water boils at 212 degF at one atmosphere, NIST SP 811 (t/degF = 1.8 t/degC + 32)
    expect(temperatureFromShown(-40, 'F')).toBeCloseTo(-40, 9); // -40 degF = -40 degC, NIST SP 811 formula
    expect(temperatureFromShown(68, 'F')).toBeCloseTo(20, 9); // (68 - 32) / 1.8, NIST SP 811
    expect(volumeFromShown(1, 'qt')).toBeCloseTo(0.946352946, 9); // 1 US liquid quart = 0.946 352 946 L exactly, NIST Handbook 44 appendix C
    expect(volumeToShown(3.785411784, 'qt')).toBeCloseTo(4, 9); // 1 US gallon = 3.785 411 784 L = 4 qt, NIST Handbook 44 appendix C
    expect(massToShown(120, 'g')).toBe(120);
    expect(temperatureToShown(12, 'C')).toBe(12);
    expect(volumeToShown(0.5, 'L')).toBe(0.5);
  });

  it('round-trips what a maker types', () => {
    for (const oz of [0.1, 3.5, 12]) expect(massToShown(massFromShown(oz, 'oz'), 'oz')).toBeCloseTo(oz, 12);
    for (const f of [-10, 32, 98.6]) expect(temperatureToShown(temperatureFromShown(f, 'F'), 'F')).toBeCloseTo(f, 12);
  });

  it('follows the length units until a maker chooses', () => {
    expect(defaultBurnUnits('in')).toEqual({ mass: 'oz', temperature: 'F', volume: 'qt' });
    expect(defaultBurnUnits('mm')).toEqual({ mass: 'g', temperature: 'C', volume: 'L' });
  });

  it('formats with the precision of kitchen tools', () => {
    expect(formatMeasure(118.6, 'g')).toBe('119 g');
    expect(formatMeasure(massToShown(120, 'oz'), 'oz')).toBe('4.2 oz'); // 120 / 28.3495 = 4.23, NIST Handbook 44 appendix C
    expect(formatMeasure(0.5, 'L')).toBe('0.5 L');
    expect(formatMeasure(temperatureToShown(15, 'F'), 'F')).toBe('59 °F'); // 15 x 1.8 + 32, NIST SP 811
  });
});

describe('durations', () => {
  it.each([
    ['7:30', 450],
    ['1:02:03', 3723],
    ['7m30s', 450],
    ['7 min', 420],
    ['450 s', 450],
    ['7.5', 450],
    ['1h 5m', 3900],
  ])('reads %s as %i s', (text, seconds) => expect(parseDuration(text)).toBe(seconds));

  it.each(['', 'soon', '7:75', '1:60:00', '-3'])('refuses %j', (text) => expect(parseDuration(text)).toBeNull());

  it('writes m:ss and h:mm:ss', () => {
    expect(formatDuration(0)).toBe('0:00');
    expect(formatDuration(450)).toBe('7:30');
    expect(formatDuration(3723)).toBe('1:02:03');
  });
});
