// Drawing feedback on the workbench in chromium (issue 14 item 3): a ruler line drawn by press-drag-release is
// saved; click, click still works and Esc drops a line half drawn; the smooth-curve tool shows the curve bending to
// the pointer while points are placed (the overlay's pixels on the curve, off the straight chords, change when Esc
// drops it); the start-and-end tool takes two clicks, its hint naming the step; a line dragged past the edge is
// clipped to the block with a note. Screenshots: drawtools-*.
import path from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fitBlockViewport, toScreen } from '@components/editor/viewport.ts';
import { catmullRomCurve } from '@shared/editor/smooth.ts';
import { createAccount } from '../helpers/accounts.ts';
import { launchBrowser, screenshot, waitForIslands, type TestBrowser } from '../helpers/browser.ts';
import { closeTestDb } from '../helpers/db.ts';
import { testEnv } from '../helpers/env.ts';

let browser: TestBrowser;
beforeAll(async () => {
  browser = await launchBrowser({ width: 1440, height: 900 });
});
afterAll(async () => {
  await browser?.close();
  await closeTestDb();
});

const canvasBox = async (page: Page) => (await page.locator('[data-testid="block-canvas"] canvas').first().boundingBox())!;

/** Screen position of a design point (inches) of a 12 in block in the workbench's fit-to-block view. */
async function at(page: Page, x: number, y: number): Promise<[number, number]> {
  const box = await canvasBox(page);
  const [sx, sy] = toScreen(fitBlockViewport(12, 12, Math.floor(box.width), Math.floor(box.height)), [x, y]);
  return [box.x + sx, box.y + sy];
}

const lineCount = (page: Page, n: number) =>
  page.waitForFunction((want) => new RegExp(` ${want} quilting lines`).test(document.querySelector('[data-testid="block-canvas"]')?.getAttribute('aria-label') ?? ''), n, { timeout: 10_000 });
const hint = (page: Page) => page.getByTestId('tool-hint').innerText();

/** Sum of alpha over every canvas layer in a 5 × 5 CSS px box around a page point. */
function inkNear(page: Page, [x, y]: [number, number]): Promise<number> {
  return page.evaluate(([px, py]) => {
    let sum = 0;
    for (const c of document.querySelectorAll<HTMLCanvasElement>('[data-testid="block-canvas"] canvas')) {
      const r = c.getBoundingClientRect();
      const k = c.width / r.width;
      const data = c.getContext('2d')!.getImageData(Math.round((px - r.left - 2) * k), Math.round((py - r.top - 2) * k), Math.ceil(5 * k), Math.ceil(5 * k)).data;
      for (let i = 3; i < data.length; i += 4) sum += data[i]!;
    }
    return sum;
  }, [x, y] as const);
}

