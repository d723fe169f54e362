import { z } from 'zod';

/** The longest display name, the sign-up form's limit too: room for a full name with a workshop's name beside it (common practice, no source). */
export const DISPLAY_NAME_MAX = 100;

/** A display name as others see it: trimmed, not empty, at most DISPLAY_NAME_MAX characters. */
export const displayNameSchema = z
  .string({ error: (issue) => (issue.input === undefined ? 'is required: give the name others should see' : 'must be text (your name as others see it)') })
  .trim()
  .min(1, 'must not be empty: give the name others should see')
  .max(DISPLAY_NAME_MAX, `must have at most ${DISPLAY_NAME_MAX} characters`);

/** PATCH /api/account: the display name. */
export const changeNameInputSchema = z.object({ name: displayNameSchema }).strict();
export type ChangeNameInput = z.infer<typeof changeNameInputSchema>;

/** POST /api/account/delete: the password again, so a session left open on a shared computer cannot delete the account. */
export const deleteAccountInputSchema = z.object({ password: z.string({ error: 'is required: type your password to confirm' }).min(1, 'is required: type your password to confirm').max(256) }).strict();
export type DeleteAccountInput = z.infer<typeof deleteAccountInputSchema>;

export const accountDeletedSchema = z.object({ deleted: z.literal(true) });

/** Where the link in the change mail lands: the account page, which says the new address is confirmed. */
export const emailChangedCallbackUrl = '/account?email=changed';
/** Where that link lands when another account took the new address before it was opened: nothing changed. */
export const emailTakenUrl = '/account?email=taken';
