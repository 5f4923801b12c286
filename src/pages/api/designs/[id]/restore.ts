// POST /api/designs/:id/restore — undo a delete; { design }. Restoring a design that is not deleted returns it unchanged.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { restoreDesign } from '@server/designs/design.service.ts';
import { designResponse, notFound, requireDesignId } from '@server/designs/designHttp.ts';

export const POST = (async ({ locals, params }) => {
  const who = requireDesignId(locals, params);
  if (!who.ok) return who.error;
  const row = await restoreDesign(db, who.value.user.id, who.value.id);
  return row ? designResponse(row, who.value.user.id) : notFound();
}) satisfies APIRoute;
