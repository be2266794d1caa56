/**
 * The security headers of every page. Next.js hydrates with inline scripts, so scripts are allowed by a
 * per-request nonce ('strict-dynamic' lets those scripts load the app's chunks); nothing from another
 * origin is loaded at all (fonts and charts are bundled). Inline style attributes (React `style`, the
 * charts) need 'unsafe-inline' for styles: a nonce cannot cover attributes, and style injection cannot run
 * code. Framing is refused (clickjacking), and the Referer never carries a job address to another site.
 */
export function contentSecurityPolicy(nonce: string, { https, dev }: { https: boolean; dev: boolean }): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ''}`,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' blob: data:",
    "font-src 'self'",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
    // Only when served over HTTPS: on a plain-HTTP shop LAN it would break every asset.
    ...(https ? ['upgrade-insecure-requests'] : []),
  ].join('; ');
}

export const STATIC_SECURITY_HEADERS: Record<string, string> = {
  'X-Frame-Options': 'DENY',
  'Referrer-Policy': 'same-origin',
  'X-Content-Type-Options': 'nosniff',
  'Permissions-Policy': 'camera=(self), microphone=(), geolocation=()',
};

/** 16 random bytes, base64: unguessable and fresh per request. */
export function newNonce(): string {
  return Buffer.from(crypto.getRandomValues(new Uint8Array(16))).toString('base64');
}
