// POST /api/designs/:id/versions/:version/restore { baseVersion } — save that version again as the newest; { design }.
// 409 { error, design: current } when the design moved on since baseVersion. Figures follow in the background.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { readJson } from '@server/http.ts';
import { findDesignVersion } from '@server/designs/design.repository.ts';
import { restoreDesignVersion } from '@server/designs/design.service.ts';
import { baseVersionSchema, versionParamSchema } from '@server/designs/designApi.schema.ts';
import { requestDesignDerive } from '@server/designs/designDerive.ts';
import { conflict, designResponse, engineFailureResponse, notFound, requireOwnedDesign } from '@server/designs/designHttp.ts';
import { acceptStoredDesign } from '@server/designs/designPayload.ts';

export const POST = (async ({ locals, params, request }) => {
  const who = await requireOwnedDesign(locals, params);
  if (!who.ok) return who.error;
  const account = who.value.user.id;
  const version = versionParamSchema.safeParse(params['version']);
  if (!version.success) return notFound();
  const body = await readJson(request, baseVersionSchema);
  if (!body.ok) return body.error;
  const old = await findDesignVersion(db, who.value.row.id, version.data);
  if (!old) return notFound();
  const drawing = await acceptStoredDesign(old.data_json, account, true);
  if (!drawing.ok) return engineFailureResponse(drawing.error);
  const { designText, thumbnailSvg } = drawing.value;
  if (thumbnailSvg === null) throw new Error('api/designs/versions/restore: asked for a thumbnail');
  const saved = await restoreDesignVersion(db, account, who.value.row, { title: old.title, notes: old.notes, design: { text: designText, thumbnailSvg } }, body.value.baseVersion);
  if (saved.ok) {
    requestDesignDerive(saved.value);
    return designResponse(saved.value, account, 200, designText);
  }
  return saved.error.kind === 'conflict' ? conflict(saved.error.current, account) : notFound();
}) satisfies APIRoute;
