// Response headers that limit what a browser does with our pages, added to every response by the middleware.
// Pages: a Content-Security-Policy whose script-src is 'self' plus the SHA-256 hashes Astro computes at build time
// for its own inline scripts (island hydration, client directives; astro.config.mjs `experimental.csp`), so no
// inline script runs unless it is one of ours, byte for byte. No 'unsafe-inline' for scripts, ever. Styles may be
// inline (server-rendered style attributes of islands); they cannot run code. Everything else (JSON, SVG, CSV,
// images) gets a policy that allows nothing at all unless the endpoint set a policy of its own.
// All responses: no framing, no MIME sniffing, the Referer only within the site (reset links carry tokens), and
// signed-in pages never stored by a cache (the next person at a shared computer must not see them with Back).

/** The directives of every page besides script-src (built from Astro's hashes) — one place to read the policy. */
const PAGE_DIRECTIVES = [
  "default-src 'self'",
  "style-src 'self' 'unsafe-inline'",
  // data: for list thumbnails (<img src="data:image/svg+xml,…">) and canvas snapshots; blob: for photo previews.
  "img-src 'self' data: blob:",
  "font-src 'self'",
  "connect-src 'self'",
  // The lesson's offline worker (public/lesson-sw.js) is our own file; workers from anywhere else, blob: or data:
  // never run. Said outright rather than left to fall back to script-src, whose hashes mean nothing for a worker.
  "worker-src 'self'",
  "object-src 'none'",
  "base-uri 'none'",
  "form-action 'self'",
  "frame-ancestors 'none'",
] as const;

/** For anything that is not a page: nothing may load, run or frame it. */
export const NON_PAGE_CSP = "default-src 'none'; frame-ancestors 'none'; base-uri 'none'; form-action 'none'";

const HASH_SOURCE = /^'sha(?:256|384|512)-[A-Za-z0-9+/]+={0,2}'$/;

/** The hash sources of a policy's script-src (Astro's header), in order, without duplicates. */
export function scriptHashesOf(policy: string | null): string[] {
  if (!policy) return [];
  const directive = policy
    .split(';')
    .map((d) => d.trim().split(/\s+/))
    .find((tokens) => tokens[0]?.toLowerCase() === 'script-src');
  return [...new Set((directive ?? []).slice(1).filter((t) => HASH_SOURCE.test(t)))];
}

/** The page policy: our directives, and script-src 'self' with the given hashes. */
export function pagePolicy(scriptHashes: readonly string[]): string {
  const scriptSrc = ["script-src 'self'", ...scriptHashes].join(' ');
  return [PAGE_DIRECTIVES[0], scriptSrc, ...PAGE_DIRECTIVES.slice(1)].join('; ');
}

export interface HeaderContext {
  /** A session was valid for this request. */
  signedIn: boolean;
  /** `astro dev`: Vite injects inline scripts Astro does not hash, so pages get no policy there. */
  dev: boolean;
}

const isHtml = (r: Response) => /^text\/html\b/i.test(r.headers.get('content-type') ?? '');

/** The response with the security headers set (a copy when its headers cannot be changed, e.g. a redirect). */
export function withSecurityHeaders(response: Response, ctx: HeaderContext): Response {
  let out = response;
  try {
    applyHeaders(out.headers, out, ctx);
  } catch {
    out = new Response(response.body, response);
    applyHeaders(out.headers, out, ctx);
  }
  return out;
}

function applyHeaders(h: Headers, response: Response, ctx: HeaderContext): void {
  const html = isHtml(response);
  const current = h.get('content-security-policy');
  if (html) {
    if (ctx.dev) h.delete('content-security-policy');
    else h.set('content-security-policy', pagePolicy(scriptHashesOf(current)));
  } else if (!current) {
    h.set('content-security-policy', NON_PAGE_CSP);
  } else if (!/(^|;)\s*frame-ancestors\b/i.test(current)) {
    // An endpoint's own policy (e.g. the SVG export's) still must not be framed.
    h.set('content-security-policy', `${current}; frame-ancestors 'none'`);
  }
  h.set('x-frame-options', 'DENY');
  h.set('x-content-type-options', 'nosniff');
  // same-origin, not no-referrer: with no-referrer browsers send `Origin: null` on form posts, which the origin
  // check would refuse.
  h.set('referrer-policy', 'same-origin');
  h.set('permissions-policy', 'camera=(), microphone=(), geolocation=(), payment=()');
  h.set('cross-origin-opener-policy', 'same-origin');
  if (ctx.signedIn && (html || !h.has('cache-control'))) h.set('cache-control', 'no-store');
}
