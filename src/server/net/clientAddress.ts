// Who is on the other end of a request, as far as rate limits are concerned. Pure: the caller hands in the
// connecting socket's address, the X-Forwarded-For list the caller sent, and the trusted proxies.
// X-Forwarded-For is a list "client, proxy1, proxy2": each proxy appends the address it received the request
// from. Only the entries added by proxies we trust can be believed, so the list is read from the right, and the
// first address that is not a trusted proxy is the client (RFC 7239 section 7.4 describes the same reading for
// the Forwarded header).
import { BlockList, isIP } from 'node:net';
import { err, ok, type Result } from '@shared/result.ts';

export interface ProxyTrust {
  readonly trusts: (address: string) => boolean;
}

export const NO_PROXY: ProxyTrust = { trusts: () => false };

/** An address as we key it: IPv4-mapped IPv6 becomes IPv4, brackets and zone ids go; null when not an address. */
export function normalizeAddress(raw: string): string | null {
  let a = raw.trim();
  if (a.startsWith('[') && a.includes(']')) a = a.slice(1, a.indexOf(']'));
  const zone = a.indexOf('%');
  if (zone >= 0) a = a.slice(0, zone);
  const mapped = /^::ffff:(\d{1,3}(?:\.\d{1,3}){3})$/i.exec(a);
  if (mapped) a = mapped[1]!;
  return isIP(a) ? a.toLowerCase() : null;
}

/** Parses TRUSTED_PROXIES: comma-separated addresses and CIDR ranges, IPv4 or IPv6. Empty → trusts nobody. */
export function parseTrustedProxies(text: string): Result<ProxyTrust, string> {
  const list = new BlockList();
  let any = false;
  for (const part of text.split(',').map((p) => p.trim()).filter(Boolean)) {
    const [address = '', bits, extra] = part.split('/');
    const ip = normalizeAddress(address);
    if (!ip || extra !== undefined) return err(`"${part}" is not an address or a CIDR range`);
    const type = isIP(ip) === 6 ? 'ipv6' : 'ipv4';
    if (bits === undefined) list.addAddress(ip, type);
    else {
      const prefix = Number(bits);
      if (!/^\d{1,3}$/.test(bits) || prefix > (type === 'ipv4' ? 32 : 128)) return err(`"${part}" has a bad prefix length`);
      list.addSubnet(ip, prefix, type);
    }
    any = true;
  }
  if (!any) return ok(NO_PROXY);
  return ok({ trusts: (address) => list.check(address, isIP(address) === 6 ? 'ipv6' : 'ipv4') });
}

/**
 * The client's address: the socket's own unless the socket is a trusted proxy; then walk X-Forwarded-For from the
 * right past trusted proxies. An entry that is not an address stops the walk at the last proxy we trust.
 */
export function clientFromChain(peer: string, forwardedFor: string | null, trust: ProxyTrust): string {
  let current = normalizeAddress(peer) ?? peer;
  if (!forwardedFor) return current;
  const hops = forwardedFor.split(',');
  while (trust.trusts(current)) {
    const next = hops.pop();
    if (next === undefined) return current;
    const address = normalizeAddress(next);
    if (!address) return current;
    current = address;
  }
  return current;
}

/**
 * The part of an address a limit counts: the whole IPv4 address, or the /64 network of an IPv6 address (one
 * subscriber usually holds a whole /64, so single IPv6 addresses would be free to rotate).
 */
export function addressKey(address: string): string {
  if (isIP(address) !== 6) return address;
  const [head = '', tail = ''] = address.split('::');
  const left = head ? head.split(':') : [];
  const right = tail ? tail.split(':') : [];
  const groups = address.includes('::') ? [...left, ...Array(8 - left.length - right.length).fill('0'), ...right] : left;
  return `${groups.slice(0, 4).map((g) => g.replace(/^0+(?=.)/, '')).join(':')}::/64`;
}
