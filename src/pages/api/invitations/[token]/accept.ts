// /api/invitations/:token/accept — POST: the signed-in account uses the invitation and joins the class
// → { classId }. The link works once; refusals as for GET /api/invitations/:token.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json } from '@server/http.ts';
import { requireUser } from '@server/auth/guards.ts';
import { acceptInvitation } from '@server/classes/invitation.service.ts';
import { invitationProblemResponse } from '@server/classes/invitationErrors.ts';

export const POST = (async ({ locals, params }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const accepted = await acceptInvitation(db, signedIn.value.user, params['token'] ?? '');
  if (!accepted.ok) return invitationProblemResponse(accepted.error);
  return json(accepted.value);
}) satisfies APIRoute;
