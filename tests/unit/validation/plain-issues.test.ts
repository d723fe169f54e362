import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { plainIssueMessage } from '../../../shared/validation/plain-issues.ts';

const said = (schema: z.ZodType, input: unknown) => schema.safeParse(input).error!.issues.map((issue) => `${issue.path.join('.') || '(body)'}: ${plainIssueMessage(issue)}`);

describe('plainIssueMessage', () => {
  it("says each kind of problem in plain words, never the validator's", () => {
    const schema = z
      .object({ name: z.string().min(1).max(5), count: z.number().int().min(1).max(720), wind: z.enum(['calm', 'light', 'strong']), tags: z.array(z.string()).max(2), done: z.boolean(), email: z.email() })
      .strict();
    expect(said(schema, { name: '', count: 0, wind: 'gale', tags: ['a', 'b', 'c'], done: 'yes', email: 'nope', colour: 'red' })).toEqual([
      'name: must not be empty',
      'count: must be at least 1',
      'wind: must be one of: calm, light or strong',
      'tags: must have at most 2 items',
      'done: must be true or false',
      'email: must be an e-mail address',
      '(body): is not a field this takes: colour',
    ]);
    expect(said(schema, { name: 'too long', count: 721.5, wind: 'calm', tags: [], done: true, email: 'a@b.example' })).toEqual(['name: must have at most 5 characters', 'count: must be a whole number']);
    expect(said(z.object({ notes: z.string() }), {})).toEqual(['notes: is required']);
    expect(said(z.object({ notes: z.string() }), { notes: 5 })).toEqual(['notes: must be text']);
  });

  it("keeps a message a schema gives in its own words", () => {
    expect(said(z.object({ date: z.iso.datetime({ message: 'must be a date and time' }) }), { date: 'x' })).toEqual(['date: must be a date and time']);
  });
});
