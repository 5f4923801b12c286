// POST /api/designs/:id/restore — undo a delete; { design }. Restoring a design that is not deleted returns it unchanged.
import type { APIRoute } from 'astro';
import { db } from '../../../../server/db.ts';
import { json } from '../../../../server/http.ts';
import { restoreDesign } from '../../../../server/designs/design.service.ts';
import { notFound, requireDesignId } from '../../../../server/designs/designHttp.ts';
import { toDesignJson } from '../../../../server/designs/designRecord.ts';

export const POST = (async ({ locals, params }) => {
  const who = requireDesignId(locals, params);
  if (!who.ok) return who.error;
  const row = await restoreDesign(db, who.value.user.id, who.value.id);
  return row ? json({ design: toDesignJson(row) }) : notFound();
}) satisfies APIRoute;
