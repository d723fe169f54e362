/** The pages of signing in and up: never a place to come back to afterwards. */
const authPaths = new Set(['/sign-in', '/sign-up', '/verify', '/forgot-password', '/reset-password']);

/** Any origin will do: paths are resolved against it only to see whether they stay on it. */
const PROBE_ORIGIN = 'https://canwright.invalid';
/** C0 controls and DEL, which the URL parser drops or refuses (WHATWG URL Standard). */
const hasControl = (text: string) => [...text].some((c) => c.charCodeAt(0) < 0x20 || c.charCodeAt(0) === 0x7f);

export const isAuthPath = (pathname: string) => authPaths.has(pathname.replace(/\/+$/, '') || '/');

/**
 * Where to go after signing in, from a `next` parameter: a path on this site, or undefined.
 * Only a relative path with one leading "/" is followed. "//host/..." is another site to a
 * browser, and so are "/\host" (the URL Standard reads "\" as "/" in http URLs) and "/<tab>/host"
 * (the parser drops tabs and newlines), so all of those, full URLs and "javascript:" are refused:
 * a link to our sign-in page must never send a person elsewhere (an open redirect).
 */
export function safeNextPath(raw: string | null | undefined): string | undefined {
  if (!raw || !raw.startsWith('/') || raw.startsWith('//') || raw.includes('\\') || hasControl(raw)) return undefined;
  let url: URL;
  try {
    url = new URL(raw, PROBE_ORIGIN);
  } catch {
    return undefined;
  }
  if (url.origin !== PROBE_ORIGIN || isAuthPath(url.pathname)) return undefined;
  return url.pathname + url.search + url.hash;
}

/** `path` with `next` added to its query (left as it is without one). */
export function withNext(path: string, next: string | undefined): string {
  if (!next) return path;
  const [base = '', query = ''] = path.split('?');
  const params = new URLSearchParams(query);
  params.set('next', next);
  return `${base}?${params}`;
}

/**
 * Where a person on `location` should come back to after signing in: this page, or on a page of
 * the sign-in flow itself, wherever that flow was started from (its own `next`). The landing
 * page is no place to come back to: from there a new session goes on to the account page.
 */
export function nextFromHere(location: { pathname: string; search: string }): string | undefined {
  if (isAuthPath(location.pathname)) return safeNextPath(new URLSearchParams(location.search).get('next'));
  if (location.pathname === '/') return undefined;
  return safeNextPath(location.pathname + location.search);
}
