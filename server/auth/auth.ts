import { betterAuth } from 'better-auth';
import { drizzleAdapter } from 'better-auth/adapters/drizzle';
import { APIError, createAuthMiddleware } from 'better-auth/api';
import { admin } from 'better-auth/plugins';
import { CONTROL_CHARACTER_MESSAGE, findControlCharacter } from '../../shared/validation/control-characters.ts';
import { verifyCallbackUrl } from '../../shared/account/links.ts';
import type { Db } from '../db/database.ts';
import { schema } from '../db/schema.ts';
import { CLIENT_ADDRESS_HEADER, type RateLimitPolicy } from '../http/rate-limits.ts';
import type { Mailer, OutgoingMail } from '../mail/mailer.ts';
import { DISPLAY_NAME_MAX, emailTakenUrl } from '../../shared/account/account-changes.ts';
import { alreadySignedUpMail, emailChangeMail, passwordResetMail, verificationMail } from '../mail/messages.ts';
import { accessControl, authRoles } from './roles.ts';

export interface AuthConfig {
  db: Db;
  mailer: Mailer;
  secret: string;
  /** Public URL of the app, e.g. http://localhost:3000; links in mail point here. */
  baseURL: string;
  /** Other origins a browser may send sign-in requests from (e.g. 127.0.0.1 beside localhost). */
  trustedOrigins: string[];
  /** Limits per client address for sign-in, sign-up and account mail (better-auth counts them in the database). */
  rateLimits: RateLimitPolicy;
  /** Silence better-auth's log (tests provoke its warnings on purpose). */
  quiet?: boolean;
}

export function createAuth(config: AuthConfig) {
  return betterAuth({
    appName: 'Canwright',
    baseURL: config.baseURL,
    basePath: '/api/auth',
    secret: config.secret,
    trustedOrigins: config.trustedOrigins,
    telemetry: { enabled: false },
    logger: { disabled: config.quiet ?? false },
    rateLimit: authRateLimit(config.rateLimits),
    advanced: {
      // Explicit, because better-auth turns origin checks off when NODE_ENV is "test": the tests
      // must exercise the same CSRF protection that production has.
      disableOriginCheck: false,
      disableCSRFCheck: false,
      // The app writes the address Express derived (TRUST_PROXY) into this header, over anything a
      // client sent; better-auth's default, X-Forwarded-For, is whatever the client says.
      ipAddress: { ipAddressHeaders: [CLIENT_ADDRESS_HEADER] },
    },
    database: drizzleAdapter(config.db, { provider: 'pg', schema, usePlural: true }),
    hooks: { before: refuseBadAuthInput },
    user: {
      additionalFields: {
        units: { type: 'string', required: false, defaultValue: 'in', input: false },
      },
      // A new address is confirmed by a link mailed to it (sendVerificationEmail below); until it
      // is opened, the account keeps its old address. An address taken by another account gets
      // the same answer and no mail, so the form does not tell who has an account.
      changeEmail: { enabled: true },
    },
    emailAndPassword: {
      enabled: true,
      requireEmailVerification: true,
      // NIST SP 800-63B: at least 8 characters, no composition rules.
      minPasswordLength: 8,
      revokeSessionsOnPasswordReset: true,
      // Mail goes out after the answer, so a known address answers as fast as an unknown one
      // (the time would otherwise tell who has an account).
      async sendResetPassword({ user, url }) {
        sendLater(config.mailer, passwordResetMail(user.email, user.name, url));
      },
      // The answer for a taken address is made up by better-auth; it must carry the role a new
      // account gets, or its missing role would tell the two apart.
      customSyntheticUser: ({ coreFields, additionalFields, id }) => ({ ...coreFields, role: 'maker', ...additionalFields, id }),
      async onExistingUserSignUp({ user }) {
        sendLater(config.mailer, alreadySignedUpMail(user.email, user.name, `${config.baseURL}/sign-in`));
      },
    },
    emailVerification: {
      sendOnSignUp: true,
      sendOnSignIn: true,
      async sendVerificationEmail({ user, url }, request) {
        // better-auth sends the link for a new address through here too, with the new address as user.email.
        const changing = request !== undefined && new URL(request.url).pathname.endsWith('/change-email');
        sendLater(config.mailer, changing ? emailChangeMail(user.email, user.name, url) : verificationMail(user.email, user.name, landOnVerifyPage(url)));
      },
    },
    plugins: [
      admin({
        defaultRole: 'maker',
        adminRoles: ['admin'],
        ac: accessControl,
        roles: authRoles,
        bannedUserMessage: 'This account has been disabled. Ask an administrator of this Canwright site.',
      }),
    ],
  });
}

