/** Exact by definition: the international inch (1959 yard and pound agreement; NIST SP 811). */
export const MM_PER_INCH = 25.4;

/** Length units a maker reads and types: inches (with fractions) or millimetres. */
export const unitSystems = ['in', 'mm'] as const;
export type UnitSystem = (typeof unitSystems)[number];

export const convertInchesToMm = (inches: number): number => inches * MM_PER_INCH;

export const convertMmToInches = (mm: number): number => mm / MM_PER_INCH;
