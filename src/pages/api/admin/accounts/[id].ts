// PATCH /api/admin/accounts/:id — admins only: change an account's role. The last admin stays an admin.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json, problem, readJson } from '@server/http.ts';
import { accountIdSchema, roleChangeSchema } from '@server/accounts/account.schema.ts';
import { setRole } from '@server/accounts/account.service.ts';
import { toAccountJson } from '@server/accounts/accountJson.ts';
import { requireRole } from '@server/auth/guards.ts';

export const PATCH = (async ({ locals, request, params }) => {
  const admin = requireRole(locals, 'admin');
  if (!admin.ok) return admin.error;
  const id = accountIdSchema.safeParse(params['id']);
  if (!id.success) return problem(404, 'not_found', 'No such account.', { id: 'Not a valid account id.' });
  const body = await readJson(request, roleChangeSchema);
  if (!body.ok) return body.error;
  const result = await setRole(db, id.data, body.value.role);
  if (!result.ok) {
    if (result.error.kind === 'not-found') return problem(404, 'not_found', 'No such account.');
    const why = 'This is the only admin account, and there must always be one admin so that someone can change roles. Make someone else an admin first.';
    return problem(409, 'last_admin', why, { role: why });
  }
  return json({ account: toAccountJson(result.value) });
}) satisfies APIRoute;
