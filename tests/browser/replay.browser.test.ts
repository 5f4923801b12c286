// The student replay in headless chromium (issue 14 item 4): Play with "pause after each step" plays the step on
// the card and stops at its end, never replacing the text being read; the controls bar and the block stay in view
// at desktop, tablet and phone sizes (bounding boxes; viewport screenshots in $TEST_OUTPUT_DIR/screenshots/
// replay-*.png); the canvas labels never overlap (Konva's own client rects).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { createAccount } from '../helpers/accounts.ts';
import { launchBrowser, type TestBrowser } from '../helpers/browser.ts';
import { closeTestDb } from '../helpers/db.ts';
import { testEnv } from '../helpers/env.ts';
import { publishRibbonCandyTemplate } from './walkthroughFixtures.ts';
import { mkdirSync } from 'node:fs';
import path from 'node:path';

let browser: TestBrowser;
let templateId: string;
beforeAll(async () => {
  const teacher = await createAccount({ role: 'teacher', displayName: 'Ottoline Brisk' });
  ({ templateId } = await publishRibbonCandyTemplate(teacher, 'public', 'Replay test block'));
  browser = await launchBrowser({ width: 1440, height: 900 });
});
afterAll(async () => {
  await browser?.close();
  await closeTestDb();
});

const counter = (page: Page) => page.getByTestId('step-counter').textContent();
const stepOf = (text: string | null) => Number(/Step (\d+) of/.exec(text ?? '')?.[1]);

/** What is on screen (not the full page): the point is what the quilter sees without scrolling. */
async function viewShot(page: Page, name: string): Promise<void> {
  const dir = path.join(testEnv.outputDir, 'screenshots');
  mkdirSync(dir, { recursive: true });
  await page.screenshot({ path: path.join(dir, `${name}.png`) });
}

/** Records every text the step card's counter shows from now on. */
async function recordCounter(page: Page): Promise<void> {
  await page.evaluate(() => {
    const el = document.querySelector('[data-testid="step-counter"]')!;
    const seen: string[] = [el.textContent ?? ''];
    (window as unknown as { seenCounters: string[] }).seenCounters = seen;
    new MutationObserver(() => seen.push(el.textContent ?? '')).observe(el, { childList: true, characterData: true, subtree: true });
  });
}
const seenCounters = (page: Page) => page.evaluate(() => (window as unknown as { seenCounters: string[] }).seenCounters);

