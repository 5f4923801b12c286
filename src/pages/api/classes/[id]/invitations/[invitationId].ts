// /api/classes/:id/invitations/:invitationId — DELETE: revoke an invitation that was not used yet.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { problem } from '@server/http.ts';
import { requireUser } from '@server/auth/guards.ts';
import { findClassAccess, isManager, isUuid } from '@server/classes/classAccess.ts';

export const DELETE = (async ({ locals, params }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const access = await findClassAccess(db, signedIn.value.user, params['id']);
  const invitationId = params['invitationId'];
  if (!access || !isManager(access.standing) || !isUuid(invitationId)) return problem(404, 'not_found', 'Not found.');
  const r = await db
    .updateTable('class_invitation')
    .set({ revoked_at: new Date() })
    .where('id', '=', invitationId)
    .where('class_id', '=', access.cls.id)
    .where('used_at', 'is', null)
    .returning('id')
    .executeTakeFirst();
  return r ? new Response(null, { status: 204 }) : problem(404, 'not_found', 'Not found (or already accepted).');
}) satisfies APIRoute;
