import { adminClient } from 'better-auth/client/plugins';
import { createAuthClient } from 'better-auth/react';

/** better-auth's browser client, on this origin's /api/auth. */
export const authClient = createAuthClient({ plugins: [adminClient()] });

type AuthError = { message?: string; code?: string; status?: number; error?: { message?: string } };

/**
 * better-auth answers errors as { message, code }; Canwright's own limits in front of it as
 * { error: { message } }. This gives a sentence to show.
 */
export function authErrorMessage(error: AuthError | null | undefined, fallback: string): string {
  if (!error) return fallback;
  if (error.status === 429) return error.error?.message ?? 'Too many tries in a short time. Wait a minute and try again.';
  const known: Record<string, string> = {
    INVALID_EMAIL_OR_PASSWORD: 'That e-mail and password do not match an account.',
    EMAIL_NOT_VERIFIED: 'Confirm your e-mail address first: we have sent you a new link.',
    USER_ALREADY_EXISTS: 'An account with that e-mail address already exists. Sign in, or reset the password.',
    USER_ALREADY_EXISTS_USE_ANOTHER_EMAIL: 'An account with that e-mail address already exists. Sign in, or reset the password.',
    PASSWORD_TOO_SHORT: 'The password is too short: use at least 8 characters.',
    INVALID_TOKEN: 'This link is not valid any more. Ask for a new one.',
    INVALID_PASSWORD: 'The current password is not right.',
  };
  return (error.code && known[error.code]) || error.message || fallback;
}
