// Issue 14's layout check for the workbench at desktop, tablet and phone widths: nothing wider than the viewport,
// the tools, the canvas and the route check all reachable, the legend under the block; the keys overlay opens over
// the canvas without moving it and Esc closes it. Screenshots in test-output/screenshots.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, screenshot, type TestBrowser, signInDemoBrowser } from '../helpers/browser.ts';
import { elementsWiderThanViewport, WIDTHS } from '../helpers/layout.ts';

let browser: TestBrowser;
beforeAll(async () => {
  browser = await launchBrowser(WIDTHS[0]);
  await signInDemoBrowser(browser.context, 'Saoirse Lindqvist');
});
afterAll(async () => {
  await browser?.close();
});

describe('the workbench at three widths', () => {
  it('fits every width, shows the legend, and the keys overlay closes with Esc', async () => {
    const page = browser.page;
    await page.goto('/designs');
    const link = page.getByRole('link', { name: 'Millpond pebbles' });
    await link.waitFor();
    const href = (await link.getAttribute('href'))!;
    for (const size of WIDTHS) {
      await page.setViewportSize(size);
      await page.goto(href);
      await page.locator('section[aria-label="Route check"] [data-figure="stitch-length"]').first().waitFor({ timeout: 30_000 });
      expect(await elementsWiderThanViewport(page), `${size.name}: wider than the viewport`).toEqual([]);
      const legend = page.getByTestId('line-legend');
      expect(await legend.locator('[data-legend=seam]').count(), size.name).toBe(1);
      expect(await page.title()).toBe('Millpond pebbles · Workbench · Threadway');
      await screenshot(page, `workbench-width-${size.name}`);
    }
    await page.setViewportSize(WIDTHS[0]);
    const canvasBox = await page.getByTestId('block-canvas').boundingBox();
    await page.getByRole('button', { name: 'Keys' }).click();
    const dialog = page.getByRole('dialog', { name: 'Keyboard shortcuts' });
    await dialog.waitFor();
    expect(await page.getByTestId('block-canvas').boundingBox()).toEqual(canvasBox); // an overlay: the canvas stays put
    await screenshot(page, 'workbench-keys-overlay');
    await page.keyboard.press('Escape');
    await dialog.waitFor({ state: 'detached' });
  });
});
