// Keys the server makes for itself: 32 random bytes generated once and kept in `server_secret`, so every server
// process agrees on them and they survive restarts. (Invitation links have their own, configurable key.)
import { randomBytes } from 'node:crypto';
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { findOrInsertServerSecret } from './serverSecret.repository.ts';

const cache = new Map<string, Uint8Array>();

export async function serverSecret(db: Kysely<Database>, name: string): Promise<Uint8Array> {
  const known = cache.get(name);
  if (known) return known;
  const value = await findOrInsertServerSecret(db, name, randomBytes(32).toString('base64'));
  const key = new Uint8Array(Buffer.from(value, 'base64'));
  cache.set(name, key);
  return key;
}
