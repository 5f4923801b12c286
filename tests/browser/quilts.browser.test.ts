// Issue 15: a quilter makes a 2 × 2 quilt on /quilts, places one of their designs (the demo guild's drawings, built the
// way the seed builds them) in the top-left cell, turns it a quarter, saves, reloads and finds it kept. The quilt
// page (with the route planned across the quilt) and the list at the three widths, nothing wider than the viewport. Screenshots in test-output/screenshots.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, screenshot, waitForIslands, type TestBrowser } from '../helpers/browser.ts';
import { createAccount, type TestAccount } from '../helpers/accounts.ts';
import { closeTestDb } from '../helpers/db.ts';
import { testEnv } from '../helpers/env.ts';
import { elementsWiderThanViewport, WIDTHS } from '../helpers/layout.ts';
import { tobiasDrawings } from '../../scripts/seed/guildDrawings.ts';

let browser: TestBrowser;
let quilter: TestAccount;
beforeAll(async () => {
  quilter = await createAccount({ displayName: 'Quilt maker' });
  for (const d of tobiasDrawings()) {
    const res = await quilter.client.post('/api/designs', { title: d.title, notes: d.notes, design: d.design });
    expect(res.status, res.text).toBe(201);
  }
  browser = await launchBrowser(WIDTHS[0]);
  await browser.context.addCookies([{ name: 'tw_session', value: quilter.client.sessionToken!, url: testEnv.appUrl }]);
});
afterAll(async () => {
  await browser?.close();
  await closeTestDb();
});

