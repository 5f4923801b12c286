// The client's address for rate limits. scripts/serve.mjs hands every request over with X-Forwarded-For set to
// the connecting socket's address (so Astro's clientAddress is that socket) and what the caller sent in
// X-Threadway-Forwarded-For; that list is believed only when the socket is one of TRUSTED_PROXIES.
import type { APIContext } from 'astro';
import { TRUSTED_PROXIES } from 'astro:env/server';
import { addressKey, clientFromChain, parseTrustedProxies, type ProxyTrust } from './net/clientAddress.ts';

const CALLER_FORWARDED = 'x-threadway-forwarded-for';
const STAMPED = Symbol.for('threadway.peerAddressStamped');

let trust: ProxyTrust | undefined;
function proxyTrust(): ProxyTrust {
  if (trust) return trust;
  const parsed = parseTrustedProxies(TRUSTED_PROXIES);
  if (!parsed.ok) throw new Error(`server/clientIp: TRUSTED_PROXIES: ${parsed.error}`);
  trust = parsed.value;
  return trust;
}

/**
 * The address a limit counts for this request (an IPv6 client counts by its /64). Outside scripts/serve.mjs a
 * production build cannot tell the socket from a forged header, so it refuses (a 500 and a log line naming the
 * fix) rather than let callers choose their own address; `astro dev` uses what the dev server reports.
 */
export function clientIp(context: Pick<APIContext, 'clientAddress' | 'request'>): string {
  const stamped = (globalThis as Record<symbol, unknown>)[STAMPED] === true;
  if (!stamped && !import.meta.env.DEV) {
    throw new Error('server/clientIp: the server was not started through scripts/serve.mjs, so the client address cannot be trusted');
  }
  let peer: string;
  try {
    peer = context.clientAddress;
  } catch {
    peer = 'unknown';
  }
  return addressKey(clientFromChain(peer || 'unknown', stamped ? context.request.headers.get(CALLER_FORWARDED) : null, proxyTrust()));
}
