// GET /api/designs/:id/versions/:version — one saved version: { version: { version, title, notes, design, savedAt } }.
import type { APIRoute } from 'astro';
import { db } from '../../../../../server/db.ts';
import { json } from '../../../../../server/http.ts';
import { findDesignVersion } from '../../../../../server/designs/design.repository.ts';
import { versionParamSchema } from '../../../../../server/designs/designApi.schema.ts';
import { notFound, requireOwnedDesign } from '../../../../../server/designs/designHttp.ts';
import { toDesignVersionJson } from '../../../../../server/designs/designRecord.ts';

export const GET = (async ({ locals, params }) => {
  const owned = await requireOwnedDesign(locals, params);
  if (!owned.ok) return owned.error;
  const version = versionParamSchema.safeParse(params['version']);
  if (!version.success) return notFound();
  const row = await findDesignVersion(db, owned.value.row.id, version.data);
  return row ? json({ version: toDesignVersionJson(row) }) : notFound();
}) satisfies APIRoute;
