// POST /sign-out — the header's sign-out button (a plain form, so it works without scripts; Astro's
// checkOrigin guards form posts). Deletes the session row and the cookie, then goes home, or, when the form
// carries `signInNext` (an invitation opened in the wrong account), to the sign-in page that returns there.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { deleteSessionCookie, invalidateSession } from '@server/auth/session.ts';
import { safeNextPath } from '@server/auth/guards.ts';

export const POST = (async ({ locals, cookies, url, redirect, request }) => {
  if (locals.session) await invalidateSession(db, locals.session.id);
  deleteSessionCookie(cookies, url);
  const form = await request.formData().catch(() => null);
  const next = form?.get('signInNext');
  if (typeof next === 'string' && next !== '') return redirect(`/sign-in?next=${encodeURIComponent(safeNextPath(next))}`, 303);
  return redirect('/?signed-out=1', 303);
}) satisfies APIRoute;
