// GET /api/designs?q=&sort=&dir=&page=&pageSize= — my designs for the designs table (no design JSON).
// POST /api/designs { title, notes?, design } — create; 201 { design }.
import type { APIRoute } from 'astro';
import { db } from '../../../server/db.ts';
import { invalidInput, json, readJson } from '../../../server/http.ts';
import { requireUser } from '../../../server/auth/guards.ts';
import { createDesign } from '../../../server/designs/design.service.ts';
import { createDesignSchema, DESIGN_BODY_LIMIT, listQuerySchema } from '../../../server/designs/designApi.schema.ts';
import { summarizeWithEngine } from '../../../server/designs/designHttp.ts';
import { listOwnedDesigns } from '../../../server/designs/designList.repository.ts';
import { storedSummary, toDesignJson } from '../../../server/designs/designRecord.ts';

export const GET = (async ({ locals, url }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const query = listQuerySchema.safeParse(Object.fromEntries(url.searchParams));
  if (!query.success) return invalidInput(query.error, 'Check the list parameters.');
  const { q, sort, page, pageSize } = query.data;
  const dir = query.data.dir ?? (sort === 'updated' || sort === 'created' ? 'desc' : 'asc');
  const { rows, total } = await listOwnedDesigns(db, signedIn.value.user.id, { q, sort, dir, limit: pageSize, offset: (page - 1) * pageSize });
  const designs = rows.map((r) => ({
    id: r.id,
    title: r.title,
    version: r.version,
    units: r.units,
    width: r.width,
    height: r.height,
    summary: storedSummary(r),
    thumbnailSvg: r.thumbnail_svg,
    createdAt: r.created_at.toISOString(),
    updatedAt: r.updated_at.toISOString(),
  }));
  return json({ designs, total, page, pageSize, sort, dir, q });
}) satisfies APIRoute;

export const POST = (async ({ locals, request }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const body = await readJson(request, createDesignSchema, DESIGN_BODY_LIMIT);
  if (!body.ok) return body.error;
  const row = await createDesign(db, summarizeWithEngine, signedIn.value.user.id, body.value);
  return json({ design: toDesignJson(row) }, 201);
}) satisfies APIRoute;
