// Queries on `sign_up_request` (a pending sign-up: the password's hash and the SHA-256 of the e-mailed token).
import { sql, type Kysely, type Transaction } from 'kysely';
import type { Database, UnitsPreference } from '@db/schema.ts';

type Db = Kysely<Database> | Transaction<Database>;

export async function insertSignUpRequest(
  db: Db,
  v: { id: string; email: string; displayName: string; passwordHash: string; units: UnitsPreference; expiresAt: Date },
): Promise<void> {
  await db
    .insertInto('sign_up_request')
    .values({ id: v.id, email: v.email, display_name: v.displayName, password_hash: v.passwordHash, units: v.units, expires_at: v.expiresAt })
    .execute();
}

/** The pending sign-up, locked FOR UPDATE until the transaction ends (a link creates one account, once). */
export async function lockSignUpRequest(trx: Transaction<Database>, id: string) {
  return trx.selectFrom('sign_up_request').selectAll().where('id', '=', id).forUpdate().executeTakeFirst();
}

export async function deleteSignUpRequest(db: Db, id: string): Promise<void> {
  await db.deleteFrom('sign_up_request').where('id', '=', id).execute();
}

/** Deletes every pending sign-up for the address (any case, as the account's unique index compares). */
export async function deleteSignUpRequestsFor(db: Db, email: string): Promise<void> {
  await db.deleteFrom('sign_up_request').where(sql<string>`lower(email)`, '=', email.toLowerCase()).execute();
}

export async function deleteExpiredSignUpRequests(db: Db, now: Date): Promise<void> {
  await db.deleteFrom('sign_up_request').where('expires_at', '<=', now).execute();
}
