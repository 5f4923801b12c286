// Role guards for API routes and pages.
//
// Roles are ranked: quilter < teacher < admin, so an admin passes every teacher check.
// API routes: anonymous → 401 `unauthenticated`; signed in but below the role → 404 `not_found`,
// the same answer as for a route that does not exist (an admin-only endpoint is not revealed to a
// quilter). Pages: anonymous → redirect to /sign-in?next=<path>; below the role → the 404 page.
import type { Role } from '@db/schema.ts';
import { err, ok, type Result } from '@shared/result.ts';
import { problem } from '../http.ts';
import type { SessionInfo, SessionUser } from './session.ts';

const RANK: Record<Role, number> = { quilter: 0, teacher: 1, admin: 2 };

export function hasRole(user: SessionUser | null, role: Role): boolean {
  return user !== null && RANK[user.role] >= RANK[role];
}

export interface SignedIn {
  user: SessionUser;
  session: SessionInfo;
}

/** API guard: the signed-in user, or the 401 response to return. */
export function requireUser(locals: App.Locals): Result<SignedIn, Response> {
  if (!locals.user || !locals.session) return err(problem(401, 'unauthenticated', 'Sign in to continue.'));
  return ok({ user: locals.user, session: locals.session });
}

/** API guard: 401 when anonymous, 404 (not 403) when the role is too low. */
export function requireRole(locals: App.Locals, role: Exclude<Role, 'quilter'>): Result<SignedIn, Response> {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn;
  if (!hasRole(signedIn.value.user, role)) return err(problem(404, 'not_found', 'Not found.'));
  return signedIn;
}

/** The local path to come back to after signing in; anything else (other hosts, "//x") becomes /dashboard. */
export function safeNextPath(next: string | null | undefined): string {
  if (!next || !next.startsWith('/') || next.startsWith('//') || next.startsWith('/\\') || next.length > 512) return '/dashboard';
  return next;
}

export function signInPath(url: URL): string {
  return `/sign-in?next=${encodeURIComponent(url.pathname + url.search)}`;
}

interface PageContext {
  locals: App.Locals;
  url: URL;
  redirect(path: string, status?: 301 | 302 | 303 | 307 | 308): Response;
}

/**
 * Page guard. Returns the signed-in user, or the Response the page should return instead
 * (a redirect to sign-in, or a 404 for a role that may not see the page).
 */
export function guardPage(ctx: PageContext, role: Role = 'quilter'): Result<SignedIn, Response> {
  const signedIn = requireUser(ctx.locals);
  if (!signedIn.ok) return err(ctx.redirect(signInPath(ctx.url), 302));
  if (!hasRole(signedIn.value.user, role)) return err(notFoundPage());
  return signedIn;
}

/** An empty 404 from a page: Astro renders src/pages/404.astro in its place (with the original status). */
export function notFoundPage(): Response {
  return new Response(null, { status: 404 });
}
