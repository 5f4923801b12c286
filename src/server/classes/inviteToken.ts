// Invitation tokens: "<id>.<expiry>.<mac>". `id` is 20 random bytes (base32), `expiry` Unix seconds, and `mac`
// HMAC-SHA256(key, "<id>.<expiry>") (base32). The MAC lets a forged or altered link be refused before any lookup;
// the database keeps only SHA-256(id), plus the expiry and when the invitation was used (single use).
import { createHmac, randomBytes, timingSafeEqual } from 'node:crypto';
import { encodeBase32LowerCaseNoPadding } from '@oslojs/encoding';
import { err, ok, type Result } from '@shared/result.ts';

export interface SignedToken {
  token: string;
  id: string;
  expiresAt: Date;
}

export function signInviteToken(key: Uint8Array, expiresAt: Date): SignedToken {
  const id = encodeBase32LowerCaseNoPadding(randomBytes(20));
  const exp = Math.floor(expiresAt.getTime() / 1000);
  return { token: `${id}.${exp}.${mac(key, id, exp)}`, id, expiresAt: new Date(exp * 1000) };
}

export type TokenProblem = { kind: 'malformed' } | { kind: 'bad-signature' } | { kind: 'expired'; expiredAt: Date };

/** Checks shape, MAC (constant time) and expiry; returns the random id to look up. */
export function verifyInviteToken(key: Uint8Array, token: string, now: Date): Result<{ id: string; expiresAt: Date }, TokenProblem> {
  const m = /^([a-z2-7]{32})\.(\d{9,11})\.([a-z2-7]{52})$/.exec(token);
  if (!m) return err({ kind: 'malformed' });
  const [, id = '', expText = '', given = ''] = m;
  const exp = Number(expText);
  const expected = Buffer.from(mac(key, id, exp));
  if (!timingSafeEqual(expected, Buffer.from(given))) return err({ kind: 'bad-signature' });
  const expiresAt = new Date(exp * 1000);
  if (expiresAt.getTime() <= now.getTime()) return err({ kind: 'expired', expiredAt: expiresAt });
  return ok({ id, expiresAt });
}

function mac(key: Uint8Array, id: string, exp: number): string {
  return encodeBase32LowerCaseNoPadding(createHmac('sha256', key).update(`${id}.${exp}`).digest());
}
