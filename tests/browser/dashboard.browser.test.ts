// Issue 14, item 8 (finding things): the dashboard shows a quilter's latest designs with passes and stops and the
// next lesson of each class; a teacher sees what the students did this week; templates are in the header. Checked
// at desktop, tablet and phone widths: nothing wider than the viewport. Screenshots in test-output/screenshots.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, screenshot, type TestBrowser, signInDemoBrowser } from '../helpers/browser.ts';
import { elementsWiderThanViewport, WIDTHS } from '../helpers/layout.ts';

let browser: TestBrowser;
beforeAll(async () => {
  browser = await launchBrowser(WIDTHS[0]);
});
afterAll(async () => {
  await browser?.close();
});

const signInAs = (displayName: string) => signInDemoBrowser(browser.context, displayName);

describe('the dashboard', () => {
  it('a student sees their latest designs with passes and stops and the next lesson to start', async () => {
    await signInAs('Tobias Wren');
    const page = browser.page;
    for (const size of WIDTHS) {
      await page.setViewportSize(size);
      await page.goto('/dashboard');
      const designs = page.locator('[data-dashboard=designs]');
      await expect.poll(() => designs.locator('li').count()).toBe(3);
      // The seeded blocks are each sewn in one pass (tests/unit/seedPromise.test.ts).
      expect(await designs.innerText()).toContain('1 pass · 0 stops');
      const lessons = await page.locator('[data-dashboard=lessons]').innerText();
      expect(lessons).toContain('Tuesday quilt-along');
      expect(lessons).toMatch(/Start: Week 1|Carry on: Week 1/);
      expect(await page.locator('header nav a[href="/templates"]').count()).toBe(1);
      expect(await elementsWiderThanViewport(page), `${size.name}: wider than the viewport`).toEqual([]);
      await screenshot(page, `dashboard-student-${size.name}`);
    }
  });

  it('a teacher sees their classes with what the students did this week', async () => {
    await signInAs('Marigold Ashby');
    const page = browser.page;
    for (const size of WIDTHS) {
      await page.setViewportSize(size);
      await page.goto('/dashboard');
      const teaching = await page.locator('[data-dashboard=teaching]').innerText();
      expect(teaching).toContain('Tuesday quilt-along');
      expect(teaching).toMatch(/\d+ of 2 students quilted/);
      expect(await elementsWiderThanViewport(page), `${size.name}: wider than the viewport`).toEqual([]);
      await screenshot(page, `dashboard-teacher-${size.name}`);
    }
  });
});