describe('replay', () => {
  it('plays step 1 and stops at its end; Play after that plays step 2 and stops at its end', async () => {
    const { page } = browser;
    await page.goto(`/walkthrough/${templateId}`);
    await page.getByTestId('walkthrough').waitFor();
    expect(stepOf(await counter(page))).toBe(1);
    const firstText = await page.getByTestId('step-instruction').textContent();
    await expect(page.getByLabel('Pause after each step').isChecked()).resolves.toBe(true);
    await recordCounter(page);

    await page.getByRole('button', { name: '▶ Play step' }).click();
    await page.getByRole('button', { name: '❚❚ Pause' }).waitFor();
    await page.getByRole('button', { name: '▶ Play next step' }).waitFor({ timeout: 15_000 });
    expect(stepOf(await counter(page))).toBe(1);
    expect(await page.getByTestId('step-instruction').textContent()).toBe(firstText);
    expect(new Set(await seenCounters(page))).toEqual(new Set([await counter(page)]));
    await viewShot(page, 'replay-01-step1-played');

    // Faster: 3000 stitches per minute at 4× (the step takes seconds, not its real minute).
    await page.getByLabel('Stitches per minute').fill('3000');
    await page.getByRole('radio', { name: '4×' }).click();
    await page.getByRole('button', { name: '▶ Play next step' }).click();
    expect(stepOf(await counter(page))).toBe(2);
    await recordCounter(page);
    await page.getByRole('button', { name: '▶ Play next step' }).waitFor({ timeout: 30_000 });
    expect(stepOf(await counter(page))).toBe(2);
    expect(new Set((await seenCounters(page)).map(stepOf))).toEqual(new Set([2]));
    expect(await page.getByTestId('controls-step').textContent()).toMatch(/^Step 2 of \d+ · done/);

    // Jump to a step's end: the needle goes there and the card stays.
    await page.getByRole('button', { name: 'Next ▶' }).click();
    expect(stepOf(await counter(page))).toBe(3);
    await page.getByRole('button', { name: '» Step end' }).click();
    await page.getByRole('button', { name: '▶ Play next step' }).waitFor();
    expect(stepOf(await counter(page))).toBe(3);
  });

  it('draws no two canvas labels over each other', async () => {
    const { page } = browser;
    await page.goto(`/walkthrough/${templateId}`);
    await page.getByTestId('walkthrough').waitFor();
    await page.waitForFunction(() => {
      const k = (window as unknown as { Konva?: { stages: { find(f: (n: { name(): string }) => boolean): unknown[] }[] } }).Konva;
      return !!k && k.stages.length > 0 && k.stages[0]!.find((n) => n.name().startsWith('label-')).length > 0;
    });
    const boxes = await page.evaluate(() => {
      type Node = { name(): string; getClientRect(): { x: number; y: number; width: number; height: number } };
      const k = (window as unknown as { Konva: { stages: { find(f: (n: Node) => boolean): Node[] }[] } }).Konva;
      return k.stages[0]!.find((n) => n.name().startsWith('label-')).map((n) => ({ name: n.name(), ...n.getClientRect() }));
    });
    expect(boxes.map((b) => b.name)).toContain('label-mark'); // "Start here"
    expect(boxes.map((b) => b.name)).toContain('label-pass-1');
    for (let i = 0; i < boxes.length; i++) {
      for (let j = i + 1; j < boxes.length; j++) {
        const [a, b] = [boxes[i]!, boxes[j]!];
        const overlap = a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;
        expect(overlap, `${a.name} and ${b.name}`).toBe(false);
      }
    }
  });

  for (const [name, width, height] of [['desktop', 1440, 900], ['tablet', 820, 1180], ['phone', 390, 844]] as const) {
    it(`keeps the controls and the block in view on a ${name} (${width} × ${height})`, async () => {
      const { page } = browser;
      await page.setViewportSize({ width, height });
      await page.goto(`/walkthrough/${templateId}`);
      await page.getByTestId('walkthrough').waitFor();
      const inView = async () => {
        const bar = (await page.getByTestId('walkthrough-controls').boundingBox())!;
        for (const label of ['◀ Previous', '▶ Play step', 'Next ▶']) {
          const b = (await page.getByRole('button', { name: label }).boundingBox())!;
          expect(b.y, label).toBeGreaterThanOrEqual(0);
          expect(b.y + b.height, label).toBeLessThanOrEqual(height);
          expect(b.x + b.width, label).toBeLessThanOrEqual(width);
        }
        return bar;
      };
      await inView();
      // Nothing wider than the screen.
      expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(width);
      await viewShot(page, `replay-${name}-open`);

      // Read to the end of the step's tips and settings: the controls stay, and on desktop the block too.
      await page.getByRole('button', { name: 'Next ▶' }).click();
      await page.evaluate(() => window.scrollBy(0, 600));
      const bar = await inView();
      const canvas = (await page.getByTestId('walkthrough-canvas').boundingBox())!;
      if (name === 'desktop') {
        expect(canvas.y).toBeGreaterThanOrEqual(0);
        expect(canvas.y + canvas.height).toBeLessThanOrEqual(bar.y + 1);
      }
      // The bar's step number and the card's agree.
      expect(stepOf(await page.getByTestId('controls-step').textContent())).toBe(stepOf(await counter(page)));
      expect(stepOf(await counter(page))).toBe(2);
      await viewShot(page, `replay-${name}-scrolled`);
    });
  }
});
