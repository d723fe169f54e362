import { describe, expect, it } from 'vitest';
import { parseDrill } from './parse-drill.ts';

describe('parseDrill', () => {
  it.each([
    ['#7', 'num:7'],
    ['# 7', 'num:7'],
    ['no 7', 'num:7'],
    ['No. 7', 'num:7'],
    ['number 7', 'num:7'],
    ['7 (number)', 'num:7'],
    ['#80', 'num:80'],
    ['letter F', 'let:F'],
    ['F', 'let:F'],
    ['f', 'let:F'],
    ['Letter z', 'let:Z'],
    ['3/16', 'frac:3/16'],
    ['3/16 in', 'frac:3/16'],
    ['3/16"', 'frac:3/16'],
    ['6/64 in', 'frac:3/32'],
    ['1 in', 'frac:1'],
    ['0.25 in', 'frac:1/4'], // 1/4 in and letter E are the same size; fractional is preferred
    ['0.201 in', 'num:7'], // ASME B94.11M twist-drill table: #7 = 0.2010 in
    ['4.8 mm', 'mm:4.8'],
    ['4.8mm', 'mm:4.8'],
    ['0.48 cm', 'mm:4.8'],
    ['13 mm', 'mm:13'],
  ])('reads "%s" as %s', (text, id) => {
    expect(parseDrill(text)?.id).toBe(id);
  });

  it.each([
    '', 'banana', '#0', '#81', 'letter AA', '4.85 mm', '13.1 mm', '1/128', '3/0', '-3/16',
    '4.8', // bare number: number drill, inches or mm? ambiguous
    '7',
  ])('gives undefined for "%s"', (text) => {
    expect(parseDrill(text)).toBeUndefined();
  });
});
