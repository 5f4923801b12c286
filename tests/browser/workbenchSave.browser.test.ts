// The workbench's save path end to end (shared/editor/saveMachine.ts wired by useDesignDocument): with the network
// refusing the save, the edit stays in localStorage and the indicator says it will try again; once the network is
// back, "Try now" saves it and the draft goes. Then another tab saves in between: the next save answers 409, the
// indicator offers both copies, and "Keep mine" sends mine over theirs as the next version.
import type { Page, Route } from 'playwright-core';
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

const saveStatus = (page: Page, kind: string) => page.locator(`[data-save-status="${kind}"]`).waitFor({ timeout: 20_000 });

async function retitle(page: Page, title: string): Promise<void> {
  const input = page.getByLabel('Design title');
  await input.fill(title);
}

describe('workbench saves', () => {
  it('keeps an edit on the device while saves fail, sends it once the network is back, and asks on a 409', async () => {
    const quilter = await createAccount();
    const design = { version: 1, units: 'in', width: 12, height: 12, seams: [], edgeTravel: true, lines: [[[2, 2], [10, 2]]] };
    const created = await quilter.client.post<{ design: { id: string } }>('/api/designs', { title: 'Saves under weather', design });
    expect(created.status, created.text).toBe(201);
    const id = created.body.design.id;
    const { page, context } = browser;
    await context.addCookies([{ name: 'tw_session', value: quilter.client.sessionToken!, url: testEnv.appUrl }]);
    await page.goto(`/designs/${id}`);
    await waitForIslands(page);
    await saveStatus(page, 'saved');

    // No network for saves: the request fails before reaching the server.
    const isSave = (url: URL) => url.pathname === `/api/designs/${id}`;
    const refuse = (route: Route) => (route.request().method() === 'PUT' ? route.abort('internetdisconnected') : route.continue());
    await page.route(isSave, refuse);
    await retitle(page, 'Saved after the storm');
    await saveStatus(page, 'retrying');
    expect(await page.getByRole('status').filter({ hasText: 'Kept on this device' }).count()).toBe(1);
    const draft = await page.evaluate((key) => window.localStorage.getItem(key), `threadway:draft:${id}`);
    expect(JSON.parse(draft ?? '{}')).toMatchObject({ baseVersion: 1, title: 'Saved after the storm' });
    await screenshot(page, 'workbench-save-retrying');

    await page.unroute(isSave, refuse);
    await page.getByRole('button', { name: 'Try now' }).click();
    await saveStatus(page, 'saved');
    expect(await page.evaluate((key) => window.localStorage.getItem(key), `threadway:draft:${id}`)).toBeNull();
    const afterRetry = await quilter.client.get<{ design: { title: string; version: number } }>(`/api/designs/${id}`);
    expect(afterRetry.body.design).toMatchObject({ title: 'Saved after the storm', version: 2 });

    // Another tab saves version 3; this page still builds on version 2.
    const other = await quilter.client.put(`/api/designs/${id}`, { baseVersion: 2, title: 'From the other tab' });
    expect(other.status, other.text).toBe(200);
    await retitle(page, 'Mine, on purpose');
    await saveStatus(page, 'conflict');
    await screenshot(page, 'workbench-save-conflict');
    await page.getByRole('button', { name: 'Keep mine' }).click();
    await saveStatus(page, 'saved');
    const kept = await quilter.client.get<{ design: { title: string; version: number } }>(`/api/designs/${id}`);
    expect(kept.body.design).toMatchObject({ title: 'Mine, on purpose', version: 4 });
  });
});
