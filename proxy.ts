/**
 * Runs before every page: a fresh CSP nonce per request (Next.js reads it from the request's
 * Content-Security-Policy header and puts it on its own inline scripts) and the other security headers
 * (lib/security/headers.ts). Static assets are skipped; they carry no script.
 */
import { NextResponse, type NextRequest } from 'next/server';
import { STATIC_SECURITY_HEADERS, contentSecurityPolicy, newNonce } from '@/lib/security/headers';
import { env } from '@/lib/env';

export function proxy(request: NextRequest): NextResponse {
  const nonce = newNonce();
  const csp = contentSecurityPolicy(nonce, { https: env().COILWRIGHT_SECURE_COOKIES === '1', dev: process.env.NODE_ENV === 'development' });
  const requestHeaders = new Headers(request.headers);
  requestHeaders.set('x-nonce', nonce);
  requestHeaders.set('Content-Security-Policy', csp);
  const response = NextResponse.next({ request: { headers: requestHeaders } });
  response.headers.set('Content-Security-Policy', csp);
  for (const [k, v] of Object.entries(STATIC_SECURITY_HEADERS)) response.headers.set(k, v);
  return response;
}

export const config = {
  matcher: [{ source: '/((?!_next/static|_next/image|favicon.ico|icon.svg).*)' }],
};
