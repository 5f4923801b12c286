// /api/classes/:id/invitations/:invitationId — DELETE: revoke an invitation that was not used yet.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { problem } from '@server/http.ts';
import { requireUser } from '@server/auth/guards.ts';
import { findClassAccess, isManager, isUuid } from '@server/classes/classAccess.ts';
import { revokeOpenInvitation } from '@server/classes/invitation.repository.ts';

export const DELETE = (async ({ locals, params }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const access = await findClassAccess(db, signedIn.value.user, params['id']);
  const invitationId = params['invitationId'];
  if (!access || !isManager(access.standing) || !isUuid(invitationId)) return problem(404, 'not_found', 'Not found.');
  const revoked = await revokeOpenInvitation(db, access.cls.id, invitationId, new Date());
  return revoked ? new Response(null, { status: 204 }) : problem(404, 'not_found', 'Not found (or already accepted).');
}) satisfies APIRoute;
