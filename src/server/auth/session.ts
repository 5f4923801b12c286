// Database sessions: the cookie carries a random token; the `session` table keeps only its SHA-256.
// Sliding expiry: a session lives SESSION_DAYS; when fewer than REFRESH_DAYS remain, a request renews it.
import type { AstroCookies } from 'astro';
import { sha256 } from '@oslojs/crypto/sha2';
import { encodeBase32LowerCaseNoPadding, encodeHexLowerCase } from '@oslojs/encoding';
import type { Kysely, Transaction } from 'kysely';
import type { Database, Role, UnitsPreference } from '@db/schema.ts';
import { deleteAccountSessions, deleteSession, findSessionWithAccount, insertSession, setSessionExpiry } from './session.repository.ts';

export interface SessionUser {
  id: string;
  email: string;
  displayName: string;
  role: Role;
  units: UnitsPreference;
  createdAt: Date;
}
export interface SessionInfo {
  id: string;
  expiresAt: Date;
}
export type SessionValidation = { session: SessionInfo; user: SessionUser; refreshed: boolean } | { session: null; user: null; refreshed: false };

export const SESSION_COOKIE = 'tw_session';
const DAY_MS = 24 * 60 * 60 * 1000;
export const SESSION_DAYS = 30;
export const REFRESH_DAYS = 15;

/** 20 random bytes, base32 lowercase without padding (32 characters). Goes only into the cookie. */
export function generateSessionToken(): string {
  return encodeBase32LowerCaseNoPadding(crypto.getRandomValues(new Uint8Array(20)));
}

/** The stored id of a token: SHA-256, hex. Also used for password-reset tokens. */
export function hashToken(token: string): string {
  return encodeHexLowerCase(sha256(new TextEncoder().encode(token)));
}

export async function createSession(db: Kysely<Database>, token: string, accountId: string, now = new Date()): Promise<SessionInfo> {
  const session = { id: hashToken(token), expiresAt: new Date(now.getTime() + SESSION_DAYS * DAY_MS) };
  await insertSession(db, { id: session.id, accountId, expiresAt: session.expiresAt });
  return session;
}

/** Looks the token up; deletes an expired session; renews one that is past half its life. */
export async function validateSessionToken(db: Kysely<Database>, token: string, now = new Date()): Promise<SessionValidation> {
  const id = hashToken(token);
  const row = await findSessionWithAccount(db, id);
  if (!row) return { session: null, user: null, refreshed: false };
  if (row.expires_at.getTime() <= now.getTime()) {
    await deleteSession(db, id);
    return { session: null, user: null, refreshed: false };
  }
  const session: SessionInfo = { id, expiresAt: row.expires_at };
  let refreshed = false;
  if (row.expires_at.getTime() - now.getTime() < REFRESH_DAYS * DAY_MS) {
    session.expiresAt = new Date(now.getTime() + SESSION_DAYS * DAY_MS);
    await setSessionExpiry(db, id, session.expiresAt);
    refreshed = true;
  }
  const user: SessionUser = { id: row.account_id, email: row.email, displayName: row.display_name, role: row.role, units: row.units, createdAt: row.created_at };
  return { session, user, refreshed };
}

export async function invalidateSession(db: Kysely<Database>, sessionId: string): Promise<void> {
  await deleteSession(db, sessionId);
}

/** Signs the account out everywhere, optionally keeping one session (the one changing its password). */
export async function invalidateAccountSessions(db: Kysely<Database> | Transaction<Database>, accountId: string, keepSessionId?: string): Promise<void> {
  await deleteAccountSessions(db, accountId, keepSessionId);
}

/** HttpOnly, SameSite=Lax; Secure whenever the request itself came over https. */
export function setSessionCookie(cookies: AstroCookies, url: URL, token: string, expiresAt: Date): void {
  cookies.set(SESSION_COOKIE, token, { httpOnly: true, sameSite: 'lax', secure: url.protocol === 'https:', path: '/', expires: expiresAt });
}

export function deleteSessionCookie(cookies: AstroCookies, url: URL): void {
  cookies.set(SESSION_COOKIE, '', { httpOnly: true, sameSite: 'lax', secure: url.protocol === 'https:', path: '/', maxAge: 0 });
}
