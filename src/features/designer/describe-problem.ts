import type { DesignInput } from '../../../shared/design/design-schema.ts';

/** The form's own words for the design fields a maker can get wrong (see the editors' labels). */
const FIELD_NAMES: Record<string, string> = {
  name: 'Design name',
  count: 'Holes',
  ringCount: 'Number of rings',
  firstCount: 'Holes in first ring',
  firstRadiusMm: 'First ring radius',
  ringSpacingMm: 'Ring spacing',
  targetPitchMm: 'Target pitch',
  radiusMm: 'Ring radius',
  mm: 'Height of centres',
  startDeg: 'Start angle',
  outerDiameterMm: 'Diameter',
  heightMm: 'Height',
  targetRatio: 'Target ratio',
};

/** zod's wording made plain: "Too big: expected number to be <=8" -> "at most 8". */
export function plainMessage(message: string): string {
  const limit = /expected (?:number|string|array) to (?:be|have) ([<>]=?)(\d+(?:\.\d+)?)/.exec(message);
  if (limit) {
    const [, op, n] = limit;
    if (message.startsWith('Too small') && message.includes('string')) return 'must not be empty';
    return op!.startsWith('<') ? `at most ${n}` : `at least ${n}`;
  }
  if (/received NaN|expected number/.test(message)) return 'needs a number';
  return message;
}

/**
 * "parts.0.sideRows.1.count: Too big…" as the maker sees it: "Burn chamber › Low primary row ›
 * Holes: at most 120". Unknown parts of the path fall back to their keys.
 */
export function describeProblem(design: DesignInput, path: string, message: string): string {
  const keys = path.split('.');
  const where: string[] = [];
  const part = keys[0] === 'parts' ? design.parts?.[Number(keys[1])] : undefined;
  if (part) where.push(part.name ?? part.id);
  const listKey = keys[2];
  if (part && (listKey === 'sideRows' || listKey === 'endPatterns')) {
    const source = (listKey === 'sideRows' ? part.sideRows : part.endPatterns)?.[Number(keys[3])];
    if (source) where.push(source.label?.trim() || source.id);
  }
  const field = [...keys].reverse().find((k) => Number.isNaN(Number(k)));
  where.push(FIELD_NAMES[field ?? ''] ?? field ?? 'Design');
  return `${where.join(' › ')}: ${plainMessage(message)}`;
}
