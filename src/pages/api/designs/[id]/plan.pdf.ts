// GET /api/designs/:id/plan.pdf?layout=page|tiles — the design's printable plan (owner only, as GET /api/designs/:id):
// the block with numbered steps and arrows (true size on Letter or A4 by the viewer's units, or tiled), the step
// list, the thread budget with its sources and the safety cautions. 400 naming `layout` for a bad option.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { requireOwnedDesign } from '@server/designs/designHttp.ts';
import { pdfFileName, pdfResponse, printFailureResponse, readPrintQuery } from '@server/print/printHttp.ts';
import { designPrintPlan } from '@server/print/printPlan.service.ts';

export const GET = (async ({ locals, params, url, request }) => {
  const owned = await requireOwnedDesign(locals, params);
  if (!owned.ok) return owned.error;
  const layout = readPrintQuery(url);
  if (!layout.ok) return layout.error;
  const { row, user } = owned.value;
  const plan = await designPrintPlan(db, row, { id: user.id, units: user.units }, layout.value, request.signal);
  if (!plan.ok) return printFailureResponse(plan.error);
  return pdfResponse(plan.value, pdfFileName(row.title));
}) satisfies APIRoute;
