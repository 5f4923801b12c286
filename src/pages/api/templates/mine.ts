// /api/templates/mine — GET: every template the teacher published, any visibility (latest versions).
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json } from '@server/http.ts';
import { requireRole } from '@server/auth/guards.ts';
import { listOwnedTemplates } from '@server/templates/template.repository.ts';
import { toTemplateCardJson } from '@server/templates/templateJson.ts';

export const GET = (async ({ locals }) => {
  const signedIn = requireRole(locals, 'teacher');
  if (!signedIn.ok) return signedIn.error;
  const rows = await listOwnedTemplates(db, signedIn.value.user.id);
  return json({ templates: rows.map(toTemplateCardJson) });
}) satisfies APIRoute;
