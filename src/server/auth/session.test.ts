import { describe, expect, it } from 'vitest';
import { generateSessionToken, hashToken } from './session.ts';

describe('session tokens', () => {
  it('hashes with SHA-256, hex', () => {
    // FIPS 180-2, Appendix B.1 (one-block message "abc").
    expect(hashToken('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
    // FIPS 180-2, Appendix B.2 (multi-block message).
    expect(hashToken('abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq')).toBe('248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1');
  });
  it('makes 20 random bytes as 32 base32 characters (RFC 4648 alphabet, lower case, no padding)', () => {
    const tokens = new Set(Array.from({ length: 200 }, generateSessionToken));
    expect(tokens.size).toBe(200);
    for (const t of tokens) expect(t).toMatch(/^[a-z2-7]{32}$/);
  });
});
