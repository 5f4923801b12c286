// Every request passes: securityHeaders (outermost: CSP, framing, caching on every answer, errors included),
// catchErrors (so it also sees failures of the steps after it),
// originCheck (cross-site state-changing requests, API or page → 403), authenticate (session cookie → locals.user).
import { defineMiddleware, sequence } from 'astro:middleware';
import { db } from '@server/db.ts';
import { problem } from '@server/http.ts';
import { isForeignRequest } from '@server/originCheck.ts';
import { withSecurityHeaders } from '@server/securityHeaders.ts';
import { databaseUnavailableResponse, isDatabaseUnavailable, logDatabaseUnavailable } from '@server/dbOutage.ts';
import { SESSION_COOKIE, deleteSessionCookie, setSessionCookie, validateSessionToken } from '@server/auth/session.ts';
// Loaded with the middleware, i.e. when the server takes its first request: starts the lesson-release e-mail sweep.
import '@server/classes/releaseSchedule.ts';
// … and the sweep that removes photo objects an interrupted upload left behind.
import '@server/photos/orphanSchedule.ts';
import { installPlainMessages } from '@shared/forms/plainMessages.ts';

// Validation messages in plain words naming the field (shared/forms/plainMessages.ts), for every parse on the server.
installPlainMessages();

const isApi = (url: URL) => url.pathname === '/api' || url.pathname.startsWith('/api/');

const catchErrors = defineMiddleware(async (context, next) => {
  try {
    const response = await next();
    // Unknown /api paths fall through to the HTML 404 page; API clients get the JSON shape instead.
    if (isApi(context.url) && response.status === 404 && !response.headers.get('content-type')?.includes('json')) {
      return problem(404, 'not_found', 'Not found.');
    }
    return response;
  } catch (error) {
    // The client hung up mid-request (e.g. an aborted route check): nobody reads the answer, nothing to log.
    if (context.request.signal.aborted) return new Response(null, { status: 499 });
    if (isDatabaseUnavailable(error)) {
      logDatabaseUnavailable(context.request.method, context.url.pathname, error);
      return databaseUnavailableResponse(isApi(context.url));
    }
    console.error(`[server] ${context.request.method} ${context.url.pathname} failed:`, error);
    if (isApi(context.url)) return problem(500, 'internal', 'Something went wrong on our side. Please try again.');
    // An empty 500 makes Astro render src/pages/500.astro.
    return new Response(null, { status: 500 });
  }
});

const originCheck = defineMiddleware((context, next) => {
  if (isForeignRequest(context.request, context.url)) {
    return problem(403, 'forbidden_origin', 'This request did not come from Threadway itself (Origin check failed).');
  }
  return next();
});

const authenticate = defineMiddleware(async (context, next) => {
  context.locals.user = null;
  context.locals.session = null;
  const token = context.cookies.get(SESSION_COOKIE)?.value;
  if (token) {
    const result = await validateSessionToken(db, token);
    if (result.session) {
      context.locals.user = result.user;
      context.locals.session = result.session;
      if (result.refreshed) setSessionCookie(context.cookies, context.url, token, result.session.expiresAt);
    } else {
      deleteSessionCookie(context.cookies, context.url);
    }
  }
  return next();
});

const securityHeaders = defineMiddleware(async (context, next) =>
  withSecurityHeaders(await next(), { signedIn: Boolean(context.locals.user), dev: import.meta.env.DEV }),
);

export const onRequest = sequence(securityHeaders, catchErrors, originCheck, authenticate);
