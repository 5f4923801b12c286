// The walkthrough of a template outside any class (/walkthrough/:templateId) in headless chromium: steps in large
// type, next/previous by touch-sized buttons and by keyboard, play animating a step and pausing at its end,
// scrubbing, the printable step list with safety notes, and a tablet-sized layout. Screenshots go to
// $TEST_OUTPUT_DIR/screenshots/ (walkthrough-*.png).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createAccount } from '../helpers/accounts.ts';
import { launchBrowser, screenshot, type TestBrowser } from '../helpers/browser.ts';
import { closeTestDb } from '../helpers/db.ts';
import { publishRibbonCandyTemplate } from './walkthroughFixtures.ts';

let browser: TestBrowser;
let templateId: string;
beforeAll(async () => {
  const teacher = await createAccount({ role: 'teacher', displayName: 'Tamsin Greaves' });
  ({ templateId } = await publishRibbonCandyTemplate(teacher, 'public', 'Ribbon candy half-square block'));
  browser = await launchBrowser({ width: 1280, height: 900 });
});
afterAll(async () => {
  await browser?.close();
  await closeTestDb();
});

const counter = (page: TestBrowser['page']) => page.getByTestId('step-counter').textContent();

describe('template walkthrough', () => {
  it('steps through the route with buttons and keys, plays a step and scrubs', async () => {
    const { page } = browser;
    await page.goto(`/walkthrough/${templateId}`);
    await page.getByTestId('walkthrough').waitFor();
    expect(await counter(page)).toMatch(/^Step 1 of (\d+) · Pass 1 of 1$/);
    const total = Number(/of (\d+)/.exec((await counter(page))!)![1]);
    expect(total).toBeGreaterThan(4);
    expect(await page.getByTestId('step-instruction').textContent()).toContain('starts at the top-left corner of the block');
    // Saving is off outside a class, and says so.
    expect(await page.getByTestId('save-state').getAttribute('data-state')).toBe('off');
    await screenshot(page, 'walkthrough-01-start');

    await page.getByRole('button', { name: 'Next ▶' }).click();
    expect(await counter(page)).toMatch(/^Step 2 of /);
    const instruction = (await page.getByTestId('step-instruction').textContent())!;
    expect(instruction).toMatch(/^Stitch .* in the top-left triangle\. End at /);
    await screenshot(page, 'walkthrough-02-first-stitch');

    // Play animates the step and pauses at its end (the needle stops where the step ends).
    await page.getByLabel('Stitches per minute').fill('3000');
    await page.getByRole('radio', { name: '4×' }).click();
    await page.getByRole('button', { name: '▶ Play step' }).click();
    await page.getByRole('button', { name: '❚❚ Pause' }).waitFor();
    await page.getByRole('button', { name: '▶ Play next step' }).waitFor({ timeout: 30_000 });
    expect(await counter(page)).toMatch(/^Step 2 of /);
    await screenshot(page, 'walkthrough-03-step-played');

    // Keyboard: → next, ← previous, End last, Home first.
    await page.locator('body').click({ position: { x: 5, y: 5 } });
    await page.keyboard.press('ArrowRight');
    expect(await counter(page)).toMatch(/^Step 3 of /);
    await page.keyboard.press('ArrowLeft');
    expect(await counter(page)).toMatch(/^Step 2 of /);
    await page.keyboard.press('End');
    expect(await counter(page)).toBe(`Step ${total} of ${total} · Pass 1 of 1`);
    expect(await page.getByTestId('step-instruction').textContent()).toMatch(/^Tie off: pass 1 ends at .*That was the last pass/);
    await page.keyboard.press('Home');
    expect(await counter(page)).toMatch(/^Step 1 of /);

    // Scrubbing to the middle of the route picks the step under the needle.
    const scrub = page.getByLabel('Needle');
    await scrub.fill(String(Number(await scrub.getAttribute('max')) / 2));
    expect(await counter(page)).not.toMatch(/^Step 1 of /);

    // The printable list holds every step and the needle caution; the iron is mentioned because the
    // template's description says to press the block.
    expect(await page.getByTestId('step-list').locator('li').count()).toBe(total);
    const safety = (await page.getByRole('note', { name: 'Safety' }).textContent())!;
    expect(safety).toContain('fingers clear of the needle');
    expect(safety).toContain('iron');
    await screenshot(page, 'walkthrough-04-scrubbed');
  });

  it('fits a tablet propped by the machine: controls at least 48 px, step text large', async () => {
    const { page } = browser;
    await page.setViewportSize({ width: 820, height: 1180 });
    await page.goto(`/walkthrough/${templateId}`);
    await page.getByTestId('walkthrough').waitFor();
    const controls = page.getByRole('group', { name: 'Walkthrough controls' });
    for (const name of ['◀ Previous', '▶ Play step', 'Next ▶', '↺ Replay step']) {
      const box = (await controls.getByRole('button', { name }).boundingBox())!;
      expect(box.height).toBeGreaterThanOrEqual(48);
      expect(box.width).toBeGreaterThanOrEqual(48);
    }
    const stepText = await page.getByTestId('step-instruction').evaluate((el) => parseFloat(getComputedStyle(el).fontSize));
    expect(stepText).toBeGreaterThanOrEqual(22);
    await controls.getByRole('button', { name: 'Next ▶' }).click();
    expect(await counter(page)).toMatch(/^Step 2 of /);
    await screenshot(page, 'walkthrough-05-tablet');
  });

  it('answers 404 for a template that does not exist', async () => {
    const res = await browser.page.goto('/walkthrough/00000000-0000-4000-8000-000000000000');
    expect(res?.status()).toBe(404);
  });
});
