// A teacher fixes a lesson in headless chromium (issue 14, item 7): edits its title, moves the next lesson's
// release into the past (asked first), deletes the released lesson after reading what the student loses (counted
// from the rows: one enrolled student with progress), and then the student's view: the class page without the
// lesson, its address a 404 page. Screenshots at 1440 × 900, 820 × 1180 and 390 × 844 under test-output/screenshots/.
import { formatDate, WITHOUT_VIEWER } from '@shared/format/dates.ts';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import path from 'node:path';
import { launchBrowser, screenshot, type TestBrowser } from '../helpers/browser.ts';
import { closeTestDb } from '../helpers/db.ts';
import { testEnv } from '../helpers/env.ts';
import type { TestAccount } from '../helpers/accounts.ts';
import { buildWorld, expectStatus, type World } from '../api/teachingWorld.ts';

let w: World;
let browser: TestBrowser;
async function signInAs(account: TestAccount) {
  await browser.context.clearCookies();
  await browser.context.addCookies([{ name: 'tw_session', value: account.client.sessionToken!, url: testEnv.appUrl }]);
}
const SIZES = [
  { name: 'desktop', width: 1440, height: 900 },
  { name: 'tablet', width: 820, height: 1180 },
  { name: 'phone', width: 390, height: 844 },
] as const;

/** The page never scrolls sideways (a wide table may scroll inside its own box); the failure names what sticks out. */
async function expectNoSidewaysScroll() {
  const found = await browser.page.evaluate(() => ({
    overflow: document.documentElement.scrollWidth - window.innerWidth,
    wide: Array.from(document.querySelectorAll('body *'))
      .filter((e) => e.getBoundingClientRect().right > window.innerWidth + 0.5)
      .map((e) => `${e.tagName.toLowerCase()}.${String(e.className).slice(0, 60)} right=${Math.round(e.getBoundingClientRect().right)}`)
      .slice(0, 8),
  }));
  expect(found.overflow, `wider than ${browser.page.viewportSize()?.width} px: ${found.wide.join('; ')}`).toBeLessThanOrEqual(0);
}

/** The viewport only (a full-page shot would centre the modal dialog on the whole page, off the visible part). */
async function viewportShot(name: string) {
  await browser.page.screenshot({ path: path.join(testEnv.outputDir, 'screenshots', `${name}.png`) });
}

beforeAll(async () => {
  w = await buildWorld();
  await expectStatus(w.student.client.put(`/api/lessons/${w.releasedLessonId}/progress`, { stepIndex: 1, totalSteps: 3 }), 200);
  browser = await launchBrowser({ width: 1440, height: 900 });
});
afterAll(async () => {
  await browser?.close();
  await closeTestDb();
});

