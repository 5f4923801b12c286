// POST /api/designs/:id/versions/:version/restore { baseVersion } — save that version again as the newest; { design }.
// 409 { error, design: current } when the design moved on since baseVersion.
import type { APIRoute } from 'astro';
import { db } from '../../../../../../server/db.ts';
import { json, readJson } from '../../../../../../server/http.ts';
import { restoreDesignVersion } from '../../../../../../server/designs/design.service.ts';
import { baseVersionSchema, versionParamSchema } from '../../../../../../server/designs/designApi.schema.ts';
import { conflict, notFound, requireOwnedDesign, summarizeWithEngine } from '../../../../../../server/designs/designHttp.ts';
import { toDesignJson } from '../../../../../../server/designs/designRecord.ts';

export const POST = (async ({ locals, params, request }) => {
  const who = await requireOwnedDesign(locals, params);
  if (!who.ok) return who.error;
  const version = versionParamSchema.safeParse(params['version']);
  if (!version.success) return notFound();
  const body = await readJson(request, baseVersionSchema);
  if (!body.ok) return body.error;
  const saved = await restoreDesignVersion(db, summarizeWithEngine, who.value.user.id, who.value.row.id, version.data, body.value.baseVersion);
  if (saved.ok) return json({ design: toDesignJson(saved.value) });
  return saved.error.kind === 'conflict' ? conflict(saved.error.current) : notFound();
}) satisfies APIRoute;
