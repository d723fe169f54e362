import { describe, expect, it } from 'vitest';
import { nextFromHere, safeNextPath, withNext } from '../../../src/features/auth/next-path.ts';

describe('safeNextPath', () => {
  it.each([
    ['/library', '/library'],
    ['/library/abc123', '/library/abc123'],
    ['/design/print?paper=a4#sheets', '/design/print?paper=a4#sheets'],
    ['/', '/'],
    // Dot segments are resolved by the URL parser and cannot climb above the site root.
    ['/library/../account', '/account'],
  ])('follows the same-site path %s', (raw, expected) => {
    expect(safeNextPath(raw)).toBe(expected);
  });

  // OWASP Unvalidated Redirects and Forwards Cheat Sheet: accept only local paths. Each case is a
  // way a browser reads a "next" as another site (WHATWG URL Standard: a leading "//" starts a
  // host; "\" counts as "/" in http(s) URLs; tab, CR and LF are removed before parsing).
  it.each([
    ['a protocol-relative URL', '//evil.example/steal'],
    ['a backslash after the slash', '/\\evil.example'],
    ['backslashes only', '\\\\evil.example'],
    ['a tab between the slashes', '/\t/evil.example'],
    ['a newline between the slashes', '/\n/evil.example'],
    ['a full URL', 'https://evil.example/'],
    ['a javascript: URL', 'javascript:alert(1)'],
    ['a relative path without a slash', 'library'],
    ['nothing', ''],
  ])('refuses %s', (_what, raw) => {
    expect(safeNextPath(raw)).toBeUndefined();
  });

  it('refuses a missing parameter and the sign-in flow’s own pages, which would loop', () => {
    expect(safeNextPath(null)).toBeUndefined();
    expect(safeNextPath(undefined)).toBeUndefined();
    for (const page of ['/sign-in', '/sign-in/', '/sign-up?next=%2Flibrary', '/verify?verified=1', '/forgot-password', '/reset-password?token=t']) {
      expect(safeNextPath(page), page).toBeUndefined();
    }
  });
});

describe('withNext', () => {
  it('adds next to a path with or without a query, encoded (RFC 3986: "/" and "?" escaped inside a value)', () => {
    expect(withNext('/sign-in', '/library?tag=pint')).toBe('/sign-in?next=%2Flibrary%3Ftag%3Dpint');
    expect(withNext('/verify?verified=1', '/library')).toBe('/verify?verified=1&next=%2Flibrary');
    expect(withNext('/sign-in', undefined)).toBe('/sign-in');
  });
});

describe('nextFromHere', () => {
  it('comes back to the page and query the person is on', () => {
    expect(nextFromHere({ pathname: '/design/print', search: '?paper=a4' })).toBe('/design/print?paper=a4');
  });

  it('from the landing page, adds none (a new session goes on to the account page)', () => {
    expect(nextFromHere({ pathname: '/', search: '' })).toBeUndefined();
  });

  it('on a sign-in page, passes on the next it was opened with, and only a safe one', () => {
    expect(nextFromHere({ pathname: '/sign-up', search: '?next=%2Flibrary' })).toBe('/library');
    expect(nextFromHere({ pathname: '/verify', search: '?verified=1' })).toBeUndefined();
    expect(nextFromHere({ pathname: '/sign-in', search: '?next=%2F%2Fevil.example' })).toBeUndefined();
  });
});
