import express, { type Express, type Request } from 'express';
import helmet from 'helmet';
import { toNodeHandler } from 'better-auth/node';
import { createAccountRepository } from './account/account-repository.ts';
import { createAccountUseCases } from './account/account-use-cases.ts';
import { createAccountDeletion } from './account/delete-account.ts';
import { createAdminUseCases } from './admin/admin-use-cases.ts';
import { createArchiveRepository } from './archive/archive-repository.ts';
import { createLibraryExport } from './archive/export-library.ts';
import { createLibraryImport } from './archive/import-library.ts';
import { createUserDirectory } from './admin/user-directory.ts';
import type { Auth } from './auth/auth.ts';
import { passwordMatches, sessionCookieNames } from './auth/confirm-password.ts';
import type { Database } from './db/database.ts';
import { compressResponses } from './http/compress-responses.ts';
import { serveClient } from './http/client-files.ts';
import { apiNotFound, errorHandler } from './http/error-handler.ts';
import { createAppRateLimits, passClientAddress, type RateLimitPolicy } from './http/rate-limits.ts';
import { requireSameOrigin } from './http/same-origin.ts';
import { loadSession } from './http/session.ts';
import { refuseControlCharactersInAddress } from './http/validate.ts';
import { createBurnLog } from './burns/burn-log.ts';
import { createBurnRepository } from './burns/burn-repository.ts';
import { createDesignLibrary } from './library/design-library.ts';
import { createDesignRepository } from './library/design-repository.ts';
import type { MailCapture } from './mail/mail-capture.ts';
import { mayReadMailbox, type MailboxMode } from './mail/mailbox-policy.ts';
import { createPrinterProfileRepository } from './printer-profiles/printer-profile-repository.ts';
import { createPrinterProfileUseCases } from './printer-profiles/printer-profile-use-cases.ts';
import { accountRoutes } from './routes/account-routes.ts';
import { adminRoutes } from './routes/admin-routes.ts';
import { burnRoutes } from './routes/burn-routes.ts';
import { designBodyParser, designRoutes } from './routes/design-routes.ts';
import { devMailRoutes } from './routes/dev-mail-routes.ts';
import { healthRoutes } from './routes/health-routes.ts';
import { libraryRoutes } from './routes/library-routes.ts';
import { printerProfileRoutes } from './routes/printer-profile-routes.ts';
import type { RenderPool } from './render/render-pool.ts';
import type { ObjectStore } from './storage/object-store.ts';
import { renderRoutes } from './routes/render-routes.ts';
import { sharedDesignRoutes } from './routes/shared-design-routes.ts';
import { workshopRoutes } from './routes/workshop-routes.ts';
import type { Mailer } from './mail/mailer.ts';
import { createWorkshopRepository } from './workshops/workshop-repository.ts';
import { createWorkshopUseCases } from './workshops/workshop-use-cases.ts';

export interface AppDeps {
  database: Database;
  auth: Auth;
  version: string;
  /** Present when mail goes to the local capture server: the mailbox, and who may read it. */
  mailbox?: { capture: MailCapture; mode: MailboxMode };
  /** Origins of our own pages (the public URL and its loopback twin): changes are accepted from these only. */
  trustedOrigins: readonly string[];
  /** Express's `trust proxy` (TRUST_PROXY): false, a hop count or proxy addresses. */
  trustProxy: false | number | string[];
  rateLimits: RateLimitPolicy;
  /** Where uploaded files (burn photos) are kept. */
  store: ObjectStore;
  /** Worker threads that draw kits. */
  renderPool: RenderPool;
  /** Workshop mail (invitations, kits) goes out through the same mailer as account mail. */
  mailer: Mailer;
  /** The site's public address, for links in mail. */
  publicUrl: string;
  /** Folder of the built client; omitted in API tests. */
  clientDir?: string;
}

/** The largest request body any API route reads (saved designs have a smaller limit of their own). */
const BODY_LIMIT = '1mb';

