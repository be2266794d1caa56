/**
 * Where to go after signing in. The `next` value comes from the URL, so anyone can craft it: a pattern
 * such as `^/[^/]` let `/\evil.example/x` and `/<TAB>/evil.example/x` through, which browsers read as
 * `//evil.example/x`, another site. Instead the value is resolved exactly as a browser would resolve it
 * (WHATWG URL parsing: backslashes become slashes, tabs and newlines are dropped) against the app's own
 * origin, and only a result on that origin is kept, rewritten in its normalised form so the browser cannot
 * read it differently. Anything else goes to the board.
 */
export const AFTER_SIGN_IN_DEFAULT = '/jobs';

// Any fixed origin works: only "did it stay on this origin?" matters, and the reply is a path.
const OWN_ORIGIN = 'http://coilwright.invalid';

export function safeNextPath(next: unknown): string {
  if (typeof next !== 'string' || next.length === 0 || next.length > 2000 || !next.startsWith('/')) return AFTER_SIGN_IN_DEFAULT;
  let url: URL;
  try {
    url = new URL(next, OWN_ORIGIN);
  } catch {
    return AFTER_SIGN_IN_DEFAULT;
  }
  if (url.origin !== OWN_ORIGIN || !url.pathname.startsWith('/') || url.pathname.startsWith('//')) return AFTER_SIGN_IN_DEFAULT;
  if (url.pathname === '/login') return AFTER_SIGN_IN_DEFAULT;
  return `${url.pathname}${url.search}${url.hash}`;
}
