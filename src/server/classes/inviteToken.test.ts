import { createHmac } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { signInviteToken, verifyInviteToken } from './inviteToken.ts';

const key = new Uint8Array(32).fill(7);
const now = new Date('2027-01-10T12:00:00Z');

describe('invitation tokens', () => {
  it('accepts its own token before expiry and returns the id', () => {
    const t = signInviteToken(key, new Date('2027-01-20T12:00:00Z'));
    const v = verifyInviteToken(key, t.token, now);
    expect(v).toEqual({ ok: true, value: { id: t.id, expiresAt: t.expiresAt } });
  });

  it('uses HMAC-SHA256 as Node computes it (RFC 2104 via node:crypto, an outside reference)', () => {
    const t = signInviteToken(key, new Date('2027-01-20T12:00:00Z'));
    const [id, exp, tag] = t.token.split('.');
    const hex = createHmac('sha256', Buffer.from(key)).update(`${id}.${exp}`).digest('hex');
    // base32 of 32 bytes is 52 characters; decoding back to hex must give the same MAC.
    const alphabet = 'abcdefghijklmnopqrstuvwxyz234567';
    let bits = '';
    for (const c of tag!) bits += alphabet.indexOf(c).toString(2).padStart(5, '0');
    const bytes = bits.slice(0, 256).match(/.{8}/g)!.map((b) => parseInt(b, 2).toString(16).padStart(2, '0')).join('');
    expect(bytes).toBe(hex);
  });

  it('refuses an expired token, a changed expiry, another key and garbage', () => {
    const t = signInviteToken(key, new Date('2027-01-05T00:00:00Z'));
    expect(verifyInviteToken(key, t.token, now)).toMatchObject({ ok: false, error: { kind: 'expired' } });
    const [id, exp, tag] = t.token.split('.');
    const extended = `${id}.${Number(exp) + 86_400 * 30}.${tag}`;
    expect(verifyInviteToken(key, extended, now)).toMatchObject({ ok: false, error: { kind: 'bad-signature' } });
    const fresh = signInviteToken(key, new Date('2027-02-01T00:00:00Z'));
    expect(verifyInviteToken(new Uint8Array(32).fill(8), fresh.token, now)).toMatchObject({ ok: false, error: { kind: 'bad-signature' } });
    expect(verifyInviteToken(key, 'not-a-token', now)).toMatchObject({ ok: false, error: { kind: 'malformed' } });
  });
});
