import { mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { localAuthSecret } from './boot/auth-secret.ts';
import { buildClient, clientBuildIsStale } from './boot/client-build.ts';
import { loadEnv } from './config/env.ts';
import { DataDirLockedError, lockDataDir, type DataDirLock } from './db/data-dir-lock.ts';
import { demoAccounts } from './seed/demo-accounts.ts';
import { startServer, type RunningServer } from './server.ts';
import { storageFromUrl } from './storage/object-store.ts';

/**
 * `npm start`: settings first (a bad one stops here, before anything is written), then the
 * data-folder lock, the client build if it is stale, and the server.
 */
const env = loadEnv();
const root = fileURLToPath(new URL('..', import.meta.url));
const clientDir = join(root, 'dist', 'client');
const dataDir = resolve(env.DATA_DIR);

let lock: DataDirLock | undefined;
let running: RunningServer | undefined;

async function main(): Promise<void> {
  mkdirSync(dataDir, { recursive: true });
  if (!env.DATABASE_URL) {
    lock = lockDataDir(dataDir);
    if (lock.takenOver) console.log(lock.takenOver);
  }

  if (clientBuildIsStale(root, clientDir)) {
    console.log('Building the web client...');
    await buildClient(root);
  }

  running = await startServer({
    database: env.DATABASE_URL ? { kind: 'postgres', url: env.DATABASE_URL } : { kind: 'pglite', dataDir: join(dataDir, 'pglite') },
    port: env.PORT,
    host: env.HOST,
    publicUrl: env.PUBLIC_URL,
    secret: env.BETTER_AUTH_SECRET ?? localAuthSecret(dataDir),
    smtpUrl: env.SMTP_URL,
    localMailboxForNetwork: env.LOCAL_MAILBOX_FOR_NETWORK,
    production: env.NODE_ENV === 'production',
    mailFrom: env.MAIL_FROM,
    seedDemo: env.SEED_DEMO,
    clientDir,
    trustProxy: env.TRUST_PROXY,
    storage: env.STORAGE_URL ? storageFromUrl(env.STORAGE_URL, env.S3_ENDPOINT) : { kind: 'disk', dir: join(dataDir, 'files') },
  });

  console.log(`\nCanwright is running at ${running.url}`);
  console.log(`Data: ${env.DATABASE_URL ? 'PostgreSQL server (DATABASE_URL)' : join(dataDir, 'pglite')}; photos: ${env.STORAGE_URL ?? join(dataDir, 'files')}`);
  if (running.mail) console.log(`Mail is kept locally; read it at ${running.url}/dev/mail${env.LOCAL_MAILBOX_FOR_NETWORK ? ' (open to the network: LOCAL_MAILBOX_FOR_NETWORK)' : ' (from this machine only)'}`);
  else if (!env.SMTP_URL) console.log('Mail is not sent: no SMTP_URL, and HOST is not this machine only (set LOCAL_MAILBOX_FOR_NETWORK=true to read it at /dev/mail).');
  if (env.SEED_DEMO) {
    console.log('Demo sign-ins (Alder Street Makerspace):');
    for (const account of demoAccounts) console.log(`  ${account.role.padEnd(10)} ${account.email.padEnd(34)} ${account.password}`);
  }
  console.log('Press Ctrl+C to stop.');
}

let stopping = false;
async function stop(signal: string): Promise<void> {
  if (stopping) return;
  stopping = true;
  console.log(`\n${signal}: closing the database and stopping...`);
  try {
    await running?.close();
  } finally {
    lock?.release();
  }
  process.exit(0);
}
process.on('SIGINT', () => void stop('SIGINT'));
process.on('SIGTERM', () => void stop('SIGTERM'));

main().catch(async (error: unknown) => {
  if (error instanceof DataDirLockedError) {
    console.error(`Canwright cannot start: ${error.message}`);
  } else if ((error as NodeJS.ErrnoException).code === 'EADDRINUSE') {
    console.error(`Canwright cannot start: port ${env.PORT} is already in use. Stop what uses it, or set PORT=...`);
  } else {
    console.error('Canwright could not start:', error);
  }
  await running?.close().catch(() => undefined);
  lock?.release();
  process.exit(1);
});
