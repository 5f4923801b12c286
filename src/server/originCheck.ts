import { PUBLIC_ORIGIN } from 'astro:env/server';

const UNSAFE_METHODS = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

/**
 * Cross-site request guard for the JSON API. A state-changing request to /api/** must carry an
 * Origin header equal to the request's own origin or PUBLIC_ORIGIN. Astro's security.checkOrigin
 * covers only form content types, so JSON requests are checked here.
 */
export function isForeignApiRequest(request: Request, url: URL): boolean {
  if (!UNSAFE_METHODS.has(request.method) || !(url.pathname === '/api' || url.pathname.startsWith('/api/'))) return false;
  const origin = request.headers.get('origin');
  if (!origin) return true;
  return origin !== url.origin && origin !== PUBLIC_ORIGIN;
}
