import { describe, expect, it } from 'vitest';
import type { z } from 'zod';
import { changeEmailFormSchema, changeNameFormSchema, changePasswordFormSchema, deleteAccountFormSchema, emailFormSchema, newPasswordFormSchema, signInFormSchema, signUpFormSchema } from '../../../src/features/auth/form-schemas.ts';

/**
 * Phrases zod writes on its own (zod 3 and 4 default messages, from memory of their wording).
 * None may reach a person: every message of these forms is in our words.
 */
const RAW = /Too (big|small)|expected (string|number|int|array|object|boolean|one of)|Invalid (input|option|type|enum|string|email|union|key|element|date)|received (NaN|undefined|null|string|number)|Unrecognized key|String must contain|Number must be|^Required$/;

/** Values a field may hold, good and bad: empty, blank, too long, the wrong type, missing. */
const values: unknown[] = ['', '   ', 'x', 'short', 'a-long-enough-password', 'x'.repeat(101), 'y'.repeat(129), 'name@example.org', 'not-an-address', '@', 42, null, undefined, true, [], {}];

const forms: [string, z.ZodType, string[]][] = [
  ['sign-up', signUpFormSchema, ['name', 'email', 'password', 'confirm']],
  ['sign-in', signInFormSchema, ['email', 'password']],
  ['forgot password / resend link', emailFormSchema, ['email']],
  ['new password', newPasswordFormSchema, ['password', 'confirm']],
  ['change password (account page)', changePasswordFormSchema, ['current', 'password', 'confirm']],
  ['change name (account page)', changeNameFormSchema, ['name']],
  ['change e-mail (account page)', changeEmailFormSchema, ['email']],
  ['delete account (account page)', deleteAccountFormSchema, ['password']],
];

/** Every message a form can give for one field set to `value`, the others filled in well. */
function messagesFor(schema: z.ZodType, fields: string[], field: string, value: unknown): string[] {
  const good: Record<string, string> = { name: 'Dana Reyes', email: 'dana@alder-street.example', password: 'wood-gas-burn', confirm: 'wood-gas-burn', current: 'old-password' };
  const form: Record<string, unknown> = Object.fromEntries(fields.map((f) => [f, good[f]]));
  if (value === undefined) delete form[field];
  else form[field] = value;
  const result = schema.safeParse(form);
  return result.success ? [] : result.error.issues.map((issue) => issue.message);
}

describe('account form messages', () => {
  it.each(forms)('%s: every message for every bad value is our own', (_name, schema, fields) => {
    const seen = new Set<string>();
    for (const field of fields) for (const value of values) for (const message of messagesFor(schema, fields, field, value)) seen.add(message);
    expect(seen.size).toBeGreaterThan(0);
    for (const message of seen) {
      expect(message, message).not.toMatch(RAW);
      // Our messages are sentences: a capital, then a full stop.
      expect(message, message).toMatch(/^[A-Z].*\.$/);
    }
  });

  it('says the sign-up name limit in plain words at 101 characters, not at 100', () => {
    // NAME_MAX is 100 (common practice, no source); trimmed first, as the server keeps names.
    expect(messagesFor(signUpFormSchema, ['name', 'email', 'password', 'confirm'], 'name', 'n'.repeat(100))).toEqual([]);
    expect(messagesFor(signUpFormSchema, ['name', 'email', 'password', 'confirm'], 'name', 'n'.repeat(101))).toEqual(['Use at most 100 characters.']);
    expect(messagesFor(signUpFormSchema, ['name', 'email', 'password', 'confirm'], 'name', `  ${'n'.repeat(100)}  `)).toEqual([]);
    expect(messagesFor(signUpFormSchema, ['name', 'email', 'password', 'confirm'], 'name', '   ')).toEqual(['Enter your name.']);
  });

  it('holds passwords to NIST SP 800-63B’s 8-character minimum and better-auth’s 128 maximum', () => {
    const fields = ['password', 'confirm'];
    const both = (password: string) => newPasswordFormSchema.safeParse({ password, confirm: password });
    expect(both('1234567').success).toBe(false); // 7 characters
    expect(both('12345678').success).toBe(true); // 8: NIST SP 800-63B section 5.1.1.1
    expect(both('p'.repeat(128)).success).toBe(true);
    expect(both('p'.repeat(129)).success).toBe(false); // better-auth's default maxPasswordLength, 128 (from memory)
    expect(messagesFor(newPasswordFormSchema, fields, 'password', 'short')).toContain('Use at least 8 characters.');
    expect(messagesFor(newPasswordFormSchema, fields, 'password', 42)).toEqual(['Enter a password.']);
  });
});
