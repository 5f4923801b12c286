// Class invitations by e-mail: a signed, expiring, single-use link per address (see inviteToken.ts).
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { err, ok, type Result } from '@shared/result.ts';
import { hashToken } from '../auth/session.ts';
import type { SessionUser } from '../auth/session.ts';
import { sendEmail } from '../mail/mailer.ts';
import { inTransaction } from '../transaction.repository.ts';
import { enrollStudent } from './class.repository.ts';
import { findInvitationByTokenHash, insertInvitation, markInvitationUsed } from './invitation.repository.ts';
import { classInvitationEmail } from './teachingEmails.ts';
import { inviteKey } from './inviteKey.ts';
import { signInviteToken, verifyInviteToken } from './inviteToken.ts';

export const INVITATION_VALID_DAYS = 14;
const DAY_MS = 24 * 60 * 60 * 1000;

export interface InvitationSent {
  id: string;
  email: string;
  expiresAt: Date;
  delivered: boolean;
}

/** One invitation (and e-mail) per address; `origin` is the site the link points at. */
export async function inviteByEmail(db: Kysely<Database>, cls: { id: string; title: string }, teacherName: string, emails: readonly string[], origin: string, now = new Date()): Promise<InvitationSent[]> {
  const key = await inviteKey(db);
  const out: InvitationSent[] = [];
  for (const email of new Set(emails.map((e) => e.trim()))) {
    const signed = signInviteToken(key, new Date(now.getTime() + INVITATION_VALID_DAYS * DAY_MS));
    const id = await insertInvitation(db, { classId: cls.id, email, tokenHash: hashToken(signed.id), expiresAt: signed.expiresAt });
    const link = new URL(`/invitations/${signed.token}`, origin).href;
    const sent = await sendEmail(db, classInvitationEmail(email, cls.title, teacherName, link, signed.expiresAt));
    out.push({ id, email, expiresAt: signed.expiresAt, delivered: sent.status === 'sent' });
  }
  return out;
}

export type InvitationProblem =
  | { kind: 'forged' }
  | { kind: 'expired'; expiredAt: Date }
  | { kind: 'used'; usedAt: Date }
  | { kind: 'revoked' };

export interface OpenInvitation {
  invitationId: string;
  classId: string;
  classTitle: string;
  teacherId: string;
  teacherName: string;
  email: string;
  expiresAt: Date;
}

/** What a link stands for, or why it cannot be used. Forged and unknown links get the same answer. */
export async function inspectInvitation(db: Kysely<Database>, token: string, now = new Date()): Promise<Result<OpenInvitation, InvitationProblem>> {
  const checked = verifyInviteToken(await inviteKey(db), token, now);
  if (!checked.ok) return checked.error.kind === 'expired' ? err(checked.error) : err({ kind: 'forged' });
  const row = await findInvitationByTokenHash(db, hashToken(checked.value.id));
  if (!row) return err({ kind: 'forged' });
  // A teacher demoted to quilter: their open invitations stop working, as if withdrawn (see classAccess.ts).
  if (row.revoked_at || row.teacher_role === 'quilter') return err({ kind: 'revoked' });
  if (row.used_at) return err({ kind: 'used', usedAt: row.used_at });
  if (row.expires_at.getTime() <= now.getTime()) return err({ kind: 'expired', expiredAt: row.expires_at });
  return ok({ invitationId: row.id, classId: row.class_id, classTitle: row.title, teacherId: row.teacher_id, teacherName: row.display_name, email: row.email, expiresAt: row.expires_at });
}

export type AcceptProblem = InvitationProblem | { kind: 'own-class' } | { kind: 'other-account'; invited: string; signedInAs: string };

/** True when the signed-in account is the one the invitation went to (addresses compare without case, as accounts do). */
export const isInvitedAccount = (invitedEmail: string, user: Pick<SessionUser, 'email'>): boolean => invitedEmail.trim().toLowerCase() === user.email.trim().toLowerCase();

/**
 * Uses the invitation for the signed-in account: marks it used (once — a conditional UPDATE, so two tabs cannot
 * both use it) and enrols the account. The invitation is bound to its address: only the account with that e-mail
 * may accept it (anyone else who got hold of the link is told to sign in as the invited address).
 */
export async function acceptInvitation(db: Kysely<Database>, user: SessionUser, token: string, now = new Date()): Promise<Result<{ classId: string }, AcceptProblem>> {
  const open = await inspectInvitation(db, token, now);
  if (!open.ok) return open;
  if (open.value.teacherId === user.id) return err({ kind: 'own-class' });
  if (!isInvitedAccount(open.value.email, user)) return err({ kind: 'other-account', invited: open.value.email, signedInAs: user.email });
  return inTransaction(db, async (trx) => {
    if (!(await markInvitationUsed(trx, open.value.invitationId, user.id, now))) return err({ kind: 'used' as const, usedAt: now });
    await enrollStudent(trx, open.value.classId, user.id, 'invitation');
    return ok({ classId: open.value.classId });
  });
}
