// Queries on `session` (joined with its account when a cookie is checked). Rules (expiry, renewal) live in session.ts.
import type { Kysely, Transaction } from 'kysely';
import type { Database } from '@db/schema.ts';

type Db = Kysely<Database> | Transaction<Database>;

export async function insertSession(db: Db, v: { id: string; accountId: string; expiresAt: Date }): Promise<void> {
  await db.insertInto('session').values({ id: v.id, account_id: v.accountId, expires_at: v.expiresAt }).execute();
}

/** The session with this id and the account it signs in (the account's current role and units). */
export async function findSessionWithAccount(db: Db, id: string) {
  return db
    .selectFrom('session')
    .innerJoin('account', 'account.id', 'session.account_id')
    .select(['session.id', 'session.expires_at', 'account.id as account_id', 'account.email', 'account.display_name', 'account.role', 'account.units', 'account.created_at'])
    .where('session.id', '=', id)
    .executeTakeFirst();
}

export async function setSessionExpiry(db: Db, id: string, expiresAt: Date): Promise<void> {
  await db.updateTable('session').set({ expires_at: expiresAt }).where('id', '=', id).execute();
}

export async function deleteSession(db: Db, id: string): Promise<void> {
  await db.deleteFrom('session').where('id', '=', id).execute();
}

/** Deletes every session of the account, except `keepSessionId` when given. */
export async function deleteAccountSessions(db: Db, accountId: string, keepSessionId?: string): Promise<void> {
  let q = db.deleteFrom('session').where('account_id', '=', accountId);
  if (keepSessionId) q = q.where('id', '!=', keepSessionId);
  await q.execute();
}
