// /api/templates/link/:token — GET: a template opened through its share link (works for unlisted ones).
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json, problem } from '@server/http.ts';
import { readTemplateDetail } from '@server/templates/templateDetail.ts';

export const GET = (async ({ locals, params }) => {
  const detail = await readTemplateDetail(db, locals.user, { by: 'link', token: params['token'] });
  return detail ? json(detail) : problem(404, 'not_found', 'Not found.');
}) satisfies APIRoute;
