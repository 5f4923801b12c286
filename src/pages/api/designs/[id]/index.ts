// GET /api/designs/:id — { design }.
// PUT /api/designs/:id { baseVersion, title?, notes?, design? } — save a new version; 409 { error, design: current } when stale.
//   Returns at once; a new drawing's figures follow (`summaryPending`), computed in the background.
// DELETE /api/designs/:id — soft delete; { design: { id, deletedAt } } (undo: POST …/restore).
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json } from '@server/http.ts';
import { deleteDesign, drawingOf, updateDesign } from '@server/designs/design.service.ts';
import { readDesignBody } from '@server/designs/designBody.ts';
import { requestDesignDerive } from '@server/designs/designDerive.ts';
import { conflict, designResponse, notFound, requireOwnedDesign } from '@server/designs/designHttp.ts';

export const GET = (async ({ locals, params }) => {
  const owned = await requireOwnedDesign(locals, params);
  if (!owned.ok) return owned.error;
  return designResponse(owned.value.row, owned.value.user.id);
}) satisfies APIRoute;

export const PUT = (async ({ locals, params, request }) => {
  // Owner first: someone else's design is 404 whatever the body says.
  const who = await requireOwnedDesign(locals, params);
  if (!who.ok) return who.error;
  const account = who.value.user.id;
  const body = await readDesignBody(request, 'update', account);
  if (!body.ok) return body.error;
  const { fields, design } = body.value;
  const saved = await updateDesign(db, account, who.value.row, { ...fields, ...(design ? { design: drawingOf(design) } : {}) });
  if (saved.ok) {
    if (design) requestDesignDerive(saved.value);
    return designResponse(saved.value, account, 200, design?.text);
  }
  return saved.error.kind === 'conflict' ? conflict(saved.error.current, account) : notFound();
}) satisfies APIRoute;

export const DELETE = (async ({ locals, params }) => {
  const who = await requireOwnedDesign(locals, params);
  if (!who.ok) return who.error;
  const row = await deleteDesign(db, who.value.user.id, who.value.row.id);
  if (!row?.deleted_at) return notFound();
  return json({ design: { id: row.id, deletedAt: row.deleted_at.toISOString() } });
}) satisfies APIRoute;
