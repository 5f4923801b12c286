import { PUBLIC_ORIGIN } from 'astro:env/server';

/** The one state-changing path that takes requests from another server (signed, see the endpoint). */
export const PAYMENTS_WEBHOOK_PATH = '/api/payments/webhook';

const UNSAFE_METHODS = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

/**
 * Cross-site request guard for every state-changing request (POST/PUT/PATCH/DELETE), API or page, whatever its
 * content type: it must carry an Origin header equal to the request's own origin or PUBLIC_ORIGIN. Astro's
 * security.checkOrigin covers only form content types, so a JSON or body-less POST (e.g. to /sign-out) would
 * pass it; browsers send Origin on every such request, so a missing one is refused too.
 */
export function isForeignRequest(request: Request, url: URL): boolean {
  if (!UNSAFE_METHODS.has(request.method)) return false;
  // The payments service's webhook is server to server: no browser, no Origin. Its signature is its check
  // (src/pages/api/payments/webhook.ts), and it changes nothing for a session.
  if (url.pathname === PAYMENTS_WEBHOOK_PATH) return false;
  const origin = request.headers.get('origin');
  if (!origin) return true;
  return origin !== url.origin && origin !== PUBLIC_ORIGIN;
}

/** The JSON API's name for the same check (kept for callers that only think about /api). */
export const isForeignApiRequest = isForeignRequest;
