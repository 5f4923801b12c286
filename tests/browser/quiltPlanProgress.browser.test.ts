// Issue 15 item 2: a whole quilt planned by the planning worker, with a progress bar on the quilt page. A 3 × 4 quilt
// of 12 distinct filled blocks (shared/testing/filledBlocks.ts: pieced layouts, seams in the ditch, two motif fills
// each) nothing has planned before, so the page gets a job and polls it: the bar (role progressbar) must show
// corner-pair plans done out of the total, never more than the total, and give way to the plan, one step per block.
// Screenshots of the bar at the three widths, nothing wider than the viewport.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, screenshot, waitForIslands, type TestBrowser } from '../helpers/browser.ts';
import { createAccount, type TestAccount } from '../helpers/accounts.ts';
import { closeTestDb } from '../helpers/db.ts';
import { testEnv } from '../helpers/env.ts';
import { elementsWiderThanViewport, WIDTHS } from '../helpers/layout.ts';
import { filledBlockDesigns } from '../../shared/testing/filledBlocks.ts';

let browser: TestBrowser;
let quilter: TestAccount;
let quiltId: string;
beforeAll(async () => {
  quilter = await createAccount({ displayName: 'Sampler maker' });
  const ids: string[] = [];
  for (const b of filledBlockDesigns(12, 3)) {
    const res = await quilter.client.post('/api/designs', b);
    expect(res.status, res.text).toBe(201);
    ids.push(res.body.design.id);
  }
  const placements = [0, 1, 2].map((r) => [0, 1, 2, 3].map((c) => ({ designId: ids[r * 4 + c]!, rotation: ((r + c) % 4) * 90, mirror: r === 1 })));
  const quilt = await quilter.client.post('/api/quilts', { title: 'Sampler in twelve', quilt: { version: 1, units: 'in', rows: 3, columns: 4, block: { width: 12, height: 12 }, sashing: 1, placements } });
  expect(quilt.status, quilt.text).toBe(201);
  quiltId = quilt.body.quilt.id;
  browser = await launchBrowser(WIDTHS[0]);
  await browser.context.addCookies([{ name: 'tw_session', value: quilter.client.sessionToken!, url: testEnv.appUrl }]);
});
afterAll(async () => {
  await browser?.close();
  await closeTestDb();
});

describe('planning a whole quilt on its page', () => {
  it('shows the planning worker’s progress as a progress bar, then the plan', async () => {
    const page = browser.page;
    await page.goto(`/quilts/${quiltId}`);
    await waitForIslands(page);
    await page.getByRole('button', { name: 'Plan the route across the quilt' }).click();
    const bar = page.getByRole('progressbar');
    await bar.waitFor({ timeout: 30_000 });
    // Read the bar while the worker plans: 12 designs × 10 corner pairs at least, done never past the total.
    const readings: { now: number; max: number; text: string }[] = [];
    let shot = false;
    for (let i = 0; i < 200 && (await bar.count()) > 0; i++) {
      const [now, max, text] = await Promise.all([bar.getAttribute('aria-valuenow'), bar.getAttribute('aria-valuemax'), bar.getAttribute('aria-valuetext')]).catch(() => [null, null, null]);
      if (now === null || max === null || text === null) break;
      readings.push({ now: Number(now), max: Number(max), text });
      // Screenshots once the bar has moved (or after a few readings, on a machine quick enough to skip the middle).
      if (!shot && (Number(now) > 0 || readings.length === 10)) {
        shot = true;
        for (const size of WIDTHS) {
          await page.setViewportSize(size);
          await bar.scrollIntoViewIfNeeded();
          expect(await elementsWiderThanViewport(page), `${size.name}: wider than the viewport`).toEqual([]);
          await screenshot(page, `quilt-plan-progress-${size.name}`);
        }
        await page.setViewportSize(WIDTHS[0]);
      }
      await page.waitForTimeout(150);
    }
    expect(readings.length).toBeGreaterThan(0);
    expect(readings.every((r) => r.now >= 0 && r.now <= r.max)).toBe(true);
    const counted = readings.filter((r) => /^\d+ of \d+ corner pairs planned$/.test(r.text));
    expect(counted.length, JSON.stringify(readings.slice(0, 5))).toBeGreaterThan(0);
    expect(Math.max(...counted.map((r) => r.max))).toBeGreaterThanOrEqual(120);

    const route = page.getByTestId('quilt-route');
    await route.waitFor({ timeout: 120_000 });
    expect(await page.getByRole('progressbar').count()).toBe(0);
    expect(await route.locator('li').count()).toBe(12);
  });
});
