// Issue 14, item 8: the designs list fits every width — a table from tablet width up, cards on phones with a sort
// menu — and nothing is wider than the viewport. Screenshots in test-output/screenshots.
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

describe('the designs list', () => {
  it('is a table on desktop and tablet, cards on a phone, never wider than the viewport', async () => {
    const page = browser.page;
    for (const size of WIDTHS) {
      await page.setViewportSize(size);
      await page.goto('/designs');
      await page.getByRole('link', { name: 'Millpond pebbles' }).waitFor();
      const tableShown = await page.locator('table').isVisible();
      const cardsShown = await page.locator('[data-designs-cards]').isVisible();
      expect([tableShown, cardsShown], size.name).toEqual(size.name === 'phone' ? [false, true] : [true, false]);
      // Saoirse measures in centimetres: the card and the row both say the block's size in cm.
      expect(await page.locator(size.name === 'phone' ? '[data-designs-cards]' : 'table').innerText()).toContain('30 × 30 cm');
      await expect.poll(() => page.getByRole('button', { name: 'Delete Millpond pebbles' }).isVisible()).toBe(true);
      expect(await elementsWiderThanViewport(page), `${size.name}: wider than the viewport`).toEqual([]);
      await screenshot(page, `designs-list-${size.name}`);
    }
  });
});
