// Queries on `class_invitation` (only the SHA-256 of a link's id is stored). Rules live in invitation.service.ts.
import type { Kysely, Transaction } from 'kysely';
import type { Database } from '@db/schema.ts';

type Db = Kysely<Database> | Transaction<Database>;

export async function insertInvitation(db: Db, v: { classId: string; email: string; tokenHash: string; expiresAt: Date }): Promise<string> {
  const row = await db
    .insertInto('class_invitation')
    .values({ class_id: v.classId, email: v.email, token_hash: v.tokenHash, expires_at: v.expiresAt })
    .returning('id')
    .executeTakeFirstOrThrow();
  return row.id;
}

/** The invitation a link stands for, with its class and the class's teacher (current role). */
export async function findInvitationByTokenHash(db: Db, tokenHash: string) {
  return db
    .selectFrom('class_invitation as i')
    .innerJoin('class', 'class.id', 'i.class_id')
    .innerJoin('account as teacher', 'teacher.id', 'class.teacher_id')
    .select(['i.id', 'i.email', 'i.expires_at', 'i.used_at', 'i.revoked_at', 'class.id as class_id', 'class.title', 'class.teacher_id', 'teacher.display_name', 'teacher.role as teacher_role'])
    .where('i.token_hash', '=', tokenHash)
    .executeTakeFirst();
}

/** Marks the invitation used by `accountId` unless it already is (one conditional UPDATE); false when it was. */
export async function markInvitationUsed(db: Db, id: string, accountId: string, now: Date): Promise<boolean> {
  const used = await db
    .updateTable('class_invitation')
    .set({ used_at: now, used_by: accountId })
    .where('id', '=', id)
    .where('used_at', 'is', null)
    .returning('id')
    .executeTakeFirst();
  return used !== undefined;
}

/** Revokes the class's invitation if it was not used yet; false when there is no such open invitation. */
export async function revokeOpenInvitation(db: Db, classId: string, id: string, now: Date): Promise<boolean> {
  const r = await db
    .updateTable('class_invitation')
    .set({ revoked_at: now })
    .where('id', '=', id)
    .where('class_id', '=', classId)
    .where('used_at', 'is', null)
    .returning('id')
    .executeTakeFirst();
  return r !== undefined;
}

/** The class's invitations, newest first, with the name of the account that used each (at most `limit`). */
export async function listClassInvitations(db: Db, classId: string, limit?: number) {
  let q = db
    .selectFrom('class_invitation as i')
    .leftJoin('account as a', 'a.id', 'i.used_by')
    .select(['i.id', 'i.email', 'i.expires_at', 'i.used_at', 'i.revoked_at', 'i.created_at', 'a.display_name as used_by_name'])
    .where('i.class_id', '=', classId)
    .orderBy('i.created_at', 'desc');
  if (limit !== undefined) q = q.limit(limit);
  return q.execute();
}
