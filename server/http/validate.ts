import type { RequestHandler } from 'express';
import type { z } from 'zod';
import { CONTROL_CHARACTER_MESSAGE, findControlCharacter, hasControlCharacter } from '../../shared/validation/control-characters.ts';
import { plainIssueMessage } from '../../shared/validation/plain-issues.ts';
import { AppError } from './app-error.ts';

const refuse = (path: string) => new AppError(400, 'INVALID_INPUT', 'Some fields are not valid.', { fields: [{ path, message: CONTROL_CHARACTER_MESSAGE }] });

/** Parses request input with a zod schema; a failure becomes a 400 listing each field path. */
export function parseInput<S extends z.ZodType>(schema: S, input: unknown): z.output<S> {
  // One check for every schema: no string anywhere in the input holds a control character.
  const bad = findControlCharacter(input);
  if (bad !== undefined) throw refuse(bad);
  const result = schema.safeParse(input);
  if (result.success) return result.data;
  const fields = result.error.issues.map((issue) => ({ path: issue.path.join('.') || '(body)', message: plainIssueMessage(issue) }));
  throw new AppError(400, 'INVALID_INPUT', 'Some fields are not valid.', { fields });
}

/**
 * The address and query of every API request (better-auth's included): a control character in a
 * path segment (an id such as /api/designs/x%00) or a query value is refused with 400 naming it.
 */
export const refuseControlCharactersInAddress: RequestHandler = (req, _res, next) => {
  let path: string;
  try {
    path = decodeURIComponent(req.path);
  } catch {
    return next(new AppError(400, 'INVALID_INPUT', 'The address is not valid.', { fields: [{ path: '(address)', message: 'is not a valid address (a broken % escape)' }] }));
  }
  if (hasControlCharacter(path)) return next(refuse('(address)'));
  const inQuery = findControlCharacter(req.query);
  if (inQuery !== undefined) return next(refuse(inQuery === '(body)' ? '(query)' : inQuery));
  next();
};
