import type { Piece } from '../layout/layout-types.ts';
import { checkImposable } from './impose.ts';
import type { Orientation, PaperId } from './imposition-types.ts';
import { describeSheet, paperIds, paperSizes, type PrintOptions } from './paper.ts';

/** A paper choice that lets the whole kit print, said the way the print screen offers it. */
export interface PaperFix {
  /** Turn the same paper, or move to a larger one. */
  kind: 'turn' | 'larger-paper';
  paper: PaperId;
  orientation: Orientation;
  /** One line: what to do, and that it works. */
  advice: string;
  /** The label of the button that applies it. */
  action: string;
}

/**
 * A maker with A4 paper is more likely to have A3 to hand than Tabloid, and the other way round,
 * so larger paper of the same family is offered first (common practice, no source).
 */
const family: Record<PaperId, 'iso' | 'north-american'> = { letter: 'north-american', legal: 'north-american', tabloid: 'north-american', a4: 'iso', a3: 'iso' };

const area = (paper: PaperId) => paperSizes[paper].widthMm * paperSizes[paper].heightMm;
const turned = (orientation: Orientation): Orientation => (orientation === 'portrait' ? 'landscape' : 'portrait');

/**
 * What to change when the kit does not print on the chosen paper: the same paper turned if
 * that is enough, else the smallest larger paper (its family first) that holds every piece,
 * in the chosen orientation if it can. Null when the kit already prints, or when no paper
 * Canwright offers holds it at this margin. Each choice is tried with the real imposition, so
 * the fix always works.
 */
export function suggestPaperFix(pieces: readonly Piece[], options: PrintOptions): PaperFix | null {
  if (checkImposable(pieces, options).length === 0) return null;
  for (const choice of listChoices(options)) {
    if (checkImposable(pieces, { ...options, ...choice }).length === 0) return describeFix(choice, options);
  }
  return null;
}

/** The choices in the order they are offered. */
function listChoices({ paper, orientation }: PrintOptions): { paper: PaperId; orientation: Orientation }[] {
  const sameFamily = (id: PaperId) => (family[id] === family[paper] ? 0 : 1);
  const larger = paperIds.filter((id) => area(id) > area(paper)).sort((a, b) => sameFamily(a) - sameFamily(b) || area(a) - area(b));
  return [{ paper, orientation: turned(orientation) }, ...larger.flatMap((id) => [orientation, turned(orientation)].map((o) => ({ paper: id, orientation: o })))];
}

function describeFix(choice: { paper: PaperId; orientation: Orientation }, current: PrintOptions): PaperFix {
  const sheet = describeSheet(choice.paper, choice.orientation);
  if (choice.paper === current.paper) {
    return { kind: 'turn', ...choice, advice: `Turn the paper to ${choice.orientation}: every piece fits on ${sheet}.`, action: `Turn to ${choice.orientation}` };
  }
  return { kind: 'larger-paper', ...choice, advice: `Use larger paper: every piece fits on ${sheet}.`, action: `Use ${sheet}` };
}
