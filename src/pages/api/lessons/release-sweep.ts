// /api/lessons/release-sweep — POST (admins only): run the lesson-release e-mail sweep now → { sent, failed,
// alreadySent }. The server also runs it by itself (src/server/classes/releaseSchedule.ts); running it again
// never sends an e-mail twice.
import type { APIRoute } from 'astro';
import { PUBLIC_ORIGIN } from 'astro:env/server';
import { db } from '@server/db.ts';
import { json } from '@server/http.ts';
import { requireRole } from '@server/auth/guards.ts';
import { sweepLessonReleases } from '@server/classes/releaseSweep.ts';

export const POST = (async ({ locals, url }) => {
  const signedIn = requireRole(locals, 'admin');
  if (!signedIn.ok) return signedIn.error;
  return json(await sweepLessonReleases(db, PUBLIC_ORIGIN ?? url.origin));
}) satisfies APIRoute;