describe('drawing tools with feedback', () => {
  it('drag-draws and click-clicks ruler lines, previews curves, cancels with Esc and sets the ends in two steps', async () => {
    const quilter = await createAccount();
    const design = { version: 1, units: 'in', width: 12, height: 12, seams: [], edgeTravel: true, lines: [] };
    const created = await quilter.client.post<{ design: { id: string } }>('/api/designs', { title: 'Feedback sampler', design });
    expect(created.status, created.text).toBe(201);
    const id = created.body.design.id;
    const { page, context } = browser;
    const errors: string[] = [];
    page.on('pageerror', (e) => errors.push(String(e)));
    await context.addCookies([{ name: 'tw_session', value: quilter.client.sessionToken!, url: testEnv.appUrl }]);
    await page.goto(`/designs/${id}`);
    await waitForIslands(page);
    await page.locator('[data-testid="block-canvas"] canvas').first().waitFor();

    // Ruler line by press, drag, release.
    await page.getByRole('button', { name: /Ruler line/ }).click();
    expect(await hint(page)).toMatch(/press where it starts and drag/);
    await page.mouse.move(...(await at(page, 2, 2)));
    await page.mouse.down();
    await page.mouse.move(...(await at(page, 5, 2)), { steps: 5 });
    expect(await hint(page)).toMatch(/Release or click where the quilting line ends/);
    await page.mouse.move(...(await at(page, 8, 2)), { steps: 5 });
    await page.mouse.up();
    await lineCount(page, 1);
    const savedLines = async () => (await quilter.client.get<{ design: { design: { lines: number[][][] } } }>(`/api/designs/${id}`)).body.design.design.lines;
    await expect.poll(savedLines, { timeout: 20_000 }).toEqual([[[2, 2], [8, 2]]]);

    // Click, click still draws; Esc after the first click drops the line.
    await page.mouse.click(...(await at(page, 2, 10)));
    await page.mouse.click(...(await at(page, 8, 10)));
    await lineCount(page, 2);
    await page.mouse.click(...(await at(page, 2, 11)));
    await page.keyboard.press('Escape');
    expect(await hint(page)).toMatch(/press where it starts/);
    await page.mouse.click(...(await at(page, 6, 11)));
    await page.keyboard.press('Escape');
    await lineCount(page, 2);

    // Smooth curve: two points placed, pointer at a third; the curve's bulge between the last two is drawn.
    await page.getByRole('button', { name: /Smooth curve/ }).click();
    await page.mouse.click(...(await at(page, 3, 7)));
    await page.mouse.click(...(await at(page, 6, 4)));
    await page.mouse.move(...(await at(page, 9, 7)), { steps: 4 });
    expect(await hint(page)).toMatch(/Click the next point/);
    // Catmull–Rom through the three points (shared/editor/smooth.ts); the sample halfway along the second span
    // bulges above the chord from (6, 4) to (9, 7), where no straight preview would be.
    const curve = catmullRomCurve([[3, 7], [6, 4], [9, 7]], 16);
    const bulge = curve[24]!;
    expect(bulge[1]).toBeLessThan(5.4);
    const withPreview = await inkNear(page, await at(page, bulge[0], bulge[1]));
    await screenshot(page, 'drawtools-curve-preview');
    await page.keyboard.press('Escape');
    await page.waitForTimeout(100);
    const dropped = await inkNear(page, await at(page, bulge[0], bulge[1]));
    expect(withPreview).toBeGreaterThan(dropped + 200);
    await lineCount(page, 2);

    // Start and end in two steps, the hint naming each.
    await page.getByRole('button', { name: /Start and end/ }).click();
    expect(await hint(page)).toMatch(/^Step 1 of 2: click where the needle starts/);
    await page.mouse.click(...(await at(page, 2, 2)));
    expect(await hint(page)).toMatch(/^Step 2 of 2: click where the needle finishes/);
    await page.mouse.move(...(await at(page, 7, 9)));
    // The viewport only: a full-page shot resizes the window, and the canvas refits while it is taken.
    await page.screenshot({ path: path.join(testEnv.outputDir, 'screenshots', 'drawtools-ends-step-2.png') });
    await page.mouse.click(...(await at(page, 8, 10)));
    expect(await hint(page)).toMatch(/^Step 1 of 2/);
    const savedEnds = async () => (await quilter.client.get<{ design: { design: { start?: number[]; end?: number[] } } }>(`/api/designs/${id}`)).body.design.design;
    await expect.poll(savedEnds, { timeout: 20_000 }).toMatchObject({ start: [2, 2], end: [8, 10] });

    // A ruler line dragged past the edge is clipped to the block, and the footer says so (shared/editor/blockGuard.ts).
    await page.getByRole('button', { name: /Ruler line/ }).click();
    await page.mouse.move(...(await at(page, 6, 6)));
    await page.mouse.down();
    await page.mouse.move(...(await at(page, 13.5, 6)), { steps: 6 });
    await page.mouse.up();
    await lineCount(page, 3);
    expect(await hint(page)).toMatch(/The part outside the block was left off/);
    await screenshot(page, 'drawtools-clipped-at-edge');
    await expect.poll(savedLines, { timeout: 20_000 }).toContainEqual([[6, 6], [12, 6]]);

    for (const [w, h] of [[820, 1180], [390, 844]] as const) {
      await page.setViewportSize({ width: w, height: h });
      await page.waitForTimeout(200);
      await screenshot(page, `drawtools-hint-${w}x${h}`);
      const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
      expect(overflow, `${w} px wide`).toBeLessThanOrEqual(0);
    }
    expect(errors).toEqual([]);
  });
});
