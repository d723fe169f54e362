/**
 * The can trade's dimension code, e.g. "303x406": diameter by height, each written as whole
 * inches followed by two digits of sixteenths. The diameter is taken over the double seam and
 * the height over both seams (CMI Voluntary Can and End Dimension Reference Manual; NFPA
 * Bulletin 26-L).
 */

const MM_PER_INCH = 25.4; // exact by definition (international inch, 1959)
const MM_PER_SIXTEENTH = MM_PER_INCH / 16;

export type CanCodeResult =
  | { ok: true; code: string; diameterMm: number; heightMm: number }
  | { ok: false; error: string };

type PartResult = { ok: true; mm: number } | { ok: false; error: string };

// Both parts are 3 digits for everyday cans; a 4th digit allows 10 in and larger.
const CODE_PATTERN = /^(\d{3,4})\s*[x×]\s*(\d{3,4})$/i;

/** Read one part of a code ("406") as millimetres, or explain why it is not a dimension. */
function parsePart(part: string, label: string): PartResult {
  const inches = Number(part.slice(0, -2));
  const sixteenths = Number(part.slice(-2));
  if (sixteenths >= 16) {
    return {
      ok: false,
      error: `The ${label} "${part}" is not valid: its last two digits are sixteenths of an inch and must be 00 to 15, not ${part.slice(-2)}.`,
    };
  }
  if (inches === 0 && sixteenths === 0) return { ok: false, error: `The ${label} "${part}" is zero.` };
  return { ok: true, mm: (inches * 16 + sixteenths) * MM_PER_SIXTEENTH };
}

/** Parse "303x406", "303 x 406", "303X406" or "303×406". Never throws; bad input gives an error. */
export function parseCanCode(text: string): CanCodeResult {
  const match = CODE_PATTERN.exec(text.trim());
  if (!match) {
    return {
      ok: false,
      error: `"${text.trim()}" is not a can code: expected diameter x height as two 3-digit numbers, e.g. 303x406.`,
    };
  }
  const [, diameterPart = '', heightPart = ''] = match;
  const diameter = parsePart(diameterPart, 'diameter');
  if (!diameter.ok) return diameter;
  const height = parsePart(heightPart, 'height');
  if (!height.ok) return height;
  return { ok: true, code: `${diameterPart}x${heightPart}`, diameterMm: diameter.mm, heightMm: height.mm };
}

/** Write a length as one part of a can code, to the nearest sixteenth of an inch. */
function formatPart(mm: number, label: string): string {
  if (!Number.isFinite(mm) || mm <= 0) throw new RangeError(`Can ${label} must be a positive length in mm, got ${mm}.`);
  const total = Math.round(mm / MM_PER_SIXTEENTH);
  if (total === 0) throw new RangeError(`Can ${label} ${mm} mm is under half a sixteenth of an inch.`);
  const inches = Math.floor(total / 16);
  const sixteenths = total % 16;
  return `${inches}${String(sixteenths).padStart(2, '0')}`;
}

/** The code for a can of this size, e.g. (80.96, 111.13) -> "303x406". */
export function formatCanCode(diameterMm: number, heightMm: number): string {
  return `${formatPart(diameterMm, 'diameter')}x${formatPart(heightMm, 'height')}`;
}
