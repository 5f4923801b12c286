// /api/account — GET: the signed-in account; PATCH: change display name and/or units preference.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json, problem, readJson } from '@server/http.ts';
import { profileUpdateSchema } from '@server/accounts/account.schema.ts';
import { findAccountRowById, rowToAccount } from '@server/accounts/account.repository.ts';
import { updateProfile } from '@server/accounts/account.service.ts';
import { toAccountJson } from '@server/accounts/accountJson.ts';
import { requireUser } from '@server/auth/guards.ts';

export const GET = (async ({ locals }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const row = await findAccountRowById(db, signedIn.value.user.id);
  if (!row) return problem(404, 'not_found', 'Not found.');
  return json({ account: toAccountJson(rowToAccount(row)) });
}) satisfies APIRoute;

export const PATCH = (async ({ locals, request }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const body = await readJson(request, profileUpdateSchema);
  if (!body.ok) return body.error;
  const account = await updateProfile(db, signedIn.value.user.id, body.value);
  return json({ account: toAccountJson(account) });
}) satisfies APIRoute;
