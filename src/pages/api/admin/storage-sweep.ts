// /api/admin/storage-sweep — POST (admins only): remove photo objects no lesson photo names any more (left by an
// upload that a crash interrupted) → { checked, removed, failed }. The server also does this by itself at start and
// every hour (src/server/photos/orphanSchedule.ts); objects younger than 15 minutes are always kept.
import type { APIRoute } from 'astro';
import { json } from '@server/http.ts';
import { requireRole } from '@server/auth/guards.ts';
import { sweepOrphanPhotosNow } from '@server/photos/orphanSchedule.ts';

export const POST = (async ({ locals }) => {
  const admin = requireRole(locals, 'admin');
  if (!admin.ok) return admin.error;
  return json(await sweepOrphanPhotosNow());
}) satisfies APIRoute;
