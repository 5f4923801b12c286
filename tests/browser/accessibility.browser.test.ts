// Issue 14's accessibility check: axe-core (Deque, from the npm registry) on every page each demo role can reach,
// with no serious or critical finding; and every visible control is in the Tab order. Signed out, as the quilter,
// the teacher and the admin.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { launchBrowser, waitForIslands, type TestBrowser, signInDemoBrowser } from '../helpers/browser.ts';
import { seriousAxeFindings, type AxeFinding } from '../helpers/axe.ts';

let browser: TestBrowser;
beforeAll(async () => {
  browser = await launchBrowser({ width: 1280, height: 900 });
});
afterAll(async () => {
  await browser?.close();
});

async function signInAs(displayName: string | null): Promise<void> {
  if (displayName) await signInDemoBrowser(browser.context, displayName);
  else await browser.context.clearCookies();
}

async function links(page: Page, pattern: RegExp): Promise<string[]> {
  const hrefs = await page.$$eval('a[href]', (as) => as.map((a) => a.getAttribute('href') ?? ''));
  return [...new Set(hrefs.filter((h) => pattern.test(h)))];
}

/** Visible controls taken out of the Tab order (tabindex < 0) — a keyboard user could not reach them. */
async function unreachableControls(page: Page): Promise<string[]> {
  return page.$$eval('a[href], button, input, select, textarea, summary', (els) =>
    els
      .filter((el) => {
        const h = el as HTMLElement;
        const r = h.getBoundingClientRect();
        return r.width > 0 && r.height > 0 && !(h as HTMLButtonElement).disabled && h.tabIndex < 0 && getComputedStyle(h).visibility !== 'hidden';
      })
      .map((el) => `${el.tagName.toLowerCase()} “${(el.textContent ?? '').trim().slice(0, 30)}”`),
  );
}

async function audit(page: Page, path: string, found: Record<string, AxeFinding[] | string[]>, ready?: (p: Page) => Promise<unknown>): Promise<void> {
  const res = await page.goto(path);
  expect(res?.status(), path).toBe(200);
  await waitForIslands(page);
  if (ready) await ready(page);
  const findings = await seriousAxeFindings(page);
  if (findings.length > 0) found[path] = findings;
  const unreachable = await unreachableControls(page);
  if (unreachable.length > 0) found[`${path} (not reachable by Tab)`] = unreachable;
}

describe('accessibility (axe-core: no serious or critical finding; every control reachable by keyboard)', () => {
  it('signed out: home, sign-in, sign-up, password reset, template gallery, a template and its walkthrough', async () => {
    await signInAs(null);
    const page = browser.page;
    const found: Record<string, AxeFinding[] | string[]> = {};
    for (const path of ['/', '/sign-in', '/sign-up', '/forgot-password', '/templates']) await audit(page, path, found);
    const template = (await links(page, /^\/templates\/[0-9a-f-]{36}$/))[0]!;
    await audit(page, template, found);
    await audit(page, `/walkthrough/${template.split('/').pop()}`, found, (p) => p.getByText(/Step 1 of/).first().waitFor({ timeout: 30_000 }));
    expect(found).toEqual({});
  });

  it('the quilter: dashboard, designs, new design, quilts, a quilt map, a workbench, account, classes, a class and its lesson', async () => {
    await signInAs('Tobias Wren');
    const page = browser.page;
    const found: Record<string, AxeFinding[] | string[]> = {};
    for (const path of ['/dashboard', '/designs/new', '/account', '/classes', '/payments']) await audit(page, path, found);
    await audit(page, '/designs', found, (p) => p.waitForFunction(() => !document.body.innerText.includes('Loading'), undefined, { timeout: 30_000 }));
    const design = (await links(page, /^\/designs\/[0-9a-f-]{36}$/))[0]!;
    // A quilt map of one of his designs (made through the API from the page, as the new-quilt form does).
    const designId = design.split('/').pop()!;
    const quiltId = await page.evaluate(async (id) => {
      const quilt = { version: 1, units: 'in', rows: 2, columns: 2, block: { width: 12, height: 12 }, placements: [[{ designId: id, rotation: 90 }, null], [null, null]], sashing: 1, borders: [2] };
      const res = await fetch('/api/quilts', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ title: 'Accessibility sampler', quilt }) });
      return ((await res.json()) as { quilt: { id: string } }).quilt.id;
    }, designId);
    await audit(page, '/quilts', found);
    await audit(page, `/quilts/${quiltId}`, found, (p) => p.getByTestId('finished-size').waitFor({ timeout: 30_000 }));
    await audit(page, design, found, (p) => p.locator('section[aria-label="Route check"] [data-figure="stitch-length"]').first().waitFor({ timeout: 30_000 }));
    await page.goto('/classes');
    const cls = (await links(page, /^\/classes\/[0-9a-f-]{36}$/))[0]!;
    await audit(page, cls, found);
    const lesson = (await links(page, /^\/classes\/[0-9a-f-]{36}\/lessons\/[0-9a-f-]{36}$/))[0]!;
    await audit(page, lesson, found, (p) => p.getByText(/Step 1 of/).first().waitFor({ timeout: 30_000 }));
    expect(found).toEqual({});
  });

  it('the teacher and the admin: class page with roster, new class, templates, admin accounts, captured mail', async () => {
    await signInAs('Marigold Ashby');
    const page = browser.page;
    const found: Record<string, AxeFinding[] | string[]> = {};
    for (const path of ['/classes/new', '/templates', '/payments']) await audit(page, path, found);
    await page.goto('/classes');
    for (const cls of await links(page, /^\/classes\/[0-9a-f-]{36}$/)) await audit(page, cls, found);
    await signInAs('Ines Calloway');
    for (const path of ['/admin/accounts', '/dev/mail', '/payments']) await audit(page, path, found);
    expect(found).toEqual({});
  });
});
