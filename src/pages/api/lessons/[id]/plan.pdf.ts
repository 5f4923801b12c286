// GET /api/lessons/:id/plan.pdf?layout=page|tiles — the lesson's printable plan, for whoever may read the lesson
// (GET /api/lessons/:id's rule: its teacher and admins; enrolled students once it is released; 404 for anyone else):
// the template version's block and saved route, the step list, its thread budget and the cautions (the lesson's
// notes decide whether the rotary cutter and iron cautions apply).
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { problem } from '@server/http.ts';
import { requireUser } from '@server/auth/guards.ts';
import { findLessonAccess } from '@server/classes/classAccess.ts';
import { findLessonRow } from '@server/classes/class.repository.ts';
import { findVersionById } from '@server/templates/template.repository.ts';
import { toVersionJson } from '@server/templates/templateJson.ts';
import { pdfFileName, pdfResponse, printFailureResponse, readPrintQuery } from '@server/print/printHttp.ts';
import { lessonPrintPlan } from '@server/print/printPlan.service.ts';

const notFound = () => problem(404, 'not_found', 'Not found.');

export const GET = (async ({ locals, params, url }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const { user } = signedIn.value;
  const access = await findLessonAccess(db, user, params['id']);
  if (!access) return notFound();
  const lesson = await findLessonRow(db, access.lessonId);
  if (!lesson) return notFound();
  const layout = readPrintQuery(url);
  if (!layout.ok) return layout.error;
  const version = await findVersionById(db, lesson.template_version_id);
  if (!version) throw new Error(`api/lessons/[id]/plan.pdf: lesson ${lesson.id} points at a missing template version`);
  const plan = lessonPrintPlan({ title: lesson.title, notesMd: lesson.notes_md }, toVersionJson(version), user.units, layout.value);
  if (!plan.ok) return printFailureResponse(plan.error);
  return pdfResponse(plan.value, pdfFileName(lesson.title));
}) satisfies APIRoute;
