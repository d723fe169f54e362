import { describe, expect, it } from 'vitest';
import { createWorkshopInputSchema } from './workshop-schema.ts';

describe('workshop text printed on the class pack', () => {
  const base = { designId: 'd1', startsAt: '2026-12-10T18:30:00Z' };
  it('refuses a title or place the cover cannot print, naming the characters', () => {
    // U+1F525 FIRE is in no shipped IBM Plex Sans subset (shared/print/plex-coverage.ts).
    const result = createWorkshopInputSchema.safeParse({ ...base, title: 'Stove night 🔥', place: 'Hall ★' });
    expect(result.success).toBe(false);
    expect(result.error?.issues.map((i) => [i.path.join('.'), i.message])).toEqual([
      ['title', 'has a character the printed kit cannot show: "🔥". Use letters, digits and common punctuation.'],
      ['place', 'has a character the printed kit cannot show: "★". Use letters, digits and common punctuation.'],
    ]);
  });
  it('takes Greek and Cyrillic (from memory: Greek and Russian words)', () => {
    expect(createWorkshopInputSchema.safeParse({ ...base, title: 'Ζήτα Жаровня', place: 'Śliwka' }).success).toBe(true);
  });
});
