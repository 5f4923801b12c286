// The join helper in the workbench (issue 12 item 2): two straight-line fills 3 in apart in a block with no seams
// and edge travel off are two line groups (2 passes, 1 stop). The helper proposes the 3 in join (the distance
// between two parallel lines 3 in apart: analytic), adding it takes the stops to 0, and one undo brings them back.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createAccount } from '../helpers/accounts.ts';
import { launchBrowser, screenshot, waitForIslands, type TestBrowser } from '../helpers/browser.ts';
import { closeTestDb } from '../helpers/db.ts';
import { testEnv } from '../helpers/env.ts';

let browser: TestBrowser;
beforeAll(async () => {
  browser = await launchBrowser({ width: 1440, height: 960 });
});
afterAll(async () => {
  await browser?.close();
  await closeTestDb();
});

const stopsFigure = 'section[aria-label="Route check"] [data-figure="stops"]';

describe('join helper', () => {
  it('proposes the shortest join between two line groups, adds it as one command, and the stops fall', async () => {
    const quilter = await createAccount();
    const design = {
      version: 1, units: 'in', width: 12, height: 12, seams: [], edgeTravel: false,
      lines: [[[2, 2], [2, 10]], [[5, 2], [5, 10]]],
    };
    const created = await quilter.client.post<{ design: { id: string } }>('/api/designs', { title: 'Two separate fills', design });
    expect(created.status, created.text).toBe(201);
    const { page, context } = browser;
    await context.addCookies([{ name: 'tw_session', value: quilter.client.sessionToken!, url: testEnv.appUrl }]);
    await page.goto(`/designs/${created.body.design.id}`);
    await waitForIslands(page);
    await page.waitForFunction((sel) => document.querySelector(sel)?.textContent?.trim() === '1', stopsFigure, { timeout: 30_000 });

    const panel = page.locator('section[aria-label="Join line groups"]');
    await panel.waitFor();
    const first = panel.locator('li').first();
    expect(await first.textContent()).toContain('3 in of new quilting line');
    expect(await first.locator('[data-figure="join-saves"]').textContent()).toBe('Saves 1 stop.');
    await first.getByRole('button', { name: 'Show' }).click();
    await screenshot(page, 'join-helper-shown');
    await first.getByRole('button', { name: 'Add join' }).click();
    await page.waitForFunction((sel) => document.querySelector(sel)?.textContent?.trim() === '0', stopsFigure, { timeout: 30_000 });
    expect(await panel.count()).toBe(0);
    await screenshot(page, 'join-helper-joined');

    await page.getByRole('button', { name: 'Undo' }).click();
    await page.waitForFunction((sel) => document.querySelector(sel)?.textContent?.trim() === '1', stopsFigure, { timeout: 30_000 });
  });
});
