// Issue 10, defect 13: every answer carries a Content-Security-Policy, refuses framing and MIME sniffing, keeps the
// Referer on the site, and signed-in pages are never stored by a cache. Checked by reading the headers (and, for
// pages, that every inline script the page carries is allowed by its hash and nothing else inline is).
import { createHash } from 'node:crypto';
import { parse } from 'parse5';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createAccount, type TestAccount } from '../../helpers/accounts.ts';
import { TestClient, type ApiResponse } from '../../helpers/client.ts';
import { closeTestDb } from '../../helpers/db.ts';
import { block } from '../designFixtures.ts';

let quilter: TestAccount;
let designId: string;
const anonymous = new TestClient();

beforeAll(async () => {
  quilter = await createAccount({ displayName: 'Hedda Stitchwell' });
  designId = (await quilter.client.post('/api/designs', { title: 'Header check', design: block() })).body.design.id;
});
afterAll(closeTestDb);

/** The directives of a policy as name → sources. */
function directives(policy: string | null): Map<string, string[]> {
  const out = new Map<string, string[]>();
  for (const part of (policy ?? '').split(';')) {
    const [name, ...sources] = part.trim().split(/\s+/);
    if (name) out.set(name.toLowerCase(), sources);
  }
  return out;
}

interface HtmlNode {
  nodeName: string;
  attrs?: { name: string; value: string }[];
  childNodes?: HtmlNode[];
  content?: HtmlNode;
  value?: string;
}

/** Text of every inline (no src) script a browser would run (JSON data blocks are not run), found by parse5,
 *  an implementation of the WHATWG HTML parsing algorithm (so text inside attributes is never mistaken for a tag). */
function inlineScripts(html: string): string[] {
  const out: string[] = [];
  const stack: HtmlNode[] = [parse(html) as unknown as HtmlNode];
  while (stack.length > 0) {
    const node = stack.pop()!;
    if (node.nodeName === 'script') {
      const attr = (name: string) => node.attrs?.find((a) => a.name === name)?.value;
      const type = attr('type');
      if (attr('src') === undefined && !(type && /json/i.test(type))) out.push((node.childNodes ?? []).map((c) => c.value ?? '').join(''));
    }
    stack.push(...(node.childNodes ?? []));
    if (node.content) stack.push(node.content);
  }
  return out;
}

/** CSP 3 §8.4: a hash source matches when it is the base64 SHA-256 of the script element's text. */
const sha256Source = (text: string) => `'sha256-${createHash('sha256').update(text, 'utf8').digest('base64')}'`;

function expectCommonHeaders(res: ApiResponse, what: string) {
  expect(res.headers.get('x-frame-options'), what).toBe('DENY');
  expect(res.headers.get('x-content-type-options'), what).toBe('nosniff');
  expect(res.headers.get('referrer-policy'), what).toBe('same-origin');
  const csp = directives(res.headers.get('content-security-policy'));
  expect(csp.get('frame-ancestors'), what).toEqual(["'none'"]);
}

function expectPagePolicy(res: ApiResponse, what: string) {
  expectCommonHeaders(res, what);
  const csp = directives(res.headers.get('content-security-policy'));
  const scriptSrc = csp.get('script-src') ?? [];
  expect(scriptSrc[0], what).toBe("'self'");
  for (const source of scriptSrc.slice(1)) expect(source, what).toMatch(/^'sha256-[A-Za-z0-9+/]+=*'$/);
  expect(scriptSrc.join(' '), what).not.toMatch(/unsafe-inline|unsafe-eval|\*|data:|https?:/);
  expect(csp.get('object-src'), what).toEqual(["'none'"]);
  expect(csp.get('base-uri'), what).toEqual(["'none'"]);
  for (const script of inlineScripts(res.text)) expect(scriptSrc, `${what}: inline script ${script.slice(0, 60)}…`).toContain(sha256Source(script));
}

describe('pages', () => {
  const anonymousPages = ['/', '/sign-in', '/sign-up', '/forgot-password', '/templates', '/no-such-page'];
  for (const path of anonymousPages) {
    it(`anonymous ${path}: page policy with hashes only, no framing; not marked signed-in`, async () => {
      const res = await anonymous.get(path);
      expect(res.headers.get('content-type')).toMatch(/text\/html/);
      expectPagePolicy(res, path);
    });
  }

  const signedInPages = ['/dashboard', '/designs', '/designs/new', '/account', '/templates', '/classes', '/no-such-page'];
  for (const path of signedInPages) {
    it(`signed in ${path}: page policy and Cache-Control: no-store`, async () => {
      const res = await quilter.client.get(path);
      expectPagePolicy(res, path);
      expect(res.headers.get('cache-control'), path).toBe('no-store');
    });
  }

  it('the workbench page (islands, konva) carries the same policy', async () => {
    const res = await quilter.client.get(`/designs/${designId}`);
    expect(res.status).toBe(200);
    expect(inlineScripts(res.text).length).toBeGreaterThan(0);
    expectPagePolicy(res, '/designs/:id');
    expect(res.headers.get('cache-control')).toBe('no-store');
  });

  it('a redirect to sign-in is covered too', async () => {
    const res = await anonymous.get('/dashboard');
    expect(res.status).toBe(302);
    expectCommonHeaders(res, 'redirect');
  });
});

describe('everything that is not a page', () => {
  it('JSON answers allow nothing to load or frame them, and are not stored', async () => {
    for (const [client, path] of [[anonymous, '/api/session'], [quilter.client, '/api/session'], [anonymous, '/api/templates'], [anonymous, '/api/nope']] as const) {
      const res = await client.get(path);
      expectCommonHeaders(res, path);
      expect(directives(res.headers.get('content-security-policy')).get('default-src'), path).toEqual(["'none'"]);
      expect(res.headers.get('cache-control'), path).toBe('no-store');
    }
  });

  it('the SVG export keeps its own no-script policy and gains the common headers', async () => {
    const res = await quilter.client.get(`/api/designs/${designId}/export.svg`);
    expect(res.status).toBe(200);
    expectCommonHeaders({ ...res, headers: res.headers }, 'export.svg');
    const csp = directives(res.headers.get('content-security-policy'));
    expect(csp.get('default-src')).toEqual(["'none'"]);
    expect(csp.has('script-src')).toBe(false);
  });
});
