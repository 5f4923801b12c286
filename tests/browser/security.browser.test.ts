// Issue 10, defects 1 and 13 in a real browser (Debian chromium). Teachers' text is shown to everyone, so template
// titles built to break out of markup — String.prototype.replace patterns ($&, $'), closing tags, event handlers —
// must render as text on every page that shows them, anonymous or signed in. Each payload would set
// window.__xss if it ran. The same visits check the Content-Security-Policy against our own pages: islands
// hydrate, the workbench's konva canvas draws, the walkthrough mounts, and no policy violation is reported.
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createAccount, type TestAccount } from '../helpers/accounts.ts';
import { launchBrowser, screenshot, waitForIslands, type TestBrowser } from '../helpers/browser.ts';
import { closeTestDb } from '../helpers/db.ts';
import { testEnv } from '../helpers/env.ts';
import { block } from '../api/designFixtures.ts';
import { daysAhead } from '../api/teachingWorld.ts';

const PAYLOADS = [
  '$& onload=window.__xss=1 x',
  "$' onmouseover=window.__xss=2 $` $$",
  '"><script>window.__xss=3</script>',
  '</svg><img src=x onerror="window.__xss=4">',
  '</title></text><svg onload=window.__xss=5>',
  "$1 $<n> ]]> </script><script>window.__xss=6</script> &amp; &lt;b&gt;",
];

let teacher: TestAccount;
let student: TestAccount;
let browser: TestBrowser;
const templates: { id: string; title: string; versionId: string }[] = [];
let classId: string;
let lessonId: string;
let copyId: string;

async function ok(p: Promise<{ status: number; body: any; text: string }>, status: number): Promise<any> {
  const res = await p;
  if (res.status !== status) throw new Error(`expected ${status}, got ${res.status}: ${res.text}`);
  return res.body;
}

beforeAll(async () => {
  teacher = await createAccount({ role: 'teacher', displayName: 'Tamsin Loftus' });
  student = await createAccount({ displayName: 'Piet Overcast' });
  for (const title of PAYLOADS) {
    const d = await ok(teacher.client.post('/api/designs', { title: `Design ${title}`, design: block() }), 201);
    await ok(teacher.client.put(`/api/designs/${d.design.id}/route`, { kind: 'planned', designVersion: 1 }), 200);
    const t = await ok(teacher.client.post('/api/templates', { designId: d.design.id, title, description: `About ${title}`, difficulty: 'beginner', visibility: 'public' }), 201);
    templates.push({ id: t.template.id, title: t.version.title, versionId: t.version.id });
  }
  const cls = await ok(teacher.client.post('/api/classes', { title: `Class ${PAYLOADS[0]}`, startsOn: daysAhead(150) }), 201);
  classId = cls.class.id;
  const lesson = await ok(
    teacher.client.post(`/api/classes/${classId}/lessons`, {
      title: `Lesson ${PAYLOADS[2]}`,
      releaseAt: new Date(Date.now() - 60_000).toISOString(),
      notes: `Notes ${PAYLOADS[3]} [link](javascript:window.__xss=7) <img src=x onerror=window.__xss=8>`,
      templateVersionId: templates[0]!.versionId,
      confirmed: true,
    }),
    201,
  );
  lessonId = lesson.lesson.id;
  await ok(student.client.post('/api/classes/join', { code: cls.class.joinCode }), 200);
  copyId = (await ok(student.client.post(`/api/templates/${templates[0]!.id}/copy`, {}), 201)).designId;
  browser = await launchBrowser({ width: 1440, height: 900 });
  // Before any page script: count policy violations the page reports (the init script itself is not subject to it).
  await browser.context.addInitScript(() => {
    const w = window as unknown as { __cspViolations: string[] };
    w.__cspViolations = [];
    document.addEventListener('securitypolicyviolation', (e) => w.__cspViolations.push(`${e.violatedDirective} ${e.blockedURI} ${e.sample}`));
  });
});
afterAll(async () => {
  await browser?.close();
  await closeTestDb();
});

async function signInAs(account: TestAccount | null) {
  await browser.context.clearCookies();
  if (account) await browser.context.addCookies([{ name: 'tw_session', value: account.client.sessionToken!, url: testEnv.appUrl }]);
}

interface Visit {
  dialogs: string[];
  consoleCsp: string[];
}

