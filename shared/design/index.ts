export * from './design-schema.ts';
export { validateDesign, type DesignProblem, type DesignValidation, type ProblemDetail } from './validate-design.ts';
export { nameSource } from './name-source.ts';
export { describeFieldProblem, describeProblem, locateProblem } from './describe-problem.ts';
export { labelField, type FieldKind, type FieldLabel } from './field-labels.ts';
export { blankDesign, freshId, newPart, ROLE_NAMES } from './new-design.ts';
