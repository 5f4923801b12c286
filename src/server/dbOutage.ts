// What the app answers while PostgreSQL is unreachable (restarting, stopped, out of connections): 503 with
// Retry-After instead of a 500, so browsers and the workbench know to try again; nothing is half-saved because
// every save is one transaction that either committed before the outage or did not happen.
import { problem } from './http.ts';

/** Seconds a client should wait before trying again (a PostgreSQL restart takes a few seconds). */
export const DATABASE_RETRY_AFTER_SECONDS = 5;

// SQLSTATE classes and codes that mean "the server is not there right now", not "your query is wrong":
// class 08 connection exceptions; 57P01 admin_shutdown, 57P02 crash_shutdown, 57P03 cannot_connect_now
// (starting up or shutting down); 53300 too_many_connections (PostgreSQL docs, Appendix A "Error Codes").
const UNAVAILABLE_SQLSTATES = new Set(['57P01', '57P02', '57P03', '53300']);
// Socket errors from node:net while connecting or mid-query.
const UNAVAILABLE_NODE_CODES = new Set(['ECONNREFUSED', 'ECONNRESET', 'EPIPE', 'ETIMEDOUT', 'EHOSTUNREACH', 'ENETUNREACH', 'EAI_AGAIN']);
// pg's own messages when a connection ends or cannot be made in time (pg/lib/client.js, pg-pool/index.js).
const UNAVAILABLE_MESSAGES = [
  'Connection terminated',
  'timeout exceeded when trying to connect',
  'Client has encountered a connection error and is not queryable',
];

/** True when `error` (or what caused it) says the database cannot be reached, as opposed to a bug or a bad query. */
export function isDatabaseUnavailable(error: unknown, depth = 0): boolean {
  if (depth > 4 || typeof error !== 'object' || error === null) return false;
  const e = error as { code?: unknown; message?: unknown; cause?: unknown; errors?: unknown };
  // node:http's "aborted" (ECONNRESET) is the browser going away mid-request, not the database.
  if (e.message === 'aborted') return false;
  if (typeof e.code === 'string') {
    if (UNAVAILABLE_SQLSTATES.has(e.code) || /^08[0-9A-Z]{3}$/.test(e.code) || UNAVAILABLE_NODE_CODES.has(e.code)) return true;
  }
  if (typeof e.message === 'string' && UNAVAILABLE_MESSAGES.some((m) => (e.message as string).startsWith(m))) return true;
  if (Array.isArray(e.errors) && e.errors.some((inner) => isDatabaseUnavailable(inner, depth + 1))) return true;
  return e.cause !== undefined && isDatabaseUnavailable(e.cause, depth + 1);
}

const MESSAGE = 'The database is not answering right now (it may be restarting). Nothing you saved before is lost; try again in a few seconds.';

/** 503 for API clients (JSON, `database_unavailable`) or a plain page for browsers; both carry Retry-After. */
export function databaseUnavailableResponse(api: boolean): Response {
  const headers = { 'retry-after': String(DATABASE_RETRY_AFTER_SECONDS) };
  if (api) return problem(503, 'database_unavailable', MESSAGE, undefined, headers);
  // A page of its own, built without the layout: the layout may read the session, which needs the database.
  const html = `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<meta http-equiv="refresh" content="${DATABASE_RETRY_AFTER_SECONDS * 2}"><title>Threadway will be back shortly</title></head>
<body style="font-family: system-ui, sans-serif; max-width: 36rem; margin: 4rem auto; padding: 0 1rem; line-height: 1.5; color: #222">
<h1 style="font-size: 1.6rem">Threadway will be back shortly</h1>
<p>Our database is not answering right now; it is probably restarting. Nothing you saved before is lost.</p>
<p>This page tries again by itself in a few seconds.</p>
</body></html>`;
  return new Response(html, { status: 503, headers: { ...headers, 'content-type': 'text/html; charset=utf-8', 'cache-control': 'no-store' } });
}

const LOG_EVERY_MS = 10_000;
let lastLogAt = 0;
let quietCount = 0;

/**
 * Logs a short line (no stack: the cause is known and the connection error was logged already), at most one
 * every 10 s with the number of 503s in between, so an outage under load does not flood the log.
 */
export function logDatabaseUnavailable(method: string, path: string, error: unknown, now = Date.now()): void {
  if (now - lastLogAt < LOG_EVERY_MS) {
    quietCount += 1;
    return;
  }
  const message = error instanceof Error ? error.message : String(error);
  const since = quietCount > 0 ? ` (${quietCount} more answered 503 since the last line)` : '';
  console.error(`[server] ${method} ${path}: database unavailable (${message}); answered 503${since}`);
  lastLogAt = now;
  quietCount = 0;
}
