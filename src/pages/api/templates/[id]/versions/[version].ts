// /api/templates/:id/versions/:version — GET: one published version (immutable), same visibility as the template.
import type { APIRoute } from 'astro';
import { db } from '../../../../../server/db.ts';
import { json, problem } from '../../../../../server/http.ts';
import { readTemplateDetail } from '../../../../../server/templates/templateDetail.ts';

export const GET = (async ({ locals, params, url }) => {
  const n = Number(params['version']);
  if (!Number.isInteger(n) || n < 1) return problem(404, 'not_found', 'Not found.');
  const link = url.searchParams.get('link');
  const detail = link
    ? await readTemplateDetail(db, locals.user, { by: 'link', token: link }, n)
    : await readTemplateDetail(db, locals.user, { by: 'id', id: params['id'] }, n);
  if (!detail || detail.template.id !== params['id']) return problem(404, 'not_found', 'Not found.');
  return json(detail);
}) satisfies APIRoute;
