// /api/classes/:id/roster.csv — GET: the roster as CSV (RFC 4180), downloaded as a file (teacher, admin).
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { problem } from '@server/http.ts';
import { requireUser } from '@server/auth/guards.ts';
import { findClassAccess, isManager } from '@server/classes/classAccess.ts';
import { readRoster, rosterToCsv } from '@server/classes/roster.ts';

export const GET = (async ({ locals, params }) => {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn.error;
  const access = await findClassAccess(db, signedIn.value.user, params['id']);
  if (!access || !isManager(access.standing)) return problem(404, 'not_found', 'Not found.');
  const csv = rosterToCsv(await readRoster(db, access.cls.id));
  const name = access.cls.title.replace(/[^\p{L}\p{N}]+/gu, '-').replace(/^-|-$/g, '').slice(0, 60) || 'class';
  return new Response(csv, {
    headers: {
      'content-type': 'text/csv; charset=utf-8',
      'content-disposition': `attachment; filename="roster-${name.replace(/[^\x20-\x7e]/g, '_')}.csv"`,
      'cache-control': 'no-store',
    },
  });
}) satisfies APIRoute;
