import type { Auth } from './auth.ts';

/**
 * Whether the password is the user's own: better-auth's stored hash and its own verifier (the one
 * sign-in uses), read through its context, so Canwright never handles a hash itself.
 */
export async function passwordMatches(auth: Auth, userId: string, password: string): Promise<boolean> {
  const context = await auth.$context;
  const account = await context.internalAdapter.findCredentialAccount(userId);
  if (!account?.password) return false;
  return context.password.verify({ hash: account.password, password });
}

/** The names of the cookies better-auth sets for a session, to expire them when the account is gone. */
export async function sessionCookieNames(auth: Auth): Promise<string[]> {
  const { authCookies } = await auth.$context;
  return [authCookies.sessionToken.name, authCookies.sessionData.name, authCookies.dontRememberToken.name];
}
