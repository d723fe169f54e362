import { randomBytes } from 'node:crypto';

/** 32 random bytes: 256 bits nobody can guess, written as 43 URL-safe characters (RFC 4648 §5). */
export function createShareToken(): string {
  return randomBytes(32).toString('base64url');
}

/** Only strings that could be a token reach the database. */
export function looksLikeShareToken(text: string): boolean {
  return /^[A-Za-z0-9_-]{43}$/.test(text);
}
