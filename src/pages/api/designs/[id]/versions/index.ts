// GET /api/designs/:id/versions — saved versions, newest first: { versions: [{ version, title, savedAt, lines, seams }] }.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json } from '@server/http.ts';
import { listDesignVersions } from '@server/designs/design.repository.ts';
import { requireOwnedDesign } from '@server/designs/designHttp.ts';

export const GET = (async ({ locals, params }) => {
  const owned = await requireOwnedDesign(locals, params);
  if (!owned.ok) return owned.error;
  const rows = await listDesignVersions(db, owned.value.row.id);
  return json({
    current: owned.value.row.version,
    versions: rows.map((r) => ({ version: r.version, title: r.title, savedAt: r.saved_at.toISOString(), lines: r.line_count, seams: r.seam_count })),
  });
}) satisfies APIRoute;
