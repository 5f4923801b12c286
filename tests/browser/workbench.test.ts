// The block workbench in headless chromium: sign up, start a 12 in nine-patch, draw quilting lines with the
// ruler tool, watch the route check's stops change, plan the route, play the preview, keep it, reload and
// find everything saved, then see the design in the list. Screenshots: $TEST_OUTPUT_DIR/screenshots/workbench-*.
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fitBlockViewport, toScreen } from '@components/editor/viewport.ts';
import { DEFAULT_PASSWORD, uniqueEmail } from '../helpers/accounts.ts';
import { launchBrowser, screenshot, waitForIslands, type TestBrowser } from '../helpers/browser.ts';
import { finishSignUpFromMail } from '../helpers/signUpFlow.ts';

let browser: TestBrowser;
beforeAll(async () => {
  browser = await launchBrowser({ width: 1440, height: 960 });
});
afterAll(async () => {
  await browser?.close();
});

/** Clicks the canvas at a design point (inches) of a 12 in block, using the workbench's own fit-to-block view. */
async function clickAt(page: Page, x: number, y: number): Promise<void> {
  const canvas = page.locator('[data-testid="block-canvas"] canvas').first();
  const box = (await canvas.boundingBox())!;
  const view = fitBlockViewport(12, 12, Math.floor(box.width), Math.floor(box.height));
  const [sx, sy] = toScreen(view, [x, y]);
  await page.mouse.click(box.x + sx, box.y + sy);
}

async function drawRulerLine(page: Page, from: [number, number], to: [number, number]): Promise<void> {
  await clickAt(page, ...from);
  await clickAt(page, ...to);
}

const figure = (page: Page, name: string) => page.locator(`section[aria-label="Route check"] [data-figure="${name}"]`).first();

async function waitForFigure(page: Page, name: string, value: string): Promise<void> {
  await page
    .waitForFunction(
    ([n, v]) => document.querySelector(`section[aria-label="Route check"] [data-figure="${n}"]`)?.textContent?.trim() === v && document.querySelector('section[aria-label="Route check"]')?.getAttribute('aria-busy') === 'false',
    [name, value] as const,
    { timeout: 20_000 },
    )
    .catch(async (error: unknown) => {
      await screenshot(page, `workbench-failed-waiting-for-${name}-${value}`);
      throw error;
    });
}

