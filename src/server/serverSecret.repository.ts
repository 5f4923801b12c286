// Queries on `server_secret`: named keys the server makes once and every process then shares.
import type { Kysely, Transaction } from 'kysely';
import type { Database } from '@db/schema.ts';

/** The stored value under `name`, storing `fresh` first when there is none (the first writer wins a race). */
export async function findOrInsertServerSecret(db: Kysely<Database> | Transaction<Database>, name: string, fresh: string): Promise<string> {
  await db
    .insertInto('server_secret')
    .values({ name, value: fresh })
    .onConflict((oc) => oc.column('name').doNothing())
    .execute();
  const row = await db.selectFrom('server_secret').select('value').where('name', '=', name).executeTakeFirstOrThrow();
  return row.value;
}
