import { describe, expect, it } from 'vitest';
import { authErrorMessage } from '../../../src/lib/auth-client.ts';

describe('authErrorMessage', () => {
  it('says how long to wait when a per-account limit answers (429 with a message of its own)', () => {
    const limited = { status: 429, error: { message: 'Too many tries in a short time. Wait 42 seconds and try again.' } };
    expect(authErrorMessage(limited, 'Signing in failed.')).toBe('Too many tries in a short time. Wait 42 seconds and try again.');
  });

  it('gives a plain sentence for better-auth\'s own 429', () => {
    expect(authErrorMessage({ status: 429, message: 'Too many requests. Please try again later.' }, 'Signing in failed.')).toBe('Too many tries in a short time. Wait a minute and try again.');
  });

  it('still maps better-auth codes and falls back', () => {
    expect(authErrorMessage({ status: 401, code: 'INVALID_EMAIL_OR_PASSWORD' }, 'x')).toBe('That e-mail and password do not match an account.');
    expect(authErrorMessage({ status: 500 }, 'Signing in failed.')).toBe('Signing in failed.');
  });
});