describe('block workbench', () => {
  it('starts a nine-patch, draws lines, plans and plays the route, and keeps everything across a reload', async () => {
    const { page } = browser;
    const errors: string[] = [];
    page.on('pageerror', (e) => errors.push(String(e)));
    page.on('console', (m) => { if (m.type() === 'error') console.log('[browser]', m.text()); });
    page.on('response', (r) => { if (r.status() >= 400) console.log('[http]', r.status(), r.url()); });

    await page.goto('/sign-up');
    const email = uniqueEmail('workbench');
    await page.getByLabel('Display name').fill('Wren Calloway');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill(DEFAULT_PASSWORD);
    const since = new Date();
    await page.getByRole('button', { name: 'Create account' }).click();
    await finishSignUpFromMail(page, email, since);

    await page.goto('/designs');
    await page.getByText('No designs yet.').waitFor();
    await screenshot(page, 'workbench-01-empty-list');

    await page.getByRole('link', { name: 'Start your first design' }).click();
    await page.waitForURL('**/designs/new');
    // Typing before the form island hydrates can be lost (the machine was busy in one CI run and no design was made).
    await waitForIslands(page);
    await page.getByLabel('Title').fill('Heron Bend nine-patch');
    expect(await page.getByLabel('Finished size (in)').inputValue()).toBe('12');
    await page.getByText('Nine-patch', { exact: true }).click();
    await screenshot(page, 'workbench-02-new-design');
    await page.getByRole('button', { name: 'Start designing' }).click();
    await page.waitForURL(/\/designs\/[0-9a-f-]{36}$/);
    const designUrl = page.url();

    await page.locator('[data-testid="block-canvas"] canvas').first().waitFor();
    await page.getByRole('button', { name: /Ruler line/ }).click();

    // A line inside the top-left square (seams at 4 and 8 in): one piece, no stops.
    await drawRulerLine(page, [0.5, 0.5], [3.5, 3.5]);
    await waitForFigure(page, 'stops', '0');
    expect(await figure(page, 'passes').textContent()).toBe('1');
    expect(await figure(page, 'odd-points').textContent()).toBe('2');

    // A second line inside the centre square touches nothing the needle could travel along: a second pass, one stop.
    // One burst of edits is one request: the save (PUT ?check=1) brings the route check; no separate check is sent.
    await page.locator('[data-save-status="saved"]').waitFor({ timeout: 20_000 });
    const designCalls: string[] = [];
    const countCall = (r: { method(): string; url(): string }) => {
      const u = new URL(r.url());
      if (u.pathname.startsWith('/api/designs/') && r.method() !== 'GET') designCalls.push(`${r.method()} ${u.pathname}${u.search}`);
    };
    page.on('request', countCall);
    await drawRulerLine(page, [4.5, 4.5], [7.5, 7.5]);
    await waitForFigure(page, 'stops', '1');
    await page.locator('[data-save-status="saved"]').waitFor({ timeout: 20_000 });
    page.off('request', countCall);
    expect(designCalls).toEqual([`PUT ${new URL(designUrl).pathname.replace('/designs/', '/api/designs/')}?check=1`]);
    expect(await figure(page, 'passes').textContent()).toBe('2');
    await screenshot(page, 'workbench-03-two-pieces');

    // Joining them across the seam crossing at (4, 4) makes one piece again: no stops.
    await drawRulerLine(page, [3.5, 3.5], [4.5, 4.5]);
    await waitForFigure(page, 'stops', '0');

    // Undo and redo by keyboard go through the shared history.
    await page.locator('[data-testid="block-canvas"]').focus();
    await page.keyboard.press('Control+z');
    await waitForFigure(page, 'stops', '1');
    await page.keyboard.press('Control+Shift+Z');
    await waitForFigure(page, 'stops', '0');
    expect(await page.locator('[data-testid="block-canvas"]').getAttribute('aria-label')).toContain('3 quilting lines');

    await page.getByRole('button', { name: 'Plan route' }).click();
    await page.locator('[data-figure="plan-summary"]').waitFor();
    expect(await page.locator('[data-figure="plan-summary"]').textContent()).toContain('1 pass');
    await screenshot(page, 'workbench-04-planned');

    await page.getByRole('button', { name: 'Play' }).click();
    await page.waitForTimeout(1200);
    await screenshot(page, 'workbench-05-preview-playing');
    const scrub = page.getByLabel('Needle position');
    expect(Number(await scrub.inputValue())).toBeGreaterThan(0);
    await page.getByRole('button', { name: 'Step forward one stroke' }).click();

    await page.locator('[data-save-status="saved"]').waitFor({ timeout: 20_000 });
    await page.getByRole('button', { name: 'Keep planned route' }).click();
    await page.getByText('Kept the planned route.').waitFor();

    await page.goto(designUrl);
    await page.locator('[data-testid="block-canvas"] canvas').first().waitFor();
    await waitForFigure(page, 'stops', '0');
    expect(await page.locator('[data-testid="block-canvas"]').getAttribute('aria-label')).toContain('3 quilting lines');
    expect(await page.getByLabel('Design title').inputValue()).toBe('Heron Bend nine-patch');
    await page.getByText('Kept: the planned route.').waitFor();
    await screenshot(page, 'workbench-06-after-reload');

    // Block settings: a batting spacing limit of 2 in makes the gap check compare; one undo step takes it back.
    await page.getByText('Block settings', { exact: true }).click();
    await page.getByLabel('Batting spacing limit (in)').fill('2');
    await page.getByLabel('Batting spacing limit (in)').press('Enter');
    await page.waitForFunction(() => /(over|within) the batting’s 2 in limit/.test(document.querySelector('section[aria-label="Route check"] [data-figure="gap"]')?.textContent ?? ''), undefined, { timeout: 20_000 });
    await page.getByLabel('Stitches per inch (SPI)').fill('2');
    await page.getByLabel('Stitches per inch (SPI)').press('Enter');
    await page.getByText('Stitches per inch must be at least 4.').waitFor();

    // A motif placed into the bottom-right square: live preview, then one undo step adds all its lines.
    await page.getByRole('button', { name: /Motif in a patch/ }).click();
    await clickAt(page, 10, 10);
    await page.getByText(/\d+ lines in the preview/).waitFor();
    await screenshot(page, 'workbench-06b-motif-preview');
    await page.getByRole('button', { name: 'Place motif' }).click();
    await page.waitForFunction(() => !/ 3 quilting lines/.test(document.querySelector('[data-testid="block-canvas"]')?.getAttribute('aria-label') ?? ''));

    // My own stitching order: click two lines in turn; the card shows the order's own figures.
    await page.getByRole('button', { name: /My stitching order/ }).click();
    await clickAt(page, 2, 2);
    await clickAt(page, 6, 6);
    await page.getByRole('heading', { name: 'My stitching order', exact: true }).waitFor();
    await screenshot(page, 'workbench-06c-own-order');

    // Saved versions: go back to version 1, the nine-patch without quilting lines.
    await page.locator('[data-save-status="saved"]').waitFor({ timeout: 20_000 });
    await page.getByText('Saved versions', { exact: true }).click();
    await page.getByRole('button', { name: 'Go back to version 1' }).click();
    await page.waitForFunction(() => / 0 quilting lines/.test(document.querySelector('[data-testid="block-canvas"]')?.getAttribute('aria-label') ?? ''));
    await page.getByText(/Went back to version 1/).waitFor();
    expect(await page.getByLabel('Batting spacing limit (in)').inputValue()).toBe('');
    await screenshot(page, 'workbench-06d-settings-and-versions');

    await page.setViewportSize({ width: 834, height: 1112 });
    await page.waitForTimeout(300);
    await screenshot(page, 'workbench-07-tablet');
    await page.setViewportSize({ width: 1440, height: 960 });

    await page.goto('/designs');
    const row = page.getByRole('row', { name: /Heron Bend nine-patch/ });
    await row.waitFor();
    expect(await row.textContent()).toContain('12 × 12 in');
    await screenshot(page, 'workbench-08-list');

    // Delete, then undo from the notice: the design comes back (soft delete + restore).
    await page.getByRole('button', { name: 'Delete Heron Bend nine-patch' }).click();
    await page.getByText('No designs yet.').waitFor();
    await page.getByRole('button', { name: 'Undo' }).click();
    await row.waitFor();
    expect(errors).toEqual([]);
  });
});
