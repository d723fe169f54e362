import { randomBytes } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

/**
 * Outside production a missing BETTER_AUTH_SECRET is generated once and kept in DATA_DIR,
 * so sessions survive a restart without anyone having to invent a secret.
 */
export function localAuthSecret(dataDir: string): string {
  const path = join(dataDir, 'auth-secret');
  if (existsSync(path)) return readFileSync(path, 'utf8').trim();
  const secret = randomBytes(32).toString('hex');
  writeFileSync(path, secret, { mode: 0o600 });
  return secret;
}