/**
 * better-auth's limits per client address, on in every mode and counted in the database, so that
 * several servers on one PostgreSQL count together. The session check is left to the app's own
 * per-address limit: pages ask for it on every load.
 */
function authRateLimit(policy: RateLimitPolicy) {
  const perMinute = (max: number) => ({ window: 60, max });
  return {
    enabled: true,
    storage: 'database' as const,
    window: 60,
    max: policy.apiPerAddress,
    customRules: {
      '/get-session': false as const,
      '/sign-in/*': perMinute(policy.signInsPerAddress),
      '/sign-up/*': perMinute(policy.signUpsPerAddress),
      '/request-password-reset': perMinute(policy.accountMailPerAddress),
      '/send-verification-email': perMinute(policy.accountMailPerAddress),
      '/change-email': perMinute(policy.accountMailPerAddress),
    },
  };
}

/**
 * A verification link always lands on the "address confirmed" page, also when it was sent on a
 * sign-in attempt (where the client gives no callback URL, since a successful sign-in would
 * follow it).
 */
function landOnVerifyPage(link: string): string {
  const url = new URL(link);
  const callback = url.searchParams.get('callbackURL');
  if (!callback || callback === '/') url.searchParams.set('callbackURL', verifyCallbackUrl);
  return url.toString();
}

export type Auth = ReturnType<typeof createAuth>;

/**
 * The same boundary as the app's own routes: no control character in any string of a body, and
 * a profile's name is text of at most DISPLAY_NAME_MAX characters when given (better-auth would
 * pass null on to the database, and takes any length).
 */
const refuseBadAuthInput = createAuthMiddleware(async (ctx) => {
  const body: unknown = ctx.body;
  const bad = findControlCharacter(body);
  if (bad !== undefined) throw new APIError('BAD_REQUEST', { code: 'INVALID_INPUT', message: `${bad} ${CONTROL_CHARACTER_MESSAGE}.` });
  const namesUser = ctx.path === '/update-user' || ctx.path === '/sign-up/email';
  if (namesUser && body && typeof body === 'object' && 'name' in body) {
    if (typeof body.name !== 'string' || body.name.trim() === '') throw new APIError('BAD_REQUEST', { code: 'INVALID_INPUT', message: 'name must be text (your name as others see it).' });
    if (body.name.trim().length > DISPLAY_NAME_MAX) throw new APIError('BAD_REQUEST', { code: 'INVALID_INPUT', message: `name must have at most ${DISPLAY_NAME_MAX} characters.` });
  }
  if (ctx.path === '/verify-email') await refuseTakenAddress(ctx);
});

/**
 * A link for a new address is opened after another account took that address meanwhile: the
 * change cannot be made (better-auth would meet the unique index and answer 500), so the browser
 * goes back to the account page, which says so. The token is only read here, never trusted:
 * better-auth checks its signature when it is used.
 */
async function refuseTakenAddress(ctx: Parameters<Parameters<typeof createAuthMiddleware>[0]>[0]): Promise<void> {
  const token = (ctx.query as { token?: unknown } | undefined)?.token;
  const payload = typeof token === 'string' ? token.split('.')[1] : undefined;
  if (!payload) return;
  let claims: { requestType?: unknown; updateTo?: unknown };
  try {
    claims = JSON.parse(Buffer.from(payload, 'base64url').toString('utf8')) as typeof claims;
  } catch {
    return;
  }
  if (claims.requestType !== 'change-email-verification' || typeof claims.updateTo !== 'string') return;
  if (await ctx.context.internalAdapter.findUserByEmail(claims.updateTo)) throw ctx.redirect(emailTakenUrl);
}

/** Sends without holding up the answer; a failure is logged (address and subject only). */
function sendLater(mailer: Mailer, mail: OutgoingMail): void {
  mailer.send(mail).catch((error: unknown) => console.error(`Mail "${mail.subject}" to ${mail.to} could not be sent: ${(error as Error).message}`));
}
