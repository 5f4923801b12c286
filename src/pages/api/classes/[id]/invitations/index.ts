// /api/classes/:id/invitations — GET: invitations sent and their state; POST { emails: [...] }: send one e-mail
// invitation per address (signed, expiring, single-use link) → 201 { invitations }. Teacher and admins only.
import type { APIRoute } from 'astro';
import { PUBLIC_ORIGIN } from 'astro:env/server';
import { db } from '@server/db.ts';
import { json, problem, readJson } from '@server/http.ts';
import { requireUser } from '@server/auth/guards.ts';
import { findClassAccess, isManager } from '@server/classes/classAccess.ts';
import { badAddresses, inviteSchema } from '@server/classes/class.schema.ts';
import { inviteByEmail } from '@server/classes/invitation.service.ts';
import { listClassInvitations } from '@server/classes/invitation.repository.ts';
import { findAccountRowById } from '@server/accounts/account.repository.ts';

export const GET = (async ({ locals, params }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const access = await findClassAccess(db, signedIn.value.user, params['id']);
  if (!access || !isManager(access.standing)) return problem(404, 'not_found', 'Not found.');
  const rows = await listClassInvitations(db, access.cls.id);
  const now = Date.now();
  return json({
    invitations: rows.map((r) => ({
      id: r.id,
      email: r.email,
      sentAt: r.created_at.toISOString(),
      expiresAt: r.expires_at.toISOString(),
      usedAt: r.used_at?.toISOString() ?? null,
      usedBy: r.used_by_name,
      state: r.revoked_at ? 'revoked' : r.used_at ? 'accepted' : r.expires_at.getTime() <= now ? 'expired' : 'open',
    })),
  });
}) satisfies APIRoute;

export const POST = (async ({ locals, params, request, url }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const access = await findClassAccess(db, signedIn.value.user, params['id']);
  if (!access || !isManager(access.standing)) return problem(404, 'not_found', 'Not found.');
  const body = await readJson(request, inviteSchema);
  if (!body.ok) return body.error;
  const bad = badAddresses(body.value.emails);
  if (bad.length > 0) {
    // Nothing is sent: the teacher fixes the list and sends it again, so nobody gets two invitations.
    const named = bad.map((e) => (e === '' ? 'an empty line' : `“${e}”`)).join(', ');
    const message = `${bad.length === 1 ? 'This is' : 'These are'} not ${bad.length === 1 ? 'an e-mail address' : 'e-mail addresses'}: ${named}. Nothing was sent; fix ${bad.length === 1 ? 'it' : 'them'} and send again.`;
    return problem(400, 'invalid_input', message, { emails: `${bad.length === 1 ? 'Not an e-mail address' : 'Not e-mail addresses'}: ${named}.` });
  }
  const teacher = await findAccountRowById(db, access.cls.teacher_id);
  if (!teacher) throw new Error(`pages/api/classes/invitations: class ${access.cls.id} has no teacher row`);
  const sent = await inviteByEmail(db, access.cls, teacher.display_name, body.value.emails, PUBLIC_ORIGIN ?? url.origin);
  return json({ invitations: sent.map((s) => ({ id: s.id, email: s.email, expiresAt: s.expiresAt.toISOString(), delivered: s.delivered })) }, 201);
}) satisfies APIRoute;
