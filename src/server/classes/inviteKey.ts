// The HMAC key for invitation links: INVITE_SECRET when configured; otherwise 32 random bytes generated once
// and kept in server_secret, so links survive restarts and every server process agrees on the key.
import { randomBytes } from 'node:crypto';
import { INVITE_SECRET } from 'astro:env/server';
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';

let cached: Uint8Array | undefined;

export async function inviteKey(db: Kysely<Database>): Promise<Uint8Array> {
  if (cached) return cached;
  if (INVITE_SECRET !== undefined && INVITE_SECRET.length > 0) {
    cached = new TextEncoder().encode(INVITE_SECRET);
    return cached;
  }
  await db
    .insertInto('server_secret')
    .values({ name: 'invite-hmac', value: randomBytes(32).toString('base64') })
    .onConflict((oc) => oc.column('name').doNothing())
    .execute();
  const row = await db.selectFrom('server_secret').select('value').where('name', '=', 'invite-hmac').executeTakeFirstOrThrow();
  cached = new Uint8Array(Buffer.from(row.value, 'base64'));
  return cached;
}
