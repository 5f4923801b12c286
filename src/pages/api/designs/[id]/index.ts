// GET /api/designs/:id — { design }.
// PUT /api/designs/:id { baseVersion, title?, notes?, design? } — save a new version; 409 { error, design: current } when stale.
//   Returns at once; a new drawing's figures follow (`summaryPending`), computed in the background.
// PUT /api/designs/:id?check=1 — the same save, then one route check of the saved drawing: 200 { design, check,
//   checkError } (shared/contract/designs.ts savedWithCheckAnswerSchema). The design's figures are written from that
//   check (no second engine job); `check` is null and `checkError` says why when the engine refuses or is busy.
// DELETE /api/designs/:id — soft delete; { design: { id, deletedAt } } (undo: POST …/restore).
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json } from '@server/http.ts';
import { deleteDesign, drawingOf, updateDesign } from '@server/designs/design.service.ts';
import { readDesignBody } from '@server/designs/designBody.ts';
import { requestDesignDerive } from '@server/designs/designDerive.ts';
import { conflict, designResponse, notFound, requireOwnedDesign, savedWithCheckResponse } from '@server/designs/designHttp.ts';
import { checkSavedVersion } from '@server/designs/designRoute.service.ts';

export const GET = (async ({ locals, params }) => {
  const owned = await requireOwnedDesign(locals, params);
  if (!owned.ok) return owned.error;
  return designResponse(owned.value.row, owned.value.user.id);
}) satisfies APIRoute;

export const PUT = (async ({ locals, params, request, url }) => {
  // Owner first: someone else's design is 404 whatever the body says.
  const who = await requireOwnedDesign(locals, params);
  if (!who.ok) return who.error;
  const account = who.value.user.id;
  const body = await readDesignBody(request, 'update', account);
  if (!body.ok) return body.error;
  const { fields, design } = body.value;
  const saved = await updateDesign(db, account, who.value.row, { ...fields, ...(design ? { design: drawingOf(design) } : {}) });
  if (saved.ok && url.searchParams.get('check') === '1') {
    // The workbench's one request per edit burst: the version and its check (the row was read once, above).
    const checked = await checkSavedVersion(db, saved.value, design?.text ?? saved.value.data_json, request.signal);
    return savedWithCheckResponse(checked.row, account, design?.text, checked.check);
  }
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
