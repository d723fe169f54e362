import { findDrill } from '../drills/index.ts';
import { designSchema, type Design } from './design-schema.ts';

export interface DesignProblem {
  path: string;
  message: string;
}

export type DesignValidation = { ok: true; design: Design } | { ok: false; problems: DesignProblem[] };

/** Checks any input against the design schema; never throws, lists every field path that is wrong. */
export function validateDesign(input: unknown): DesignValidation {
  const result = designSchema.safeParse(input);
  if (!result.success) {
    return { ok: false, problems: result.error.issues.map((issue) => ({ path: issue.path.join('.') || '(design)', message: issue.message })) };
  }
  const problems = findCrossFieldProblems(result.data);
  return problems.length ? { ok: false, problems } : { ok: true, design: result.data };
}

/** Rules one field cannot express: unique ids, skips inside the row, pitch limits in order. */
function findCrossFieldProblems(design: Design): DesignProblem[] {
  const problems: DesignProblem[] = [];
  const partIds = new Set<string>();
  design.parts.forEach((part, p) => {
    if (partIds.has(part.id)) problems.push({ path: `parts.${p}.id`, message: `Part id "${part.id}" is used twice` });
    partIds.add(part.id);
    const groupIds = new Set<string>();
    const checkId = (rowId: string, path: string) => {
      if (groupIds.has(rowId)) problems.push({ path, message: `Id "${rowId}" is used twice in part "${part.id}"` });
      groupIds.add(rowId);
    };
    const checkDrill = (drillId: string, path: string) => {
      if (!findDrill(drillId)) problems.push({ path, message: `Unknown drill "${drillId}"; use ids such as frac:1/4, num:7, let:F or mm:4.8` });
    };
    part.sideRows.forEach((row, r) => {
      checkId(row.id, `parts.${p}.sideRows.${r}.id`);
      checkDrill(row.drillId, `parts.${p}.sideRows.${r}.drillId`);
      row.skip.forEach((position, s) => {
        if (position >= row.count) problems.push({ path: `parts.${p}.sideRows.${r}.skip.${s}`, message: `Position ${position} does not exist in a row of ${row.count}` });
      });
    });
    part.endPatterns.forEach((pattern, e) => {
      checkId(pattern.id, `parts.${p}.endPatterns.${e}.id`);
      checkDrill(pattern.drillId, `parts.${p}.endPatterns.${e}.drillId`);
    });
  });
  design.drillSet.drillIds.forEach((drillId, d) => {
    if (!findDrill(drillId)) problems.push({ path: `drillSet.drillIds.${d}`, message: `Unknown drill "${drillId}"` });
  });
  if (design.rules.jetPitchErrorMm < design.rules.jetPitchWarnMm) {
    problems.push({ path: 'rules.jetPitchErrorMm', message: 'The error limit for jet pitch must not be below the warning limit' });
  }
  return problems;
}
