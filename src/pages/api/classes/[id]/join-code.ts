// /api/classes/:id/join-code — POST: draw a new join code (the old one stops working) → { joinCode }.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { json, problem } from '@server/http.ts';
import { requireUser } from '@server/auth/guards.ts';
import { findClassAccess, isManager } from '@server/classes/classAccess.ts';
import { regenerateJoinCode } from '@server/classes/class.service.ts';

export const POST = (async ({ locals, params }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const access = await findClassAccess(db, signedIn.value.user, params['id']);
  if (!access || !isManager(access.standing)) return problem(404, 'not_found', 'Not found.');
  return json({ joinCode: await regenerateJoinCode(db, access.cls.id) });
}) satisfies APIRoute;
