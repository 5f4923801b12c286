// GET /api/designs/:id — { design }.
// PUT /api/designs/:id { baseVersion, title?, notes?, design? } — save a new version; 409 { error, design: current } when stale.
// DELETE /api/designs/:id — soft delete; { design: { id, deletedAt } } (undo: POST …/restore).
import type { APIRoute } from 'astro';
import { db } from '../../../../server/db.ts';
import { json, readJson } from '../../../../server/http.ts';
import { deleteDesign, updateDesign } from '../../../../server/designs/design.service.ts';
import { DESIGN_BODY_LIMIT, updateDesignSchema } from '../../../../server/designs/designApi.schema.ts';
import { conflict, notFound, requireOwnedDesign, summarizeWithEngine } from '../../../../server/designs/designHttp.ts';
import { toDesignJson } from '../../../../server/designs/designRecord.ts';

export const GET = (async ({ locals, params }) => {
  const owned = await requireOwnedDesign(locals, params);
  if (!owned.ok) return owned.error;
  return json({ design: toDesignJson(owned.value.row) });
}) satisfies APIRoute;

export const PUT = (async ({ locals, params, request }) => {
  // Owner first: someone else's design is 404 whatever the body says.
  const who = await requireOwnedDesign(locals, params);
  if (!who.ok) return who.error;
  const body = await readJson(request, updateDesignSchema, DESIGN_BODY_LIMIT);
  if (!body.ok) return body.error;
  const saved = await updateDesign(db, summarizeWithEngine, who.value.user.id, who.value.row.id, body.value);
  if (saved.ok) return json({ design: toDesignJson(saved.value) });
  return saved.error.kind === 'conflict' ? conflict(saved.error.current) : notFound();
}) satisfies APIRoute;

export const DELETE = (async ({ locals, params }) => {
  const who = await requireOwnedDesign(locals, params);
  if (!who.ok) return who.error;
  const row = await deleteDesign(db, who.value.user.id, who.value.row.id);
  if (!row?.deleted_at) return notFound();
  return json({ design: { id: row.id, deletedAt: row.deleted_at.toISOString() } });
}) satisfies APIRoute;
