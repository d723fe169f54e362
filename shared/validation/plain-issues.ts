import type { z } from 'zod';

/** zod's own wording starts like this; a message a schema gives itself (lower case, in our words) is kept. */
const VALIDATOR_WORDING = /^(Too (small|big)|Invalid|Unrecognized|Expected|Required)/;

const kinds: Record<string, string> = {
  number: 'a number',
  int: 'a whole number',
  string: 'text',
  boolean: 'true or false',
  array: 'a list',
  object: 'a set of fields',
  date: 'a date',
};

const orList = (values: readonly unknown[]) => {
  const words = values.map((value) => String(value));
  return words.length <= 1 ? words.join('') : `${words.slice(0, -1).join(', ')} or ${words.at(-1)}`;
};

/**
 * One problem of a request, said as a person would: "must be at most 5", "must be one of: calm,
 * light, moderate or strong", never the validator's own text.
 */
export function plainIssueMessage(issue: z.core.$ZodIssue): string {
  if (!VALIDATOR_WORDING.test(issue.message)) return issue.message;
  switch (issue.code) {
    case 'invalid_type':
      return /received undefined/.test(issue.message) ? 'is required' : `must be ${kinds[issue.expected] ?? issue.expected}`;
    case 'too_small': {
      const min = Number(issue.minimum);
      if (issue.origin === 'string') return min <= 1 ? 'must not be empty' : `must have at least ${min} characters`;
      if (issue.origin === 'array' || issue.origin === 'set') return `must have at least ${min} item${min === 1 ? '' : 's'}`;
      return issue.inclusive === false ? `must be more than ${min}` : `must be at least ${min}`;
    }
    case 'too_big': {
      const max = Number(issue.maximum);
      if (issue.origin === 'string') return `must have at most ${max} characters`;
      if (issue.origin === 'array' || issue.origin === 'set') return `must have at most ${max} item${max === 1 ? '' : 's'}`;
      return issue.inclusive === false ? `must be less than ${max}` : `must be at most ${max}`;
    }
    case 'invalid_value':
      return issue.values.length === 1 ? `must be ${String(issue.values[0])}` : `must be one of: ${orList(issue.values)}`;
    case 'unrecognized_keys':
      return `${issue.keys.length === 1 ? 'is not a field' : 'are not fields'} this takes: ${issue.keys.join(', ')}`;
    case 'invalid_format':
      return issue.format === 'email' ? 'must be an e-mail address' : issue.format === 'url' ? 'must be a web address' : 'is not in the right form';
    case 'not_multiple_of':
      return `must be a multiple of ${String(issue.divisor)}`;
    default:
      return 'is not valid';
  }
}
