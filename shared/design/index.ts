export * from './design-schema.ts';
export { validateDesign, type DesignProblem, type DesignValidation } from './validate-design.ts';
export { nameSource } from './name-source.ts';
