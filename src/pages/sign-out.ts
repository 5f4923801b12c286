// POST /sign-out — the header's sign-out button (a plain form, so it works without scripts; Astro's
// checkOrigin guards form posts). Deletes the session row and the cookie, then goes home.
import type { APIRoute } from 'astro';
import { db } from '@server/db.ts';
import { deleteSessionCookie, invalidateSession } from '@server/auth/session.ts';

export const POST = (async ({ locals, cookies, url, redirect }) => {
  if (locals.session) await invalidateSession(db, locals.session.id);
  deleteSessionCookie(cookies, url);
  return redirect('/?signed-out=1', 303);
}) satisfies APIRoute;
