import { formatLength } from '../units/format-length.ts';
import type { UnitSystem } from '../units/length.ts';
import type { DesignInput } from './design-schema.ts';
import { labelField, type FieldLabel } from './field-labels.ts';
import type { DesignProblem, ProblemDetail } from './validate-design.ts';

const plural = (n: number, noun: string) => `${n} ${noun}${n === 1 ? '' : 's'}`;

/** A limit as the maker reads it: a length in their units, an angle in degrees, a ratio as "N : 1". */
function formatLimit(value: number, field: FieldLabel, units: UnitSystem): string {
  if (field.kind === 'length') return formatLength(value, units);
  if (field.kind === 'angle') return `${value}°`;
  if (field.kind === 'ratio') return `${value} : 1`;
  return String(value);
}

/**
 * What is wrong with one field, in plain words ("at most 720", "needs a whole number",
 * "at least 1 in"): never the validator's own text, which a maker should not have to read.
 */
export function describeFieldProblem(problem: Pick<DesignProblem, 'path' | 'message' | 'detail'>, units: UnitSystem): string {
  const field = labelField(problem.path);
  const d: ProblemDetail | undefined = problem.detail;
  // Problems found across fields (validateDesign) are already written in words.
  if (!d || d.code === 'custom') return problem.message;
  const limit = (n: number) => formatLimit(n, field, units);
  switch (d.code) {
    case 'invalid_type':
      if (d.missing) return 'is missing';
      if (d.expected === 'int') return 'needs a whole number';
      if (d.expected === 'number') return 'needs a number';
      if (d.expected === 'string') return 'needs text';
      if (d.expected === 'boolean') return 'needs yes or no';
      return 'is not the kind of value this field takes';
    case 'too_small':
      if (d.origin === 'string') return d.minimum === 1 ? (field.kind === 'choice' ? 'choose one' : 'must not be empty') : `needs at least ${plural(d.minimum ?? 0, 'character')}`;
      if (d.origin === 'array') return `needs at least ${plural(d.minimum ?? 0, field.item ?? 'item')}`;
      if (d.minimum === undefined) return 'is too small';
      return d.inclusive === false ? `must be more than ${limit(d.minimum)}` : `at least ${limit(d.minimum)}`;
    case 'too_big':
      if (d.origin === 'string') return `at most ${plural(d.maximum ?? 0, 'character')}`;
      if (d.origin === 'array') return `at most ${plural(d.maximum ?? 0, field.item ?? 'item')}`;
      if (d.maximum === undefined) return 'is too large';
      return d.inclusive === false ? `must be less than ${limit(d.maximum)}` : `at most ${limit(d.maximum)}`;
    case 'invalid_value':
      if (problem.path === 'schemaVersion') return `this file is for another version of Canwright (this one reads version ${String(d.values?.[0] ?? '')})`;
      return 'is not one of the choices';
    case 'invalid_union':
      return 'is not a kind Canwright knows';
    case 'unrecognized_keys':
      return `holds ${d.keys?.length === 1 ? 'a field' : 'fields'} Canwright does not know (${(d.keys ?? []).join(', ')})`;
    default:
      return 'is not valid here';
  }
}

/** The parts of the form a path runs through: "Burn chamber", "Secondary jets", "Keep-out 1". */
export function locateProblem(design: DesignInput, path: string): string[] {
  const keys = path.split('.');
  const where: string[] = [];
  if (keys[0] === 'rules') where.push('Check limits');
  if (keys[0] === 'drillSet') where.push('Drills');
  const part = keys[0] === 'parts' ? design.parts?.[Number(keys[1])] : undefined;
  if (part) where.push(part.name?.trim() || `Part ${Number(keys[1]) + 1}`);
  if (!part || (keys[2] !== 'sideRows' && keys[2] !== 'endPatterns') || keys.length < 4) return where;
  const index = Number(keys[3]);
  const source = keys[2] === 'sideRows' ? part.sideRows?.[index] : part.endPatterns?.[index];
  where.push(source?.label?.trim() || `${keys[2] === 'sideRows' ? 'Row' : 'Rings'} ${index + 1}`);
  if (keys[4] === 'keepOuts' && keys[5] !== undefined) where.push(`Keep-out ${Number(keys[5]) + 1}`);
  if (keys[4] === 'rings' && keys[5] === 'rings' && keys[6] !== undefined) where.push(`Ring ${Number(keys[6]) + 1}`);
  return where;
}

/**
 * One problem as a line above the form: "Burn chamber › Secondary jets › Holes: needs a whole
 * number". Lengths are shown in the design's units.
 */
export function describeProblem(design: DesignInput, problem: Pick<DesignProblem, 'path' | 'message' | 'detail'>, units: UnitSystem = design.units ?? 'in'): string {
  const field = labelField(problem.path);
  const where = [...locateProblem(design, problem.path), field.label];
  return `${where.join(' › ')}: ${describeFieldProblem(problem, units)}`;
}
