// Sign-up in two steps, so the answer never says whether an address already has an account: the request always
// gets the same reply after the same work (one Argon2 hash), and the mailbox decides what happens next. A new
// address gets a link (SIGN_UP_VALID_HOURS) that creates the account; a registered one gets a note to its owner.
// The pending sign-up keeps only the password's hash and the SHA-256 of the token.
import type { Kysely } from 'kysely';
import type { Database, UnitsPreference } from '@db/schema.ts';
import { err, ok, type Result } from '@shared/result.ts';
import { hashPassword } from '../auth/password.ts';
import { generateSessionToken, hashToken } from '../auth/session.ts';
import { sendEmail, type OutgoingEmail } from '../mail/mailer.ts';
import { alreadyRegisteredEmail, confirmSignUpEmail } from '../mail/signUpEmails.ts';
import { inTransaction } from '../transaction.repository.ts';
import { findAccountRowByEmail, insertAccount, rowToAccount, type Account } from './account.repository.ts';
import { deleteExpiredSignUpRequests, deleteSignUpRequest, deleteSignUpRequestsFor, insertSignUpRequest, lockSignUpRequest } from './signUpRequest.repository.ts';

export const SIGN_UP_VALID_HOURS = 24;

export interface SignUpInput {
  email: string;
  displayName: string;
  password: string;
  units: UnitsPreference;
}

/** Sends the right e-mail for this address. Nothing about the outcome is returned, on purpose. */
export async function requestSignUp(db: Kysely<Database>, input: SignUpInput, origin: string, now = new Date()): Promise<void> {
  const passwordHash = await hashPassword(input.password);
  const existing = await findAccountRowByEmail(db, input.email);
  let mail: OutgoingEmail;
  if (existing) {
    mail = alreadyRegisteredEmail(existing.email, existing.display_name, origin);
  } else {
    const token = generateSessionToken();
    const expiresAt = new Date(now.getTime() + SIGN_UP_VALID_HOURS * 3_600_000);
    await insertSignUpRequest(db, { id: hashToken(token), email: input.email, displayName: input.displayName, passwordHash, units: input.units, expiresAt });
    mail = confirmSignUpEmail(input.email, input.displayName, new URL(`/sign-up/confirm?token=${token}`, origin).href, SIGN_UP_VALID_HOURS);
  }
  // Not awaited: delivery time must not tell the two cases apart. sendEmail records failures itself.
  void sendEmail(db, mail).catch((error: unknown) => console.error('[sign-up] could not queue the e-mail:', error));
}

export type ConfirmProblem = 'unknown' | 'expired' | 'taken';

/**
 * Creates the account from a pending sign-up, once: the request row is locked, and deleted with every other
 * pending sign-up for the address. 'taken' when the address got an account in the meantime.
 */
export async function confirmSignUp(db: Kysely<Database>, token: string, now = new Date()): Promise<Result<Account, ConfirmProblem>> {
  return inTransaction(db, async (trx) => {
    const row = await lockSignUpRequest(trx, hashToken(token));
    if (!row) return err('unknown' as const);
    if (row.expires_at.getTime() <= now.getTime()) {
      await deleteSignUpRequest(trx, row.id);
      return err('expired' as const);
    }
    await deleteSignUpRequestsFor(trx, row.email);
    const account = await insertAccount(trx, { email: row.email, displayName: row.display_name, passwordHash: row.password_hash, units: row.units });
    return account ? ok(rowToAccount(account)) : err('taken' as const);
  });
}

/** Removes pending sign-ups whose link has expired (called now and then). */
export async function pruneSignUpRequests(db: Kysely<Database>, now = new Date()): Promise<void> {
  await deleteExpiredSignUpRequests(db, now);
}
