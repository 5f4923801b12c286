// GET /api/designs?q=&sort=&dir=&page=&pageSize= — my designs for the designs table (no design JSON).
// POST /api/designs { title, notes?, design } — create; 201 { design }. Returns at once: the figures
//   (`summary`) follow when the route engine has them (`summaryPending` until then; the list shows them).
import type { APIRoute } from 'astro';
import type { DesignList, DesignListItem } from '@shared/contract/designs.ts';
import { db } from '@server/db.ts';
import { invalidInput, json } from '@server/http.ts';
import { requireUser } from '@server/auth/guards.ts';
import { createDesign, drawingOf } from '@server/designs/design.service.ts';
import { listQuerySchema } from '@server/designs/designApi.schema.ts';
import { readDesignBody } from '@server/designs/designBody.ts';
import { requestDesignDerive } from '@server/designs/designDerive.ts';
import { designResponse } from '@server/designs/designHttp.ts';
import { listOwnedDesigns } from '@server/designs/designList.repository.ts';
import { storedSummary } from '@server/designs/designRecord.ts';

export const GET = (async ({ locals, url }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const query = listQuerySchema.safeParse(Object.fromEntries(url.searchParams));
  if (!query.success) return invalidInput(query.error, 'Check the list parameters.');
  const { q, sort, page, pageSize } = query.data;
  const dir = query.data.dir ?? (sort === 'updated' || sort === 'created' ? 'desc' : 'asc');
  const { rows, total } = await listOwnedDesigns(db, signedIn.value.user.id, { q, sort, dir, limit: pageSize, offset: (page - 1) * pageSize });
  const designs = rows.map((r): DesignListItem => {
    // Figures still to come (or lost to a restart), or a thumbnail from before the point budget: ask for them.
    requestDesignDerive({ id: r.id, owner_id: signedIn.value.user.id, version: r.version }, { summary: r.summary_pending, thumbnail: r.thumbnail_svg === null });
    return {
      id: r.id,
      title: r.title,
      version: r.version,
      units: r.units,
      width: r.width,
      height: r.height,
      summary: r.summary_pending ? null : storedSummary(r),
      summaryPending: r.summary_pending,
      thumbnailSvg: r.thumbnail_svg,
      createdAt: r.created_at.toISOString(),
      updatedAt: r.updated_at.toISOString(),
    };
  });
  return json({ designs, total, page, pageSize, sort, dir, q } satisfies DesignList);
}) satisfies APIRoute;

export const POST = (async ({ locals, request }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const account = signedIn.value.user.id;
  const body = await readDesignBody(request, 'create', account);
  if (!body.ok) return body.error;
  const { fields, design } = body.value;
  if (!design) throw new Error('api/designs: the create schema requires a design');
  const row = await createDesign(db, account, { title: fields.title, notes: fields.notes, design: drawingOf(design) });
  requestDesignDerive(row);
  return designResponse(row, account, 201, design.text);
}) satisfies APIRoute;
