// POST /api/designs/:id/duplicate — a copy titled "Copy of …" (version 1; a current saved route comes along); 201 { design }.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { duplicateDesign } from '@server/designs/design.service.ts';
import { requestDesignDerive } from '@server/designs/designDerive.ts';
import { designResponse, notFound, requireDesignId } from '@server/designs/designHttp.ts';

export const POST = (async ({ locals, params }) => {
  const who = requireDesignId(locals, params);
  if (!who.ok) return who.error;
  const row = await duplicateDesign(db, who.value.user.id, who.value.id);
  if (!row) return notFound();
  if (row.summary_version !== row.version) requestDesignDerive(row);
  return designResponse(row, who.value.user.id, 201);
}) satisfies APIRoute;
