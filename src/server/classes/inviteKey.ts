// The HMAC key for invitation links: INVITE_SECRET when configured; otherwise 32 random bytes generated once
// and kept in server_secret (serverSecret.ts), so links survive restarts and every server process agrees on the key.
import { INVITE_SECRET } from 'astro:env/server';
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { serverSecret } from '../serverSecret.ts';

let cached: Uint8Array | undefined;

export async function inviteKey(db: Kysely<Database>): Promise<Uint8Array> {
  if (cached) return cached;
  if (INVITE_SECRET !== undefined && INVITE_SECRET.length > 0) {
    cached = new TextEncoder().encode(INVITE_SECRET);
    return cached;
  }
  cached = await serverSecret(db, 'invite-hmac');
  return cached;
}
