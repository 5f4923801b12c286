// GET /api/quilts/:id/plan.pdf?layout=page|tiles — the quilt's printable plan (owner only, as GET /api/quilts/:id):
// the quilt map with the quilting order, the quilt budget, the quilt-as-you-go trim table, then a block page for each
// placed design. 400 naming `layout` for a bad option.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { requireUser } from '@server/auth/guards.ts';
import { findQuilt } from '@server/quilts/quilt.service.ts';
import { quiltNotFound } from '@server/quilts/quiltHttp.ts';
import { pdfFileName, pdfResponse, printFailureResponse, readPrintQuery } from '@server/print/printHttp.ts';
import { quiltPrintPlan } from '@server/print/printPlan.service.ts';

export const GET = (async ({ locals, params, url, request }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const { user } = signedIn.value;
  const row = await findQuilt(db, user.id, params['id'] ?? '');
  if (!row) return quiltNotFound();
  const layout = readPrintQuery(url);
  if (!layout.ok) return layout.error;
  const plan = await quiltPrintPlan(db, row, { id: user.id, units: user.units }, layout.value, request.signal);
  if (!plan.ok) return printFailureResponse(plan.error);
  return pdfResponse(plan.value, pdfFileName(row.title));
}) satisfies APIRoute;
