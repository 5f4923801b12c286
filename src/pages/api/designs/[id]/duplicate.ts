// POST /api/designs/:id/duplicate — a copy titled "Copy of …" (version 1; a current saved route comes along); 201 { design }.
import type { APIRoute } from 'astro';
import { db } from '../../../../server/db.ts';
import { json } from '../../../../server/http.ts';
import { duplicateDesign } from '../../../../server/designs/design.service.ts';
import { notFound, requireDesignId } from '../../../../server/designs/designHttp.ts';
import { toDesignJson } from '../../../../server/designs/designRecord.ts';

export const POST = (async ({ locals, params }) => {
  const who = requireDesignId(locals, params);
  if (!who.ok) return who.error;
  const row = await duplicateDesign(db, who.value.user.id, who.value.id);
  return row ? json({ design: toDesignJson(row) }, 201) : notFound();
}) satisfies APIRoute;
