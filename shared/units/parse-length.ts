import { MM_PER_INCH } from './length.ts';
import type { UnitSystem } from './length.ts';

export type ParseLengthResult = { ok: true; mm: number } | { ok: false; error: string };

type Unit = 'in' | 'mm' | 'cm';

const EXAMPLES = '3/16, 1 5/8 in or 4.8 mm';
const MM_PER_UNIT: Record<Unit, number> = { in: MM_PER_INCH, mm: 1, cm: 10 };

// Typed or pasted variants of the same marks: fraction slashes, inch marks, minus signs.
const VULGAR_FRACTIONS: Record<string, string> = {
  '½': '1/2', '¼': '1/4', '¾': '3/4', '⅛': '1/8', '⅜': '3/8', '⅝': '5/8', '⅞': '7/8',
};

const UNIT_SUFFIX = /^(.*?)\s*(inches|inch|in\.?|"|''|mm|millimet(?:er|re)s?|cm|centimet(?:er|re)s?)$/i;
const MIXED = /^(\d+)(?:\s+|\s*-\s*)(\d+)\s*\/\s*(\d+)$/;
const FRACTION = /^(\d+)\s*\/\s*(\d+)$/;
const DECIMAL = /^(?:\d+\.?\d*|\.\d+)$/;

type Amount = { ok: true; value: number; isFraction: boolean } | { ok: false; zeroDenominator: boolean };

function normalizeText(text: string): string {
  return text
    .replace(/[½¼¾⅛⅜⅝⅞]/g, (mark) => ` ${VULGAR_FRACTIONS[mark] ?? mark}`)
    .replace(/[\u2044\u2215]/g, '/')
    .replace(/[\u2033\u201C\u201D]/g, '"')
    .replace(/[\u2032\u2019]{2}/g, "''")
    .replace(/[\u2212\u2013]/g, '-')
    .replace(/\s+/g, ' ')
    .trim();
}

function readUnit(word: string): Unit {
  const lower = word.toLowerCase();
  if (lower.startsWith('m')) return 'mm';
  if (lower.startsWith('c')) return 'cm';
  return 'in';
}

function readAmount(body: string): Amount {
  const mixed = MIXED.exec(body);
  const fraction = mixed ? null : FRACTION.exec(body);
  if (mixed || fraction) {
    const [whole, top, bottom] = mixed ? [mixed[1], mixed[2], mixed[3]] : ['0', fraction?.[1], fraction?.[2]];
    const denominator = Number(bottom);
    if (denominator === 0) return { ok: false, zeroDenominator: true };
    return { ok: true, value: Number(whole) + Number(top) / denominator, isFraction: true };
  }
  if (DECIMAL.test(body)) return { ok: true, value: Number(body), isFraction: false };
  return { ok: false, zeroDenominator: false };
}

/**
 * Reads a length as a maker types it: "3/16", "1 5/8 in", "1-5/8\"", "0.1875in", "4.8 mm", "10 cm".
 * A bare decimal uses defaultUnit; a bare fraction is inches, since fractions are an inch habit.
 * Never throws: bad text comes back as { ok: false, error } with a message fit to show the maker.
 */
export function parseLength(text: string, defaultUnit: UnitSystem): ParseLengthResult {
  const shown = String(text ?? '').trim();
  const normalized = normalizeText(shown);
  if (normalized === '') return { ok: false, error: `Enter a length, such as ${EXAMPLES}` };
  const unreadable = { ok: false, error: `Could not read "${shown}" as a length; try ${EXAMPLES}` } as const;

  const suffix = UNIT_SUFFIX.exec(normalized);
  const unit = suffix?.[2] ? readUnit(suffix[2]) : undefined;
  const body = (suffix ? (suffix[1] ?? '') : normalized).trim();
  const negative = body.startsWith('-');
  const amount = readAmount(negative ? body.slice(1).trim() : body);

  if (!amount.ok) {
    if (amount.zeroDenominator) {
      return { ok: false, error: `Could not read "${shown}": the number under the slash must not be 0` };
    }
    return unreadable;
  }
  if (negative && amount.value !== 0) return { ok: false, error: `Lengths must be positive; "${shown}" is below zero` };
  if (amount.value === 0) return { ok: false, error: `Lengths must be positive; "${shown}" is zero` };

  const mm = amount.value * MM_PER_UNIT[unit ?? (amount.isFraction ? 'in' : defaultUnit)];
  return Number.isFinite(mm) ? { ok: true, mm } : unreadable;
}
