// /api/classes/:id/roster — GET: per student, lessons finished, current step, last active, photos (teacher, admin).
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json, problem } from '@server/http.ts';
import { requireUser } from '@server/auth/guards.ts';
import { findClassAccess, isManager } from '@server/classes/classAccess.ts';
import { readRoster } from '@server/classes/roster.ts';

export const GET = (async ({ locals, params }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const access = await findClassAccess(db, signedIn.value.user, params['id']);
  if (!access || !isManager(access.standing)) return problem(404, 'not_found', 'Not found.');
  return json({ students: await readRoster(db, access.cls.id) });
}) satisfies APIRoute;
