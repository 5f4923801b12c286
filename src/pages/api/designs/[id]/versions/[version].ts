// GET /api/designs/:id/versions/:version — one saved version: { version: { version, title, notes, design, savedAt } }.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { findDesignVersion } from '@server/designs/design.repository.ts';
import { versionParamSchema } from '@server/designs/designApi.schema.ts';
import { engineFailureResponse, notFound, requireOwnedDesign } from '@server/designs/designHttp.ts';
import { acceptStoredDesign, jsonText } from '@server/designs/designPayload.ts';
import { designVersionJsonText } from '@server/designs/designRecord.ts';

export const GET = (async ({ locals, params }) => {
  const owned = await requireOwnedDesign(locals, params);
  if (!owned.ok) return owned.error;
  const version = versionParamSchema.safeParse(params['version']);
  if (!version.success) return notFound();
  const row = await findDesignVersion(db, owned.value.row.id, version.data);
  if (!row) return notFound();
  const design = await acceptStoredDesign(row.data_json, owned.value.user.id);
  if (!design.ok) return engineFailureResponse(design.error);
  return jsonText(`{"version":${designVersionJsonText(row, design.value.designText)}}`);
}) satisfies APIRoute;
