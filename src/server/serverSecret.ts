// Keys the server makes for itself: 32 random bytes generated once and kept in `server_secret`, so every server
// process agrees on them and they survive restarts. (Invitation links have their own, configurable key.)
import { randomBytes } from 'node:crypto';
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';

const cache = new Map<string, Uint8Array>();

export async function serverSecret(db: Kysely<Database>, name: string): Promise<Uint8Array> {
  const known = cache.get(name);
  if (known) return known;
  await db
    .insertInto('server_secret')
    .values({ name, value: randomBytes(32).toString('base64') })
    .onConflict((oc) => oc.column('name').doNothing())
    .execute();
  const row = await db.selectFrom('server_secret').select('value').where('name', '=', name).executeTakeFirstOrThrow();
  const key = new Uint8Array(Buffer.from(row.value, 'base64'));
  cache.set(name, key);
  return key;
}
