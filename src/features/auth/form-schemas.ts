import { z } from 'zod';
import { DISPLAY_NAME_MAX } from '../../../shared/account/account-changes.ts';

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
/** The longest name the sign-up form takes: the server's own limit (DISPLAY_NAME_MAX, common practice, no source). */
export const NAME_MAX = DISPLAY_NAME_MAX;

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

/** The account page's name, e-mail and delete forms. */
export const changeNameFormSchema = z.object({ name: text('Enter your name.').trim().min(1, 'Enter your name.').max(NAME_MAX, `Use at most ${NAME_MAX} characters.`) });

export const changeEmailFormSchema = z.object({ email });

export const deleteAccountFormSchema = z.object({ password: text('Type your password to confirm.').min(1, 'Type your password to confirm.') });
