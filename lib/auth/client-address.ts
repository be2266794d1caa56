/**
 * The network address a request came from, for the per-address sign-in limit. The server started by
 * `npm start` (scripts/serve.mjs) replaces X-Forwarded-For with the TCP peer unless COILWRIGHT_TRUST_PROXY=1
 * says the app is behind a proxy; then the proxy appends the address it saw as the LAST entry (earlier
 * entries are whatever the client sent and are ignored).
 */
import { headers } from 'next/headers';

export function addressFromForwardedFor(value: string | null): string {
  const last = value?.split(',').at(-1)?.trim() ?? '';
  // Bounded and plain, since it becomes a database key.
  return /^[0-9A-Za-z.:_%-]{1,64}$/.test(last) ? last : 'unknown';
}

export async function clientAddress(): Promise<string> {
  return addressFromForwardedFor((await headers()).get('x-forwarded-for'));
}
