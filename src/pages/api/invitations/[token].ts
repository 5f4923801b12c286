// /api/invitations/:token — GET (anyone holding the link): what the invitation is for
// → { class: { id, title }, teacher: { displayName }, email, expiresAt }, or a clear refusal:
// 400 for a link that is not ours (forged, altered, cut off), 410 for an expired, used or withdrawn one.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json } from '@server/http.ts';
import { inspectInvitation } from '@server/classes/invitation.service.ts';
import { invitationProblemResponse } from '@server/classes/invitationErrors.ts';

export const GET = (async ({ params }) => {
  const open = await inspectInvitation(db, params['token'] ?? '');
  if (!open.ok) return invitationProblemResponse(open.error);
  const v = open.value;
  return json({ class: { id: v.classId, title: v.classTitle }, teacher: { displayName: v.teacherName }, email: v.email, expiresAt: v.expiresAt.toISOString() });
}) satisfies APIRoute;
