import { describe, expect, it } from 'vitest';
import { NON_PAGE_CSP, pagePolicy, scriptHashesOf, withSecurityHeaders } from './securityHeaders.ts';

const H1 = "'sha256-BF0290pkb3jxQsE7z00xR8Imp8X34FLC88L0lkMnrGw='";
const H2 = "'sha256-QzWFZi+FLIx23tnm9SBU4aEgx4x8DsuASP07mfqol/c='";
const astroHeader = `script-src 'self' ${H1} ${H2} ${H1}; style-src 'self' 'sha256-abc='`;
const html = (headers: Record<string, string> = {}) => new Response('<!doctype html>', { headers: { 'content-type': 'text/html', ...headers } });

describe('scriptHashesOf', () => {
  it("keeps only the hash sources of script-src, once each, and ignores other directives' hashes", () => {
    expect(scriptHashesOf(astroHeader)).toEqual([H1, H2]);
    expect(scriptHashesOf(null)).toEqual([]);
    expect(scriptHashesOf("script-src 'self' 'unsafe-inline' https://cdn.example 'nonce-x'")).toEqual([]);
  });
});

describe('pagePolicy', () => {
  it("allows scripts from the site and the given hashes only; frames, plugins and <base> not at all", () => {
    const p = pagePolicy([H1]);
    expect(p).toContain(`script-src 'self' ${H1};`);
    expect(p).not.toMatch(/script-src[^;]*unsafe/);
    for (const d of ["frame-ancestors 'none'", "object-src 'none'", "base-uri 'none'", "form-action 'self'", "worker-src 'self';"]) expect(p).toContain(d);
    expect(p).not.toMatch(/worker-src[^;]*(blob:|data:|\*)/);
  });
});

describe('withSecurityHeaders', () => {
  it("rebuilds a page's policy from Astro's script hashes and marks signed-in pages no-store", () => {
    const r = withSecurityHeaders(html({ 'content-security-policy': astroHeader }), { signedIn: true, dev: false });
    expect(r.headers.get('content-security-policy')).toBe(pagePolicy([H1, H2]));
    expect(r.headers.get('cache-control')).toBe('no-store');
    expect(r.headers.get('x-frame-options')).toBe('DENY');
    expect(r.headers.get('x-content-type-options')).toBe('nosniff');
    expect(r.headers.get('referrer-policy')).toBe('same-origin');
  });

  it('gives a page without hashes no inline scripts at all, and leaves anonymous pages cacheable', () => {
    const r = withSecurityHeaders(html(), { signedIn: false, dev: false });
    expect(r.headers.get('content-security-policy')).toBe(pagePolicy([]));
    expect(r.headers.get('cache-control')).toBeNull();
  });

  it('sets the locked-down policy on JSON, keeps an endpoint policy but forbids framing it, and keeps its caching', () => {
    const json = withSecurityHeaders(new Response('{}', { headers: { 'content-type': 'application/json' } }), { signedIn: true, dev: false });
    expect(json.headers.get('content-security-policy')).toBe(NON_PAGE_CSP);
    const svg = withSecurityHeaders(
      new Response('<svg/>', { headers: { 'content-type': 'image/svg+xml', 'content-security-policy': "default-src 'none'", 'cache-control': 'private, max-age=300' } }),
      { signedIn: true, dev: false },
    );
    expect(svg.headers.get('content-security-policy')).toBe("default-src 'none'; frame-ancestors 'none'");
    expect(svg.headers.get('cache-control')).toBe('private, max-age=300');
  });

  it('copies a response whose headers are immutable (Response.redirect)', () => {
    const r = withSecurityHeaders(Response.redirect('http://127.0.0.1/sign-in', 302), { signedIn: false, dev: false });
    expect(r.status).toBe(302);
    expect(r.headers.get('location')).toBe('http://127.0.0.1/sign-in');
    expect(r.headers.get('x-frame-options')).toBe('DENY');
  });

  it('sends no page policy under astro dev (Vite injects unhashed inline scripts there)', () => {
    const r = withSecurityHeaders(html(), { signedIn: false, dev: true });
    expect(r.headers.get('content-security-policy')).toBeNull();
    expect(r.headers.get('x-frame-options')).toBe('DENY');
  });
});