describe('a teacher edits and deletes a lesson', () => {
  it('edits the title; the edit form sends only what changed', async () => {
    await signInAs(w.teacher);
    const page = browser.page;
    await page.goto(`/classes/${w.classId}/lessons/${w.releasedLessonId}`);
    const form = page.locator('form', { has: page.getByRole('heading', { name: 'Edit lesson' }) });
    await form.getByLabel('Title').fill('Lesson 1: the first line, pressed');
    const sent = page.waitForRequest((r) => r.method() === 'PATCH');
    await form.getByRole('button', { name: 'Save changes' }).click();
    expect((await sent).postDataJSON()).toEqual({ title: 'Lesson 1: the first line, pressed' });
    await page.getByRole('heading', { level: 1, name: 'Lesson 1: the first line, pressed' }).waitFor();
    for (const size of SIZES) {
      // Loaded at each size, as a teacher on that device would (the walkthrough sizes its canvas when it mounts).
      await page.setViewportSize(size);
      await page.reload();
      await page.getByTestId('walkthrough').waitFor();
      await expectNoSidewaysScroll();
      await screenshot(page, `teaching-edit-lesson-${size.name}`);
    }
  });

  it('moving a release into the past asks first; "Change it" sends nothing more, "Yes" releases it', async () => {
    const page = browser.page;
    await page.setViewportSize({ width: 1440, height: 900 });
    await page.goto(`/classes/${w.classId}/lessons/${w.futureLessonId}`);
    const form = page.locator('form', { has: page.getByRole('heading', { name: 'Edit lesson' }) });
    const yesterday = new Date(Date.now() - 24 * 60 * 60 * 1000);
    const pad = (n: number) => String(n).padStart(2, '0');
    const local = `${yesterday.getFullYear()}-${pad(yesterday.getMonth() + 1)}-${pad(yesterday.getDate())}T${pad(yesterday.getHours())}:${pad(yesterday.getMinutes())}`;
    await form.getByLabel('Release (your local time)').fill(local);
    await form.getByRole('button', { name: 'Save changes' }).click();
    const dialog = page.getByRole('dialog', { name: 'Check the date' });
    expect(await dialog.locator('[data-confirm-message]').textContent()).toMatch(/is in the past: students can open the lesson as soon as you save\. Keep it\?$/);
    await viewportShot('teaching-edit-lesson-past-date');
    await dialog.getByRole('button', { name: 'Change it' }).click();
    expect(await page.getByRole('dialog').count()).toBe(0);
    expect((await expectStatus(w.teacher.client.get(`/api/lessons/${w.futureLessonId}`), 200)).lesson.released).toBe(false);

    await form.getByRole('button', { name: 'Save changes' }).click();
    await page.getByRole('dialog', { name: 'Check the date' }).getByRole('button', { name: 'Yes, keep this date' }).click();
    await page.getByText(/^Released /).waitFor();
    expect((await expectStatus(w.teacher.client.get(`/api/lessons/${w.futureLessonId}`), 200)).lesson.released).toBe(true);
  });

  it('deleting says what the student loses, asks, and takes the lesson away from the student', async () => {
    const page = browser.page;
    await page.goto(`/classes/${w.classId}/lessons/${w.releasedLessonId}`);
    await page.getByRole('button', { name: 'Delete lesson…' }).click();
    const dialog = page.getByRole('dialog', { name: 'Delete “Lesson 1: the first line, pressed”?' });
    // One student enrolled, with progress on this lesson, no photos (beforeAll).
    expect(await dialog.locator('[data-confirm-message]').textContent()).toBe('1 student loses access to this lesson. Also deleted: the progress of 1 student. This cannot be undone.');
    for (const size of SIZES) {
      await page.setViewportSize(size);
      const box = (await dialog.boundingBox())!;
      expect(box.x).toBeGreaterThanOrEqual(0);
      expect(box.x + box.width).toBeLessThanOrEqual(size.width);
      await viewportShot(`teaching-delete-lesson-ask-${size.name}`);
    }
    await page.setViewportSize({ width: 1440, height: 900 });
    // Esc keeps the lesson.
    await page.keyboard.press('Escape');
    expect(await page.getByRole('dialog').count()).toBe(0);
    expect((await w.teacher.client.get(`/api/lessons/${w.releasedLessonId}`)).status).toBe(200);

    await page.getByRole('button', { name: 'Delete lesson…' }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Delete lesson' }).click();
    await page.waitForURL((u) => u.pathname === `/classes/${w.classId}`);
    expect(await page.getByRole('link', { name: /Lesson 1: the first line/ }).count()).toBe(0);

    await signInAs(w.student);
    await page.goto(`/classes/${w.classId}`);
    expect(await page.getByRole('link', { name: /Lesson 1: the first line/ }).count()).toBe(0);
    // The lesson moved into the past above is the one the student now sees.
    expect(await page.getByRole('link', { name: /Lesson 2: not yet/ }).count()).toBe(1);
    for (const size of SIZES) {
      await page.setViewportSize(size);
      await expectNoSidewaysScroll();
      await screenshot(page, `teaching-after-delete-student-${size.name}`);
    }
    const gone = await page.goto(`/classes/${w.classId}/lessons/${w.releasedLessonId}`);
    expect(gone?.status()).toBe(404);
    expect(await page.textContent('h1')).toBe('We could not find that page');
  });

  it('the class itself: an edit, then a delete that names what is lost; the student is left with no class', async () => {
    const page = browser.page;
    await page.setViewportSize({ width: 1440, height: 900 });
    await signInAs(w.teacher);
    await page.goto(`/classes/${w.classId}`);
    const form = page.locator('form', { has: page.getByRole('heading', { name: 'Edit class' }) });
    await form.getByLabel('Title').fill('Tuesday quilt-along (winter)');
    await form.getByRole('button', { name: 'Save changes' }).click();
    await page.getByRole('heading', { level: 1, name: 'Tuesday quilt-along (winter)' }).waitFor();

    await page.getByRole('button', { name: 'Delete class…' }).click();
    const dialog = page.getByRole('dialog', { name: 'Delete “Tuesday quilt-along (winter)”?' });
    // Left from the tests above: one student, one lesson (the one moved into the past), no progress, no photos.
    expect(await dialog.locator('[data-confirm-message]').textContent()).toBe('The class, its lessons, invitations and join code go. 1 student loses access to 1 lesson. This cannot be undone.');
    for (const size of SIZES) {
      await page.setViewportSize(size);
      await expectNoSidewaysScroll();
      await viewportShot(`teaching-delete-class-ask-${size.name}`);
    }
    await dialog.getByRole('button', { name: 'Delete class' }).click();
    await page.waitForURL((u) => u.pathname === '/classes');
    expect((await expectStatus(w.student.client.get('/api/classes'), 200)).enrolled).toEqual([]);
  });

  it('a new class starting last week is asked about, then created', async () => {
    const page = browser.page;
    await signInAs(w.teacher);
    for (const size of SIZES) {
      await page.setViewportSize(size);
      await page.goto('/classes/new');
      await expectNoSidewaysScroll();
      await screenshot(page, `teaching-new-class-${size.name}`);
    }
    await page.setViewportSize({ width: 1440, height: 900 });
    const lastWeek = new Date(Date.now() - 7 * 24 * 60 * 60 * 1000).toISOString().slice(0, 10);
    await page.getByLabel('Title').fill('Catch-up circle');
    await page.getByLabel('Start date').fill(lastWeek);
    await page.getByRole('button', { name: 'Create class' }).click();
    const dialog = page.getByRole('dialog', { name: 'Check the date' });
    expect(await dialog.locator('[data-confirm-message]').textContent()).toBe(`The start date ${formatDate(`${lastWeek}T00:00:00Z`, 'day', WITHOUT_VIEWER)} is in the past. Keep it?`);
    await dialog.getByRole('button', { name: 'Yes, keep this date' }).click();
    await page.getByRole('heading', { level: 1, name: 'Catch-up circle' }).waitFor();
  });
});