export function createApp(deps: AppDeps): Express {
  const app = express();
  app.disable('x-powered-by');
  // req.ip is the socket's address unless TRUST_PROXY names the proxies that may say otherwise.
  app.set('trust proxy', deps.trustProxy);
  const limits = createAppRateLimits(deps.database, deps.rateLimits);
  app.use(
    helmet({
      contentSecurityPolicy: { directives: { upgradeInsecureRequests: null, imgSrc: ["'self'", 'data:', 'blob:'] } },
      // Makers open the app over plain http on their own machine or LAN.
      strictTransportSecurity: false,
    }),
  );

  // JSON, SVG and pages compressed on the fly; PDFs, photos and archives are left as they are.
  app.use(compressResponses());
  app.use('/api', refuseControlCharactersInAddress);
  app.use('/api', limits.api);
  // better-auth checks its own routes by the same rule; this covers every other /api route.
  app.use('/api', requireSameOrigin(deps.trustedOrigins, { except: '/auth/' }));
  // better-auth takes a body parsed before it (better-call reads req.body once the stream is
  // consumed), so its routes get the same size limit as the rest: 413 past it, before any work.
  // Every body there is read as JSON, whatever it claims to be, so none goes unparsed and unbounded.
  app.use('/api/auth', express.json({ limit: BODY_LIMIT, type: () => true }));
  // Per account, from any address: failed sign-ins back off, and account mail cannot flood an inbox.
  app.post('/api/auth/sign-in/email', limits.failedSignInsPerAccount);
  app.post(['/api/auth/request-password-reset', '/api/auth/send-verification-email', '/api/auth/change-email'], limits.accountMailPerAccount);
  app.use('/api/auth', passClientAddress);
  app.all('/api/auth/{*any}', toNodeHandler(deps.auth));
  // Render routes parse their own (smaller) bodies and need no session.
  app.use('/api/render', limits.renders, renderRoutes(deps.renderPool));
  // Saved designs are capped at 256 kB: this parser reads them before the general one below.
  app.use('/api/designs', designBodyParser());
  app.use('/api', express.json({ limit: BODY_LIMIT }));
  app.use('/api/health', healthRoutes(deps.database, deps.version));
  const mailbox = deps.mailbox;
  const mayRead = (req: Request) => Boolean(mailbox && mayReadMailbox(mailbox.mode, req));
  app.get('/api/app-info', (req, res) => {
    res.json({ name: 'Canwright', version: deps.version, devMailbox: mayRead(req) });
  });
  app.use('/api', loadSession(deps.auth));

  const db = deps.database.db;
  const accounts = createAccountRepository(db);
  const account = createAccountUseCases(accounts);
  const deletion = createAccountDeletion({ accounts, store: deps.store, passwordMatches: (userId, password) => passwordMatches(deps.auth, userId, password) });
  // A wrong password on deletion counts like a failed sign-in: the session alone must not be a way to guess it.
  app.use('/api/account/delete', limits.failedConfirmationsPerAccount);
  app.use('/api/account', accountRoutes(account, deletion, () => sessionCookieNames(deps.auth)));
  app.use('/api/printer-profiles', printerProfileRoutes(createPrinterProfileUseCases(createPrinterProfileRepository(db))));
  const burnRepository = createBurnRepository(db);
  const burnLog = createBurnLog(burnRepository, deps.store);
  const workshops = createWorkshopUseCases({ workshops: createWorkshopRepository(db), burns: burnRepository, burnLog, mailer: deps.mailer, renderPool: deps.renderPool, publicUrl: deps.publicUrl });
  const designLibrary = createDesignLibrary(createDesignRepository(db), { keysOf: burnLog.photoKeysOfDesign, forget: burnLog.forget }, { workshopsUsing: workshops.workshopsUsing });
  app.use('/api/designs', designRoutes(designLibrary));
  app.use('/api', burnRoutes(burnLog));
  app.use('/api/shared', sharedDesignRoutes(designLibrary));
  app.use('/api/workshops', workshopRoutes(workshops, deps.renderPool));
  const archives = createArchiveRepository(db);
  app.use(
    '/api/library',
    libraryRoutes(createLibraryExport({ archives, store: deps.store, getAccount: account.getAccount, writtenBy: `Canwright ${deps.version}` }), createLibraryImport({ archives, store: deps.store })),
  );
  app.use('/api/admin', adminRoutes(createAdminUseCases(deps.auth, createUserDirectory(db))));
  // Anyone else is answered as if there were no mailbox (404), so its existence is not told either.
  if (mailbox) app.use('/api/dev/mail', (req, res, next) => (mayRead(req) ? next() : apiNotFound(req, res, next)), devMailRoutes(mailbox.capture));
  app.use('/api', apiNotFound);

  if (deps.clientDir) serveClient(app, deps.clientDir);
  app.use(errorHandler);
  return app;
}
