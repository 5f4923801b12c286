// /api/templates/:id/versions/:version — GET: one published version (immutable), same visibility as the template.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json, problem } from '@server/http.ts';
import { readTemplateDetail } from '@server/templates/templateDetail.ts';
import { parseVersionText } from '@server/inputRules.ts';

export const GET = (async ({ locals, params, url }) => {
  // A version that cannot exist (not a number, or past PostgreSQL's integer range) is simply not found.
  const n = parseVersionText(params['version']);
  if (n === null) return problem(404, 'not_found', 'Not found.');
  const link = url.searchParams.get('link');
  const detail = link
    ? await readTemplateDetail(db, locals.user, { by: 'link', token: link }, n)
    : await readTemplateDetail(db, locals.user, { by: 'id', id: params['id'] }, n);
  if (!detail || detail.template.id !== params['id']) return problem(404, 'not_found', 'Not found.');
  return json(detail);
}) satisfies APIRoute;
