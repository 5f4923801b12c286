// A new password closes everything the old one opened, whichever path changed it (account settings or a reset
// link): every unused reset link ends (here, and by the account_password_changed trigger for any other writer)
// and every session except the one making the change (none, for a reset link).
import type { Kysely, Transaction } from 'kysely';
import type { Database } from '@db/schema.ts';
import { setAccountPasswordHash } from '../accounts/account.repository.ts';
import { inTransaction } from '../transaction.repository.ts';
import { endUnusedPasswordResets } from './passwordReset.repository.ts';
import { invalidateAccountSessions } from './session.ts';

export async function setPasswordHash(trx: Transaction<Database>, accountId: string, passwordHash: string, keepSessionId?: string, now = new Date()): Promise<void> {
  await setAccountPasswordHash(trx, accountId, passwordHash, now);
  await endUnusedPasswordResets(trx, accountId, now);
  await invalidateAccountSessions(trx, accountId, keepSessionId);
}

/** Runs setPasswordHash in its own transaction. */
export async function changePasswordHash(db: Kysely<Database>, accountId: string, passwordHash: string, keepSessionId?: string): Promise<void> {
  await inTransaction(db, (trx) => setPasswordHash(trx, accountId, passwordHash, keepSessionId));
}
