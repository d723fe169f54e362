import { randomBytes } from 'node:crypto';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import type { Express } from 'express';
import { createApp } from './app.ts';
import { createAuth, type Auth } from './auth/auth.ts';
import { openDatabase, type Database, type DatabaseTarget } from './db/database.ts';
import { startMailCapture, type MailCapture } from './mail/mail-capture.ts';
import { limitsFor, type RateLimitPolicy } from './http/rate-limits.ts';
import { createMailer, createNotSentMailer, type Mailer } from './mail/mailer.ts';
import { mailboxMode, type MailboxMode } from './mail/mailbox-policy.ts';
import { createRenderPool, type RenderPool, type RenderPoolOptions } from './render/render-pool.ts';
import { openObjectStore, type StorageTarget } from './storage/object-store.ts';
import { seedDemo } from './seed/seed-demo.ts';
import { version } from './version.ts';

export interface ServerOptions {
  database: DatabaseTarget;
  port: number;
  host: string;
  /** Public base URL; when omitted, http://localhost:<bound port>. */
  publicUrl?: string;
  secret?: string;
  /**
   * Real SMTP server. When omitted, mail goes to a local mailbox that the app starts, readable only
   * from this machine, or, on a host others can reach, only with `localMailboxForNetwork`;
   * otherwise mail is logged as not sent. Never a local mailbox in production.
   */
  smtpUrl?: string;
  localMailboxForNetwork?: boolean;
  production?: boolean;
  mailFrom?: string;
  seedDemo?: boolean;
  clientDir?: string;
  /** Rate limits; by default those of the mode (see rate-limits.ts). A benchmark may raise them. */
  rateLimits?: RateLimitPolicy;
  /** Express's `trust proxy`: which proxies may say who the client is (TRUST_PROXY). Off by default. */
  trustProxy?: false | number | string[];
  quiet?: boolean;
  /** Where uploaded files go; by default a fresh temporary folder, removed on close (tests). */
  storage?: StorageTarget;
  /** Render threads and queue; by default from the CPU count. */
  renderPool?: RenderPoolOptions;
}

export interface RunningServer {
  url: string;
  port: number;
  database: Database;
  auth: Auth;
  /** The Express app itself (its route table is read by the security tests). */
  app: Express;
  /** Present when mail is captured locally. */
  mail?: MailCapture;
  seeded: string[];
  close(): Promise<void>;
}

/** Opens the database, migrates, seeds, starts mail and serves the app. Used by main and by tests. */
export async function startServer(options: ServerOptions): Promise<RunningServer> {
  const database = await openDatabase(options.database);
  let mail: MailCapture | undefined;
  let mailer: Mailer | undefined;
  let server: Server | undefined;
  let renderPool: RenderPool | undefined;
  try {
    await database.migrate();
    const from = options.mailFrom ?? 'Canwright <no-reply@canwright.local>';
    const mode: MailboxMode = options.production ? 'off' : mailboxMode({ host: options.host, openToNetwork: options.localMailboxForNetwork ?? false });
    if (options.smtpUrl) mailer = createMailer(options.smtpUrl, from);
    else if (mode === 'off') mailer = createNotSentMailer();
    else {
      mail = await startMailCapture();
      mailer = createMailer(mail.url, from);
    }

    // The port is bound before better-auth is made, so that port 0 (tests) still yields a correct base URL.
    // Requests that arrive before the app is ready are told to retry.
    let handle: ((req: IncomingMessage, res: ServerResponse) => void) | undefined;
    server = createServer((req, res) => (handle ? handle(req, res) : res.writeHead(503, { 'Retry-After': '1' }).end('Starting up')));
    await listen(server, options.port, options.host);
    const port = (server.address() as AddressInfo).port;
    const url = (options.publicUrl ?? `http://localhost:${port}`).replace(/\/+$/, '');
    const rateLimits = options.rateLimits ?? limitsFor(options.production ?? false);
    const auth = createAuth({
      db: database.db,
      mailer,
      secret: options.secret ?? randomBytes(32).toString('hex'),
      baseURL: url,
      trustedOrigins: loopbackTwins(url),
      rateLimits,
      quiet: options.quiet,
    });
    renderPool = createRenderPool(options.renderPool);
    const temporaryFiles = options.storage ? undefined : mkdtempSync(join(tmpdir(), 'canwright-files-'));
    const store = openObjectStore(options.storage ?? { kind: 'disk', dir: temporaryFiles! });
    const seeded = options.seedDemo ? (await seedDemo(database.db, auth, store)).created : [];
    const app = createApp({
      database,
      auth,
      version,
      mailbox: mail && { capture: mail, mode },
      trustedOrigins: [url, ...loopbackTwins(url)],
      trustProxy: options.trustProxy ?? false,
      rateLimits,
      renderPool,
      store,
      mailer,
      publicUrl: url,
      clientDir: options.clientDir,
    });
    handle = app;

    const openServer = server;
    const openMailer = mailer;
    const openMail = mail;
    const openPool = renderPool;
    let closing: Promise<void> | undefined;
    return {
      url,
      port,
      database,
      auth,
      app,
      mail,
      seeded,
      close() {
        closing ??= (async () => {
          openServer.closeAllConnections();
          await new Promise<void>((resolve) => openServer.close(() => resolve()));
          openMailer.close();
          await openPool.close();
          if (temporaryFiles) rmSync(temporaryFiles, { recursive: true, force: true });
          await openMail?.close();
          await database.close();
        })();
        return closing;
      },
    };
  } catch (error) {
    server?.close();
    await renderPool?.close();
    mailer?.close();
    await mail?.close();
    await database.close();
    throw error;
  }
}

function listen(server: Server, port: number, host: string): Promise<void> {
  return new Promise((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, host, () => {
      server.off('error', reject);
      resolve();
    });
  });
}

/** localhost and 127.0.0.1 are different origins to a browser; accept the twin of the base URL. */
function loopbackTwins(url: string): string[] {
  const parsed = new URL(url);
  const twins: Record<string, string> = { localhost: '127.0.0.1', '127.0.0.1': 'localhost' };
  const twin = twins[parsed.hostname];
  if (!twin) return [];
  parsed.hostname = twin;
  return [parsed.origin];
}
