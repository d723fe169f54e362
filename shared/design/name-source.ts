import type { Design } from './design-schema.ts';

/** What the maker calls a side row or ring pattern (its label on the form), else its id. */
export function nameSource(design: Pick<Design, 'parts'>, sourceId: string): string {
  for (const part of design.parts) {
    const source = [...part.sideRows, ...part.endPatterns].find((s) => s.id === sourceId);
    if (source) return source.label?.trim() || sourceId;
  }
  return sourceId;
}
