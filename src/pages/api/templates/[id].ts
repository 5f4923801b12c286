// /api/templates/:id — GET: the latest version with the version list (visibility rules in templateAccess.ts);
// PUT: publish a new version (owner or admin): fields left out are kept; `designId` re-takes the drawing and route.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json, problem, readJson } from '@server/http.ts';
import { requireUser } from '@server/auth/guards.ts';
import { isUuid } from '@server/classes/classAccess.ts';
import { findTemplate } from '@server/templates/template.repository.ts';
import { newVersionSchema } from '@server/templates/template.schema.ts';
import { publishNewVersion } from '@server/templates/template.service.ts';
import { canEditTemplate } from '@server/templates/templateAccess.ts';
import { readTemplateDetail } from '@server/templates/templateDetail.ts';
import { publishErrorResponse } from '@server/templates/publishErrors.ts';

export const GET = (async ({ locals, params }) => {
  const detail = await readTemplateDetail(db, locals.user, { by: 'id', id: params['id'] });
  return detail ? json(detail) : problem(404, 'not_found', 'Not found.');
}) satisfies APIRoute;

export const PUT = (async ({ locals, params, request }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const user = signedIn.value.user;
  const id = params['id'];
  const tpl = isUuid(id) ? await findTemplate(db, id) : undefined;
  if (!tpl || !canEditTemplate(user, tpl)) {
    // A template one may see but not edit still answers 404 for writes: nothing about it is revealed.
    return problem(404, 'not_found', 'Not found.');
  }
  const body = await readJson(request, newVersionSchema);
  if (!body.ok) return body.error;
  // An admin editing someone else's template may only re-publish its text, not swap in a design of their own.
  if (body.value.designId !== undefined && tpl.owner_id !== user.id) {
    return problem(400, 'invalid_input', 'Only the owner can replace the drawing.', { designId: 'Only the owner can replace the drawing.' });
  }
  const published = await publishNewVersion(db, user.id, tpl.id, body.value);
  if (!published.ok) return publishErrorResponse(published.error);
  const detail = await readTemplateDetail(db, user, { by: 'id', id: tpl.id });
  if (!detail) throw new Error('api/templates/[id]: the new version is unreadable');
  return json(detail);
}) satisfies APIRoute;
