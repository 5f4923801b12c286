// One sign-in attempt, limited before the password is hashed: an attempt is reserved on the caller's address and
// on the account (or, from a known device, on that device) in the database first, so a burst of parallel requests
// cannot pass a check none of them has counted yet. A success gives the address its attempt back and clears the
// account's (or device's) failures; the browser is remembered as a known device of the account.
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { err, ok, type Result } from '@shared/result.ts';
import { findAccountRowByEmail, rowToAccount, type Account } from '../accounts/account.repository.ts';
import { getDummyHash } from '../accounts/account.service.ts';
import { serverSecret } from '../serverSecret.ts';
import { clearAttempts, releaseAttempt, reserveAll } from './attemptGate.ts';
import { signInAccountGate, signInAddressGate, signInDeviceGate } from './authLimits.ts';
import { findDevice, newDeviceId, rememberDevice } from './knownDevice.ts';
import { verifyPassword } from './password.ts';

export type SignInRefusal =
  | { readonly kind: 'invalid-credentials' }
  /** `scope` says which limit: the caller's address, the account (unfamiliar devices) or this known device. */
  | { readonly kind: 'throttled'; readonly retryAt: Date; readonly scope: 'address' | 'account' | 'device' };

export interface SignInInput {
  readonly email: string;
  readonly password: string;
  /** From clientIp(). */
  readonly address: string;
  /** The tw_device cookie, if the browser sent one. */
  readonly deviceCookie: string | undefined;
}

export const deviceKey = (db: Kysely<Database>) => serverSecret(db, 'device-hmac');

export async function attemptSignIn(db: Kysely<Database>, input: SignInInput): Promise<Result<{ account: Account; deviceCookie: string }, SignInRefusal>> {
  const row = await findAccountRowByEmail(db, input.email);
  const key = await deviceKey(db);
  const deviceId = row ? findDevice(key, input.deviceCookie, { id: row.id, passwordHash: row.password_hash }) : null;
  const addressGate = signInAddressGate(input.address);
  // Keyed by the typed e-mail, not the account, so an unknown address is limited exactly like a known one.
  const ownGate = deviceId ? signInDeviceGate(deviceId) : signInAccountGate(input.email);
  const gate = await reserveAll(db, [addressGate, ownGate]);
  if (!gate.allowed) {
    const scope = gate.gate.key === addressGate.key ? 'address' : deviceId ? 'device' : 'account';
    return err({ kind: 'throttled', retryAt: gate.retryAt, scope });
  }
  const valid = await verifyPassword(row?.password_hash ?? (await getDummyHash()), input.password);
  if (!row || !valid) return err({ kind: 'invalid-credentials' });
  await releaseAttempt(db, addressGate.key);
  await clearAttempts(db, ownGate.key);
  const deviceCookie = rememberDevice(key, input.deviceCookie, { id: row.id, passwordHash: row.password_hash }, deviceId ?? newDeviceId());
  return ok({ account: rowToAccount(row), deviceCookie });
}
