// Password-reset tokens: 20 random bytes (base32) e-mailed as a link; only the SHA-256 is stored.
// A token works once and for RESET_VALID_MINUTES; using it revokes every session of the account.
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { err, ok, type Result } from '@shared/result.ts';
import { inTransaction } from '../transaction.repository.ts';
import { setPasswordHash } from './passwordChange.ts';
import { insertPasswordReset, lockPasswordReset } from './passwordReset.repository.ts';
import { generateSessionToken, hashToken } from './session.ts';

export const RESET_VALID_MINUTES = 60;

export async function createPasswordReset(db: Kysely<Database>, accountId: string, now = new Date()): Promise<string> {
  const token = generateSessionToken();
  await insertPasswordReset(db, { id: hashToken(token), accountId, expiresAt: new Date(now.getTime() + RESET_VALID_MINUTES * 60_000) });
  return token;
}

export type ResetTokenError = 'unknown' | 'expired' | 'used';

/**
 * Sets the new password hash if the token is valid, marks the token used and signs the account out
 * everywhere, all in one transaction (the token row is locked so it cannot be used twice at once).
 */
export async function consumePasswordReset(
  db: Kysely<Database>,
  token: string,
  passwordHash: string,
  now = new Date(),
): Promise<Result<{ accountId: string }, ResetTokenError>> {
  return inTransaction(db, async (trx) => {
    const row = await lockPasswordReset(trx, hashToken(token));
    if (!row) return err('unknown' as const);
    if (row.used_at) return err('used' as const);
    if (row.expires_at.getTime() <= now.getTime()) return err('expired' as const);
    // Marks this link and every other unused one used, and signs the account out everywhere.
    await setPasswordHash(trx, row.account_id, passwordHash, undefined, now);
    return ok({ accountId: row.account_id });
  });
}
