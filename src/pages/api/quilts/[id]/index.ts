// GET /api/quilts/:id — { quilt } (owner only: anyone else gets 404, as for a quilt that does not exist).
// PUT /api/quilts/:id { baseVersion, title?, quilt? } — save; 409 { error, quilt } when baseVersion is stale.
// DELETE /api/quilts/:id — soft delete; { quilt: { id, deletedAt } }.
import type { APIRoute } from 'astro';
import { updateQuiltSchema } from '@shared/contract/quilts.ts';
import { db } from '@server/db.ts';
import { json, readJson } from '@server/http.ts';
import { requireUser } from '@server/auth/guards.ts';
import { deleteQuilt, findQuilt, toQuiltRecord, updateQuilt } from '@server/quilts/quilt.service.ts';
import { QUILT_BODY_LIMIT, quiltFailureResponse, quiltNotFound } from '@server/quilts/quiltHttp.ts';

export const GET = (async ({ locals, params }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const row = await findQuilt(db, signedIn.value.user.id, params['id'] ?? '');
  return row ? json({ quilt: toQuiltRecord(row) }) : quiltNotFound();
}) satisfies APIRoute;

export const PUT = (async ({ locals, params, request }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const account = signedIn.value.user.id;
  // The owner guard comes before the body, so a stranger learns nothing from validation messages.
  const row = await findQuilt(db, account, params['id'] ?? '');
  if (!row) return quiltNotFound();
  const body = await readJson(request, updateQuiltSchema, QUILT_BODY_LIMIT);
  if (!body.ok) return body.error;
  const saved = await updateQuilt(db, account, row.id, body.value);
  return saved.ok ? json({ quilt: toQuiltRecord(saved.value) }) : quiltFailureResponse(saved.error);
}) satisfies APIRoute;

export const DELETE = (async ({ locals, params }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const row = await deleteQuilt(db, signedIn.value.user.id, params['id'] ?? '');
  if (!row?.deleted_at) return quiltNotFound();
  return json({ quilt: { id: row.id, deletedAt: row.deleted_at.toISOString() } });
}) satisfies APIRoute;