describe('a quilt map', () => {
  it('is made 2 × 2, gets a turned block, and keeps it after a reload', async () => {
    const page = browser.page;
    await page.goto('/quilts');
    await waitForIslands(page);
    await page.getByRole('link', { name: 'Quilts', exact: true }).waitFor();
    await page.getByLabel('Title').fill('Heron Bend sampler');
    await page.getByLabel('Rows').fill('2');
    await page.getByLabel('Columns').fill('2');
    await page.getByLabel('Block (in)').fill('12');
    await page.getByRole('button', { name: 'New quilt' }).click();
    await page.waitForURL(/\/quilts\/[0-9a-f-]{36}$/);

    // 2 × 12 in blocks, no sashing or border yet: 24 × 24 in.
    await expect.poll(() => page.getByTestId('finished-size').textContent()).toBe('24 × 24 in');
    await page.getByRole('button', { name: 'Row 1, column 1: empty' }).click();
    await page.getByLabel('Design', { exact: true }).selectOption({ label: 'Heron Bend nine-patch' });
    await page.getByRole('button', { name: 'Turn a quarter' }).click();
    await page.getByLabel('Sashing (in)').fill('2');
    await page.getByRole('button', { name: 'Add a border' }).click();
    await page.getByLabel('Border 1 (in)').fill('3');
    // 2·12 + 2 + 2·3 = 32 in.
    await expect.poll(() => page.getByTestId('finished-size').textContent()).toBe('32 × 32 in');
    await page.getByRole('button', { name: 'Save quilt' }).click();
    await page.getByText('Saved, version 2').waitFor();

    await page.reload();
    const cell = page.getByRole('button', { name: 'Row 1, column 1: Heron Bend nine-patch, turned 90°' });
    await cell.waitFor();
    expect(await cell.locator('img').getAttribute('data-rotation')).toBe('90');
    expect(await page.getByTestId('finished-size').textContent()).toBe('32 × 32 in');

    // The trim plan on the map: one mark per row of the trim table; in a 2 × 2 quilt every block is a corner block,
    // its top and left sides facing the border (solid rule), its right and bottom a joining seam (dashed).
    await page.getByLabel(/Show the quilt-as-you-go trim on the map/).check();
    const marks = page.getByTestId('trim-overlay').locator('[data-trim-cell]');
    await expect.poll(() => marks.count()).toBe(await page.getByRole('region', { name: /Trim plan table/ }).locator('tbody tr').count());
    const first = page.locator('[data-trim-cell="0-0"]');
    expect(await first.getAttribute('data-position')).toBe('corner');
    // Drawn above the blocks (the picked block included), not hidden under them: the topmost element at the
    // position label's centre belongs to the trim layer.
    // (The layer lets clicks through to the blocks, so hit testing skips it: it is made hittable for this look.)
    const onTop = await first.getByText('corner block').evaluate((label) => {
      const layer = label.closest<HTMLElement>('[data-testid="trim-overlay"]')!;
      layer.style.pointerEvents = 'auto';
      const r = label.getBoundingClientRect();
      const hit = label.ownerDocument.elementFromPoint(r.x + r.width / 2, r.y + r.height / 2);
      layer.style.pointerEvents = '';
      return hit !== null && layer.contains(hit);
    });
    expect(onTop, 'the trim marks are drawn on top of the map').toBe(true);
    expect(await first.locator('[data-faces]').evaluateAll((els) => els.map((e) => e.getAttribute('data-faces')))).toEqual(['outer', 'inner', 'inner', 'outer']);
    for (const size of WIDTHS) {
      await page.setViewportSize(size);
      expect(await elementsWiderThanViewport(page), `${size.name}: wider than the viewport`).toEqual([]);
      await screenshot(page, `quilt-trim-map-${size.name}`);
    }
    await page.setViewportSize(WIDTHS[0]);
    await page.getByLabel(/Show the quilt-as-you-go trim on the map/).uncheck();

    // The route across the saved quilt, planned by the planning worker: one block placed, so one step.
    await page.getByRole('button', { name: 'Plan the route across the quilt' }).click();
    const route = page.getByTestId('quilt-route');
    await route.waitFor({ timeout: 30_000 });
    expect(await route.locator('li').allTextContents()).toEqual([expect.stringMatching(/^Row 1, column 1: start at the (top|bottom) (left|right) corner, end at the (top|bottom) (left|right)\.$/)]);

    for (const size of WIDTHS) {
      await page.setViewportSize(size);
      await page.getByTestId('finished-size').waitFor();
      expect(await elementsWiderThanViewport(page), `${size.name}: wider than the viewport`).toEqual([]);
      await screenshot(page, `quilt-map-${size.name}`);
    }
  });

  it('shows the plain message and the saved copy when another tab saved first', async () => {
    const page = browser.page;
    await page.setViewportSize(WIDTHS[0]);
    await page.goto('/quilts');
    await page.getByRole('link', { name: 'Heron Bend sampler' }).click();
    await page.getByTestId('finished-size').waitFor();
    const id = page.url().split('/').pop()!;
    // Another tab saves first: the border goes to 4 in (version 3).
    const now = await quilter.client.get(`/api/quilts/${id}`);
    const other = await quilter.client.put(`/api/quilts/${id}`, { baseVersion: now.body.quilt.version, quilt: { ...now.body.quilt.quilt, borders: [4] } });
    expect(other.status).toBe(200);
    await page.getByRole('button', { name: 'Row 2, column 2: empty' }).click();
    await page.getByLabel('Design', { exact: true }).selectOption({ label: 'Ferry landing four-patch' });
    await page.getByRole('button', { name: 'Save quilt' }).click();
    await page.getByText('This quilt was saved in another tab or window').waitFor();
    // The saved copy is shown: 2·12 + 2 + 2·4 = 34 in, bottom-right still empty.
    expect(await page.getByTestId('finished-size').textContent()).toBe('34 × 34 in');
    await page.getByRole('button', { name: 'Row 2, column 2: empty' }).waitFor();

    for (const size of WIDTHS) {
      await page.setViewportSize(size);
      await page.goto('/quilts');
      await page.getByRole('link', { name: 'Heron Bend sampler' }).waitFor();
      expect(await elementsWiderThanViewport(page), `${size.name}: wider than the viewport`).toEqual([]);
      await screenshot(page, `quilts-list-${size.name}`);
    }
  });
});
