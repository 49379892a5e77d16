/**
 * A return path from the query string, only if it stays on this site
 * (starts with one "/" and is not the sign-in page itself); otherwise the fallback.
 */
export function safeReturnPath(next: string | null | undefined, fallback = '/'): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\')) return fallback;
  if (/^\/(sign-in|register)(\/|\?|$)/.test(next)) return fallback;
  return next;
}

export function signInPath(returnTo: string): string {
  return `/sign-in?next=${encodeURIComponent(returnTo)}`;
}
