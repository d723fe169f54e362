import type { z } from 'zod';
import { AppError } from './app-error.ts';

/** Parses request input with a zod schema; a failure becomes a 400 listing each field path. */
export function parseInput<S extends z.ZodType>(schema: S, input: unknown): z.output<S> {
  const result = schema.safeParse(input);
  if (result.success) return result.data;
  const fields = result.error.issues.map((issue) => ({ path: issue.path.join('.') || '(body)', message: issue.message }));
  throw new AppError(400, 'INVALID_INPUT', 'Some fields are not valid.', { fields });
}
