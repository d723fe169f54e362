import { z } from 'zod';

// NIST SP 800-63B: at least 8 characters; the server (better-auth) enforces the same minimum.
const password = z.string().min(8, 'Use at least 8 characters.').max(128, 'Use at most 128 characters.');
const email = z.email('Enter an e-mail address like name@example.org.');

const matching = <T extends { password: string; confirm: string }>(form: T) => form.password === form.confirm;
const mismatch = { message: 'The two passwords differ.', path: ['confirm'] };

export const signUpFormSchema = z
  .object({ name: z.string().trim().min(1, 'Enter your name.').max(100), email, password, confirm: z.string() })
  .refine(matching, mismatch);

export const signInFormSchema = z.object({ email, password: z.string().min(1, 'Enter your password.') });

export const emailFormSchema = z.object({ email });

export const newPasswordFormSchema = z.object({ password, confirm: z.string() }).refine(matching, mismatch);

export const changePasswordFormSchema = z
  .object({ current: z.string().min(1, 'Enter your current password.'), password, confirm: z.string() })
  .refine(matching, mismatch);
