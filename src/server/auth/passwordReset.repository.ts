// Queries on `password_reset` (only a token's SHA-256 is stored). Rules live in passwordReset.ts and passwordChange.ts.
import type { Kysely, Transaction } from 'kysely';
import type { Database } from '@db/schema.ts';

type Db = Kysely<Database> | Transaction<Database>;

export async function insertPasswordReset(db: Db, v: { id: string; accountId: string; expiresAt: Date }): Promise<void> {
  await db.insertInto('password_reset').values({ id: v.id, account_id: v.accountId, expires_at: v.expiresAt }).execute();
}

/** The reset row, locked FOR UPDATE until the transaction ends (a link cannot be used twice at once). */
export async function lockPasswordReset(trx: Transaction<Database>, id: string) {
  return trx.selectFrom('password_reset').selectAll().where('id', '=', id).forUpdate().executeTakeFirst();
}

/** Marks every unused reset link of the account used. */
export async function endUnusedPasswordResets(db: Db, accountId: string, now: Date): Promise<void> {
  await db.updateTable('password_reset').set({ used_at: now }).where('account_id', '=', accountId).where('used_at', 'is', null).execute();
}
