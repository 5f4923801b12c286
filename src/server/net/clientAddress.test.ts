import { describe, expect, it } from 'vitest';
import { NO_PROXY, addressKey, clientFromChain, normalizeAddress, parseTrustedProxies } from './clientAddress.ts';

const trust = (text: string) => {
  const parsed = parseTrustedProxies(text);
  if (!parsed.ok) throw new Error(parsed.error);
  return parsed.value;
};

describe('client address', () => {
  it('is the socket address when no proxy is trusted, whatever X-Forwarded-For says', () => {
    expect(clientFromChain('127.0.0.1', '203.0.113.9', NO_PROXY)).toBe('127.0.0.1');
    expect(clientFromChain('::ffff:192.0.2.4', '203.0.113.9, 10.0.0.1', trust(''))).toBe('192.0.2.4');
  });

  it('behind trusted proxies, is the right-most address that is not one of them', () => {
    // RFC 7239 section 7.4 / the common reading of X-Forwarded-For: client, proxy1, proxy2 (each proxy appends).
    const t = trust('127.0.0.1, 10.0.0.0/8');
    expect(clientFromChain('127.0.0.1', '198.51.100.7', t)).toBe('198.51.100.7');
    expect(clientFromChain('127.0.0.1', '198.51.100.7, 10.1.2.3', t)).toBe('198.51.100.7');
    // A caller who sends a made-up first entry only adds to the left of what our proxy appended.
    expect(clientFromChain('127.0.0.1', '1.2.3.4, 198.51.100.7', t)).toBe('198.51.100.7');
    // Not from the proxy: the header counts for nothing.
    expect(clientFromChain('192.0.2.50', '198.51.100.7', t)).toBe('192.0.2.50');
  });

  it('stops at the last trusted proxy when an entry is not an address, and copes with a list of proxies only', () => {
    const t = trust('127.0.0.1,10.0.0.0/8');
    expect(clientFromChain('127.0.0.1', 'unknown, 10.0.0.4', t)).toBe('10.0.0.4');
    expect(clientFromChain('127.0.0.1', '10.0.0.9', t)).toBe('10.0.0.9');
    expect(clientFromChain('127.0.0.1', null, t)).toBe('127.0.0.1');
  });

  it('understands IPv6 ranges and brackets', () => {
    const t = trust('::1, fd00::/8');
    expect(clientFromChain('::1', '2001:db8::5, fd00::1', t)).toBe('2001:db8::5');
    expect(normalizeAddress('[2001:DB8::5]')).toBe('2001:db8::5');
    expect(normalizeAddress('fe80::1%eth0')).toBe('fe80::1');
    expect(normalizeAddress('not-an-address')).toBeNull();
  });

  it('refuses a malformed TRUSTED_PROXIES entry', () => {
    expect(parseTrustedProxies('10.0.0.0/33').ok).toBe(false);
    expect(parseTrustedProxies('proxy.internal').ok).toBe(false);
    expect(parseTrustedProxies('10.0.0.1/8/2').ok).toBe(false);
  });

  it('counts IPv6 clients by their /64 network and IPv4 clients by address', () => {
    // RFC 6177: an end site is normally given a /56 or /48, and a single network a /64.
    expect(addressKey('2001:db8:1:2:aaaa::1')).toBe('2001:db8:1:2::/64');
    expect(addressKey('2001:db8:1:2:ffff:1:2:3')).toBe('2001:db8:1:2::/64');
    expect(addressKey('2001:db8::1')).toBe('2001:db8:0:0::/64');
    expect(addressKey('::1')).toBe('0:0:0:0::/64');
    expect(addressKey('203.0.113.9')).toBe('203.0.113.9');
  });
});
