import { z } from 'zod';

/**
 * The account forms' rules. Every message is ours: `{ error }` on each field also covers a value
 * of the wrong type, so no validator wording ("Too big", "Invalid input: expected string")
 * can reach a person (tests/unit/auth/form-schemas.test.ts holds that).
 */
const text = (whenMissing: string) => z.string({ error: whenMissing });

// NIST SP 800-63B: at least 8 characters; the server (better-auth) enforces the same minimum
// and refuses more than 128 (its default maximum).
const password = text('Enter a password.').min(8, 'Use at least 8 characters.').max(128, 'Use at most 128 characters.');
const email = z.email({ error: 'Enter an e-mail address like name@example.org.' });
/** The longest name the sign-up form takes (common practice, no source). */
export const NAME_MAX = 100;

const matching = <T extends { password: string; confirm: string }>(form: T) => form.password === form.confirm;
const mismatch = { message: 'The two passwords differ.', path: ['confirm'] };
const confirm = text('Type the password again.');

export const signUpFormSchema = z
  .object({ name: text('Enter your name.').trim().min(1, 'Enter your name.').max(NAME_MAX, `Use at most ${NAME_MAX} characters.`), email, password, confirm })
  .refine(matching, mismatch);

export const signInFormSchema = z.object({ email, password: text('Enter your password.').min(1, 'Enter your password.') });

export const emailFormSchema = z.object({ email });

export const newPasswordFormSchema = z.object({ password, confirm }).refine(matching, mismatch);

export const changePasswordFormSchema = z
  .object({ current: text('Enter your current password.').min(1, 'Enter your current password.'), password, confirm })
  .refine(matching, mismatch);
