import { findDrill } from '../drills/index.ts';
import { describeUnprintable } from '../print/printable-text.ts';
import { designSchema, type Design } from './design-schema.ts';

/** What was wrong, as data, so each screen can say it in its own words and units. */
export interface ProblemDetail {
  code: string;
  minimum?: number;
  maximum?: number;
  inclusive?: boolean;
  /** number, string or array, for limits. */
  origin?: string;
  /** The type expected: number, int, string... */
  expected?: string;
  /** Unknown keys, or the allowed values. */
  keys?: string[];
  values?: unknown[];
  /** Missing rather than wrong. */
  missing?: boolean;
}

export interface DesignProblem {
  path: string;
  /** The validator's own text, for logs and programs; people get describeProblem's words. */
  message: string;
  detail?: ProblemDetail;
}

type Issue = { code: string; path: PropertyKey[]; message: string } & Record<string, unknown>;

function detailOf(issue: Issue): ProblemDetail {
  const num = (key: string) => (typeof issue[key] === 'number' ? (issue[key] as number) : typeof issue[key] === 'bigint' ? Number(issue[key]) : undefined);
  return {
    code: issue.code,
    minimum: num('minimum'),
    maximum: num('maximum'),
    inclusive: typeof issue.inclusive === 'boolean' ? issue.inclusive : undefined,
    origin: typeof issue.origin === 'string' ? issue.origin : undefined,
    expected: typeof issue.expected === 'string' ? issue.expected : undefined,
    keys: Array.isArray(issue.keys) ? issue.keys.map(String) : undefined,
    values: Array.isArray(issue.values) ? issue.values : issue.code === 'invalid_union' && Array.isArray(issue.options) ? issue.options : undefined,
    missing: issue.code === 'invalid_type' && / received undefined$/.test(issue.message),
  };
}

export type DesignValidation = { ok: true; design: Design } | { ok: false; problems: DesignProblem[] };

/** Checks any input against the design schema; never throws, lists every field path that is wrong. */
export function validateDesign(input: unknown): DesignValidation {
  const result = designSchema.safeParse(input);
  if (!result.success) {
    return { ok: false, problems: result.error.issues.map((issue) => ({ path: issue.path.join('.') || '(design)', message: issue.message, detail: detailOf(issue as unknown as Issue) })) };
  }
  const problems = findCrossFieldProblems(result.data);
  return problems.length ? { ok: false, problems } : { ok: true, design: result.data };
}

/** Rules one field cannot express: unique ids, skips inside the row, pitch limits in order. */
function findCrossFieldProblems(design: Design): DesignProblem[] {
  const problems: DesignProblem[] = [];
  const partIds = new Set<string>();
  design.parts.forEach((part, p) => {
    if (partIds.has(part.id)) problems.push({ path: `parts.${p}.id`, message: `the id "${part.id}" is used by two parts` });
    partIds.add(part.id);
    const groupIds = new Set<string>();
    const checkId = (rowId: string, path: string) => {
      if (groupIds.has(rowId)) problems.push({ path, message: `the id "${rowId}" is used twice in this part` });
      groupIds.add(rowId);
    };
    const checkDrill = (drillId: string, path: string) => {
      if (!findDrill(drillId)) problems.push({ path, message: `"${drillId}" is not a drill Canwright knows; choose one from the list` });
    };
    part.sideRows.forEach((row, r) => {
      checkId(row.id, `parts.${p}.sideRows.${r}.id`);
      checkDrill(row.drillId, `parts.${p}.sideRows.${r}.drillId`);
      row.skip.forEach((position, s) => {
        if (position >= row.count) problems.push({ path: `parts.${p}.sideRows.${r}.skip.${s}`, message: `position ${position + 1} is left out, but the row has only ${row.count} positions` });
      });
    });
    part.endPatterns.forEach((pattern, e) => {
      checkId(pattern.id, `parts.${p}.endPatterns.${e}.id`);
      checkDrill(pattern.drillId, `parts.${p}.endPatterns.${e}.drillId`);
    });
  });
  design.drillSet.drillIds.forEach((drillId, d) => {
    if (!findDrill(drillId)) problems.push({ path: `drillSet.drillIds.${d}`, message: `"${drillId}" is not a drill Canwright knows` });
  });
  design.parts.forEach((part, p) => {
    // A collar's holes come from the shell's intake row (shared/layout/collar.ts); rows of its own would be lost.
    if (part.role === 'intake-collar') {
      if (part.sideRows.length > 0) problems.push({ path: `parts.${p}.sideRows`, message: 'an intake collar takes its holes from the shell’s intake row: remove its own rows' });
      if (part.endPatterns.length > 0) problems.push({ path: `parts.${p}.endPatterns`, message: 'an intake collar is a band with no can end: remove its rings' });
    }
  });
  design.parts.forEach((part, p) => {
    // The flat of the bottom must be left: a rim as wide as the can's radius leaves no bottom to drill.
    if (2 * part.vessel.bottomRimInsetMm >= part.vessel.outerDiameterMm) problems.push({ path: `parts.${p}.vessel.bottomRimInsetMm`, message: 'leaves no flat bottom: it must be less than half the diameter' });
  });
  if (design.rules.jetPitchErrorMm < design.rules.jetPitchWarnMm) {
    problems.push({ path: 'rules.jetPitchErrorMm', message: 'must not be below the warning limit' });
  }
  if (design.rules.maxGapMm < design.rules.minGapMm) problems.push({ path: 'rules.maxGapMm', message: 'must not be below the narrowest gap allowed' });
  if (design.rules.concentratorMaxRatio < design.rules.concentratorMinRatio) problems.push({ path: 'rules.concentratorMaxRatio', message: 'must not be below the smallest opening allowed' });
  problems.push(...findUnprintableText(design));
  return problems;
}

/**
 * Every piece of the design's own text that prints on the kit (the name, each part's name, id and
 * can, each row's and ring pattern's label and id, keep-out labels) must be in characters the
 * kit's fonts carry, or it would print as empty boxes: such text is refused, naming the characters.
 */
function findUnprintableText(design: Design): DesignProblem[] {
  const problems: DesignProblem[] = [];
  const check = (text: string | undefined, path: string) => {
    const message = text === undefined ? undefined : describeUnprintable(text);
    if (message) problems.push({ path, message });
  };
  check(design.name, 'name');
  design.parts.forEach((part, p) => {
    check(part.id, `parts.${p}.id`);
    check(part.name, `parts.${p}.name`);
    check(part.vessel.name, `parts.${p}.vessel.name`);
    part.sideRows.forEach((row, r) => {
      check(row.id, `parts.${p}.sideRows.${r}.id`);
      check(row.label, `parts.${p}.sideRows.${r}.label`);
      row.keepOuts.forEach((keepOut, k) => check(keepOut.label, `parts.${p}.sideRows.${r}.keepOuts.${k}.label`));
    });
    part.endPatterns.forEach((pattern, e) => {
      check(pattern.id, `parts.${p}.endPatterns.${e}.id`);
      check(pattern.label, `parts.${p}.endPatterns.${e}.label`);
    });
  });
  return problems;
}