/** Opens the page, lets islands hydrate, and checks that nothing injected ran and no policy was violated. */
async function visitInert(page: Page, path: string): Promise<void> {
  const seen: Visit = { dialogs: [], consoleCsp: [] };
  const onDialog = (d: { message(): string; dismiss(): Promise<void> }) => {
    seen.dialogs.push(d.message());
    void d.dismiss();
  };
  const onConsole = (m: { text(): string }) => {
    if (/Content Security Policy/i.test(m.text())) seen.consoleCsp.push(m.text());
  };
  page.on('dialog', onDialog);
  page.on('console', onConsole);
  try {
    const res = await page.goto(path);
    expect(res?.status(), path).toBe(200);
    await waitForIslands(page);
    await page.waitForTimeout(300); // onload / onerror handlers fire after images and SVG load
    const state = await page.evaluate(() => {
      const w = window as unknown as { __xss?: number; __cspViolations: string[] };
      const handlers: string[] = [];
      for (const el of Array.from(document.querySelectorAll('*'))) {
        for (const a of Array.from(el.attributes)) if (a.name.toLowerCase().startsWith('on')) handlers.push(`${el.tagName} ${a.name}`);
      }
      const inlineScripts = Array.from(document.querySelectorAll('script:not([src])'))
        .filter((s) => s.getAttribute('type') !== 'application/json')
        .map((s) => s.textContent ?? '');
      const javascriptLinks = Array.from(document.querySelectorAll('a[href]')).filter((a) => /^\s*javascript:/i.test(a.getAttribute('href') ?? '')).length;
      return { xss: w.__xss, violations: w.__cspViolations, handlers, injectedScripts: inlineScripts.filter((t) => t.includes('__xss')).length, javascriptLinks };
    });
    expect(state.xss, `${path}: an injected script ran`).toBeUndefined();
    expect(state.handlers, `${path}: event-handler attributes in the DOM`).toEqual([]);
    expect(state.injectedScripts, path).toBe(0);
    expect(state.javascriptLinks, path).toBe(0);
    expect(seen.dialogs, path).toEqual([]);
    expect(state.violations, `${path}: CSP violations`).toEqual([]);
    expect(seen.consoleCsp, `${path}: CSP console errors`).toEqual([]);
  } finally {
    page.off('dialog', onDialog);
    page.off('console', onConsole);
  }
}

/** The title shows as text (h1) and as the drawing's accessible label, exactly as typed. */
async function expectTitleAsText(page: Page, title: string) {
  expect(await page.locator('h1').first().textContent()).toBe(title);
  const labels = await page.locator('svg[role="img"]').evaluateAll((els) => els.map((e) => e.getAttribute('aria-label')));
  expect(labels).toContain(title);
}

describe('stored script injection through template titles', () => {
  it('anonymous visitors: the gallery, every template page and its walkthrough render the titles inert', async () => {
    await signInAs(null);
    const { page } = browser;
    await visitInert(page, '/templates');
    const cardLabels = await page.locator('svg[role="img"]').evaluateAll((els) => els.map((e) => e.getAttribute('aria-label')));
    for (const t of templates) expect(cardLabels).toContain(t.title);
    await screenshot(page, 'security-gallery-anonymous');
    for (const t of templates) {
      await visitInert(page, `/templates/${t.id}`);
      await expectTitleAsText(page, t.title);
      await visitInert(page, `/walkthrough/${t.id}`);
    }
    await screenshot(page, 'security-walkthrough-anonymous');
  });

  it('a signed-in student: gallery, template page, class, lesson (walkthrough data and notes), copied design in the list and the workbench', async () => {
    await signInAs(student);
    const { page } = browser;
    await visitInert(page, '/templates');
    await visitInert(page, `/templates/${templates[1]!.id}`);
    await expectTitleAsText(page, templates[1]!.title);
    await visitInert(page, `/classes/${classId}`);
    await visitInert(page, `/classes/${classId}/lessons/${lessonId}`);
    const data = JSON.parse((await page.textContent('#walkthrough-data'))!);
    expect(data.template.title).toBe(templates[0]!.title);
    await screenshot(page, 'security-lesson-student');
    await visitInert(page, '/dashboard');
    await visitInert(page, '/designs');
    await page.getByRole('link', { name: `${templates[0]!.title} (template v1)`, exact: true }).waitFor(); // the visible one (phones get cards, wider screens the table)
    await visitInert(page, `/designs/${copyId}`);
    // The workbench island hydrated under the policy and konva drew its canvas.
    await page.waitForSelector('[data-testid="block-canvas"] canvas');
    expect(await page.locator('[data-testid="block-canvas"] canvas').count()).toBeGreaterThan(0);
    await screenshot(page, 'security-workbench-student');
  });

  it('the teacher: class page (template picker), templates page (own list and design picker), each template page', async () => {
    await signInAs(teacher);
    const { page } = browser;
    await visitInert(page, `/classes/${classId}`);
    const options = await page.locator('select[name="templateVersionId"] option').allTextContents();
    for (const t of templates) expect(options).toContain(`${t.title} (version 1)`);
    await visitInert(page, '/templates');
    for (const t of templates) await visitInert(page, `/templates/${t.id}`);
  });
});

describe('the policy does not get in our own way', () => {
  it('sign-in, sign-up and the account page hydrate their island forms with no violation', async () => {
    await signInAs(null);
    const { page } = browser;
    for (const path of ['/sign-in', '/sign-up', '/forgot-password', '/']) await visitInert(page, path);
    await signInAs(student);
    await visitInert(page, '/account');
    await visitInert(page, '/designs/new');
  });
});
