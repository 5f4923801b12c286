// /api/templates — GET: the public gallery (anyone; ?q, motif, difficulty, size=small|medium|large, page);
// POST: a teacher publishes one of their designs (with its saved route) as a template → 201.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { invalidInput, json, readJson } from '@server/http.ts';
import { requireRole } from '@server/auth/guards.ts';
import { GALLERY_PAGE_SIZE, listGallery } from '@server/templates/template.repository.ts';
import { galleryQuerySchema, publishTemplateSchema } from '@server/templates/template.schema.ts';
import { publishTemplate } from '@server/templates/template.service.ts';
import { publishErrorResponse } from '@server/templates/publishErrors.ts';
import { templateLinkPath, toTemplateCardJson, toVersionJson } from '@server/templates/templateJson.ts';
import { findTemplateCard } from '@server/templates/template.repository.ts';

export const GET = (async ({ url }) => {
  const query = galleryQuerySchema.safeParse(Object.fromEntries(url.searchParams));
  if (!query.success) return invalidInput(query.error);
  const { rows, total } = await listGallery(db, query.data);
  return json({ templates: rows.map(toTemplateCardJson), total, page: query.data.page, pageSize: GALLERY_PAGE_SIZE });
}) satisfies APIRoute;

export const POST = (async ({ locals, request }) => {
  const signedIn = requireRole(locals, 'teacher');
  if (!signedIn.ok) return signedIn.error;
  const body = await readJson(request, publishTemplateSchema);
  if (!body.ok) return body.error;
  const published = await publishTemplate(db, signedIn.value.user.id, body.value);
  if (!published.ok) return publishErrorResponse(published.error);
  const card = await findTemplateCard(db, published.value.template.id);
  if (!card) throw new Error('api/templates: the template just published is missing');
  return json({ template: toTemplateCardJson(card), version: toVersionJson(published.value.version), linkPath: templateLinkPath(published.value.template) }, 201);
}) satisfies APIRoute;
