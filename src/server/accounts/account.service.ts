// Account rules: sign-up, sign-in, settings and role changes. Expected failures are Result values,
// tagged by `kind`; the API routes turn them into HTTP answers.
import type { Kysely } from 'kysely';
import type { Database, Role, UnitsPreference } from '@db/schema.ts';
import { err, ok, type Result } from '@shared/result.ts';
import { hashPassword, verifyPassword } from '../auth/password.ts';
import { changePasswordHash } from '../auth/passwordChange.ts';
import { inTransaction } from '../transaction.repository.ts';
import {
  findAccountRowByEmail,
  findAccountRowById,
  lockAdminIds,
  rowToAccount,
  updateAccount,
  type Account,
} from './account.repository.ts';

// Verified against when the e-mail is unknown, so a wrong address costs the same Argon2 work as a wrong password
// (sign-in: src/server/auth/signInAttempt.ts; sign-up: src/server/accounts/signUpRequest.ts).
let dummyHash: Promise<string> | undefined;
export function getDummyHash(): Promise<string> {
  dummyHash ??= hashPassword('threadway-no-such-account-password');
  return dummyHash;
}

export async function updateProfile(db: Kysely<Database>, accountId: string, changes: { displayName?: string | undefined; units?: UnitsPreference | undefined }): Promise<Account> {
  const row = await updateAccount(db, accountId, {
    ...(changes.displayName !== undefined && { displayName: changes.displayName }),
    ...(changes.units !== undefined && { units: changes.units }),
  });
  if (!row) throw new Error(`server/accounts/account.service: account ${accountId} vanished during a profile update`);
  return rowToAccount(row);
}

async function checkCurrentPassword(db: Kysely<Database>, accountId: string, currentPassword: string): Promise<boolean> {
  const row = await findAccountRowById(db, accountId);
  return row !== undefined && (await verifyPassword(row.password_hash, currentPassword));
}

/** Changes the password; every reset link and every other session of the account ends (passwordChange.ts). */
export async function changePassword(
  db: Kysely<Database>,
  accountId: string,
  keepSessionId: string,
  input: { currentPassword: string; newPassword: string },
): Promise<Result<{ passwordHash: string }, { kind: 'wrong-password' }>> {
  if (!(await checkCurrentPassword(db, accountId, input.currentPassword))) return err({ kind: 'wrong-password' });
  const passwordHash = await hashPassword(input.newPassword);
  await changePasswordHash(db, accountId, passwordHash, keepSessionId);
  return ok({ passwordHash });
}

export async function changeEmail(
  db: Kysely<Database>,
  accountId: string,
  input: { currentPassword: string; email: string },
): Promise<Result<{ account: Account; previousEmail: string }, { kind: 'wrong-password' } | { kind: 'email-taken' }>> {
  const current = await findAccountRowById(db, accountId);
  if (!current || !(await verifyPassword(current.password_hash, input.currentPassword))) return err({ kind: 'wrong-password' });
  const holder = await findAccountRowByEmail(db, input.email);
  if (holder && holder.id !== accountId) return err({ kind: 'email-taken' });
  try {
    const row = await updateAccount(db, accountId, { email: input.email });
    if (!row) throw new Error(`server/accounts/account.service: account ${accountId} vanished during an e-mail change`);
    return ok({ account: rowToAccount(row), previousEmail: current.email });
  } catch (error) {
    // Another request took the address between the check and the update.
    if (isUniqueViolation(error)) return err({ kind: 'email-taken' });
    throw error;
  }
}

/** Sets a role. The last admin cannot be demoted: admin rows are locked while this is decided. */
export async function setRole(
  db: Kysely<Database>,
  accountId: string,
  role: Role,
): Promise<Result<Account, { kind: 'not-found' } | { kind: 'last-admin' }>> {
  return inTransaction(db, async (trx) => {
    const admins = await lockAdminIds(trx);
    const target = await findAccountRowById(trx, accountId);
    if (!target) return err({ kind: 'not-found' as const });
    if (target.role === 'admin' && role !== 'admin' && admins.length <= 1) return err({ kind: 'last-admin' as const });
    if (target.role === role) return ok(rowToAccount(target));
    const row = await updateAccount(trx, accountId, { role });
    if (!row) throw new Error(`server/accounts/account.service: account ${accountId} vanished during a role change`);
    return ok(rowToAccount(row));
  });
}

function isUniqueViolation(error: unknown): boolean {
  return typeof error === 'object' && error !== null && 'code' in error && (error as { code: unknown }).code === '23505';
}
