import { describe, expect, it } from 'vitest';
import pint from '../../templates/pint-can-stove.json' with { type: 'json' };
import { describeProblem } from './describe-problem.ts';
import type { DesignInput } from './design-schema.ts';
import { validateDesign } from './validate-design.ts';

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- the tests set any field
type Loose = DesignInput & { parts: any[] };

function wordsAfter(change: (d: Loose) => void): string[] {
  const design = structuredClone(pint) as unknown as Loose;
  change(design);
  const result = validateDesign(design);
  return result.ok ? [] : result.problems.map((p) => describeProblem(design, p));
}

describe('names and labels the kit cannot print', () => {
  it('refuses a design name with characters outside the kit fonts, naming them plainly', () => {
    // U+2603 SNOWMAN and U+1D11E G CLEF are in no IBM Plex Sans subset shipped (shared/print/plex-coverage.ts).
    expect(wordsAfter((d) => (d.name = 'Snow ☃ stove 𝄞'))).toEqual([
      'Design name: has characters the printed kit cannot show: "☃", "𝄞". Use letters, digits and common punctuation.',
    ]);
  });

  it('refuses part names, row labels and pattern labels the same way, at their own fields', () => {
    // U+1F525 FIRE, U+7089 (CJK), U+2605 BLACK STAR: none in the shipped subsets (shared/print/plex-coverage.ts).
    const paths = (() => {
      const design = structuredClone(pint) as unknown as Loose;
      design.parts[0].name = 'Chamber 🔥';
      design.parts[0].sideRows[0].label = '炉 jets';
      design.parts[0].endPatterns[0].label = 'Rings ★';
      const result = validateDesign(design);
      return result.ok ? [] : result.problems.map((p) => [p.path, p.message]);
    })();
    const tail = '. Use letters, digits and common punctuation.';
    expect(paths).toEqual([
      ['parts.0.name', `has a character the printed kit cannot show: "🔥"${tail}`],
      ['parts.0.sideRows.0.label', `has a character the printed kit cannot show: "炉"${tail}`],
      ['parts.0.endPatterns.0.label', `has a character the printed kit cannot show: "★"${tail}`],
    ]);
  });

  it('takes accented Latin, Greek and Cyrillic names', () => {
    // Polish, Greek and Russian words (from memory).
    expect(wordsAfter((d) => ((d.name = 'Śliwka Ζήτα Жаровня'), (d.parts[0].name = 'Камера')))).toEqual([]);
  });
});
