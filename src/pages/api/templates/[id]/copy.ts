// /api/templates/:id/copy — POST { version? }: copies that version (default: latest) into the signed-in
// quilter's own designs, remembering the version it came from → 201 { designId, templateVersionId }.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json, problem, readJson } from '@server/http.ts';
import { requireUser } from '@server/auth/guards.ts';
import { copySchema } from '@server/templates/template.schema.ts';
import { findVersionById } from '@server/templates/template.repository.ts';
import { readTemplateDetail } from '@server/templates/templateDetail.ts';
import { copyVersionIntoDesigns } from '@server/templates/designSource.ts';
import { requestDesignDerive } from '@server/designs/designDerive.ts';

export const POST = (async ({ locals, params, request, url }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const body = await readJson(request, copySchema);
  if (!body.ok) return body.error;
  const link = url.searchParams.get('link');
  const ref = link ? ({ by: 'link', token: link } as const) : ({ by: 'id', id: params['id'] } as const);
  const detail = await readTemplateDetail(db, signedIn.value.user, ref, body.value.version);
  if (!detail || detail.template.id !== params['id']) return problem(404, 'not_found', 'Not found.');
  const version = await findVersionById(db, detail.version.id);
  if (!version) return problem(404, 'not_found', 'Not found.');
  const copy = await copyVersionIntoDesigns(db, signedIn.value.user.id, version);
  if (copy.figuresPending) requestDesignDerive({ id: copy.id, owner_id: signedIn.value.user.id, version: copy.version });
  return json({ designId: copy.id, templateVersionId: version.id, version: version.version }, 201);
}) satisfies APIRoute;
