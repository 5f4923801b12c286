// Creating an account from an invitation link ("create an account and join"). The link was e-mailed to one address,
// so holding it shows control of that mailbox: the account is created at once (no second e-mail) for that address
// only, and joins the class in the same transaction. Another address signs up the usual way (by e-mailed link).
// Saying "this address already has an account" here tells nothing to someone who could not read its mail anyway.
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { err, ok, type Result } from '@shared/result.ts';
import { insertAccount, rowToAccount, type Account } from '../accounts/account.repository.ts';
import type { SignUpInput } from '../accounts/signUpRequest.ts';
import { hashPassword } from '../auth/password.ts';
import { inTransaction } from '../transaction.repository.ts';
import { enrollStudent } from './class.repository.ts';
import { markInvitationUsed } from './invitation.repository.ts';
import { inspectInvitation, type InvitationProblem } from './invitation.service.ts';

export type InvitationSignUpProblem = InvitationProblem | { kind: 'other-email'; invited: string } | { kind: 'email-taken' };

class Abort extends Error {
  constructor(readonly problem: InvitationSignUpProblem) {
    super('server/classes/invitationSignUp: rolled back');
  }
}

export async function signUpFromInvitation(
  db: Kysely<Database>,
  token: string,
  input: SignUpInput,
  now = new Date(),
): Promise<Result<{ account: Account; passwordHash: string; classId: string }, InvitationSignUpProblem>> {
  const open = await inspectInvitation(db, token, now);
  if (!open.ok) return open;
  if (open.value.email.trim().toLowerCase() !== input.email.toLowerCase()) return err({ kind: 'other-email', invited: open.value.email });
  const passwordHash = await hashPassword(input.password);
  try {
    return await inTransaction(db, async (trx) => {
      const row = await insertAccount(trx, { email: input.email, displayName: input.displayName, passwordHash, units: input.units });
      if (!row) throw new Abort({ kind: 'email-taken' });
      if (!(await markInvitationUsed(trx, open.value.invitationId, row.id, now))) throw new Abort({ kind: 'used', usedAt: now });
      await enrollStudent(trx, open.value.classId, row.id, 'invitation');
      return ok({ account: rowToAccount(row), passwordHash, classId: open.value.classId });
    });
  } catch (error) {
    if (error instanceof Abort) return err(error.problem);
    throw error;
  }
}
