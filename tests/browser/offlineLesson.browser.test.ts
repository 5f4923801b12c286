// A lesson's walkthrough at the sewing machine without a connection (issue 14 item 10), in headless chromium: once
// opened, the lesson is kept by the service worker (public/lesson-sw.js); the browser goes offline mid-lesson, the
// student moves on, reloads (the page comes from the worker's copy), moves on again; back online, the device's
// queue is sent and the server's progress matches the step on screen. Screenshots: offline-lesson-*.png.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Route } from 'playwright-core';
import { createAccount, type TestAccount } from '../helpers/accounts.ts';
import { launchBrowser, screenshot, type TestBrowser } from '../helpers/browser.ts';
import { closeTestDb } from '../helpers/db.ts';
import { publishRibbonCandyTemplate } from './walkthroughFixtures.ts';

// Chromium's offline emulation does not reach a service worker's own fetches; with this switch Playwright reports
// them as requests of the worker, which the test then refuses as a disconnected network would
// (microsoft/playwright issue 2311).
process.env['PW_EXPERIMENTAL_SERVICE_WORKER_NETWORK_EVENTS'] = '1';

let browser: TestBrowser;
let student: TestAccount;
let lessonUrl: string;
let lessonId: string;

beforeAll(async () => {
  const teacher = await createAccount({ role: 'teacher', displayName: 'Hester Quayle' });
  student = await createAccount({ displayName: 'Bryony Tull' });
  const { versionId } = await publishRibbonCandyTemplate(teacher, 'class', 'Offline lesson block');
  const cls = await teacher.client.post('/api/classes', { title: 'Offline sewing class', description: 'At the machine', startsOn: '2027-01-05' });
  const lesson = await teacher.client.post(`/api/classes/${cls.body.class.id}/lessons`, {
    title: 'Lesson 1: away from the router', releaseAt: new Date(Date.now() - 3_600_000).toISOString(), notes: 'Press the block first.', templateVersionId: versionId,
    confirmed: true, // released an hour ago, before the class's start date: the teacher says yes to both questions
  });
  expect(lesson.status).toBe(201);
  expect((await student.client.post('/api/classes/join', { code: cls.body.class.joinCode })).status).toBe(200);
  lessonId = lesson.body.lesson.id;
  lessonUrl = `/classes/${cls.body.class.id}/lessons/${lessonId}`;
  browser = await launchBrowser({ width: 820, height: 1180 });
});
afterAll(async () => {
  await browser?.close();
  await closeTestDb();
});

const refuseWorkerNetwork = (route: Route) => (route.request().serviceWorker() ? route.abort('internetdisconnected') : route.continue());
const serverProgress = async () => (await student.client.get(`/api/lessons/${lessonId}/progress`)).body as { stepIndex: number; totalSteps: number };

describe('offline lesson', () => {
  it('keeps working offline and sends the place when back online, no step lost', async () => {
    const { page, context } = browser;
    await page.goto(`/sign-in?next=${encodeURIComponent(lessonUrl)}`);
    await page.getByLabel('E-mail').fill(student.email);
    await page.getByLabel('Password').fill(student.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL(`**${lessonUrl}`);
    await page.getByTestId('walkthrough').waitFor();
    await page.locator('[data-testid="offline-ready"][data-state="ready"]').waitFor({ timeout: 30_000 });
    await page.locator('[data-testid="save-state"][data-state="saved"]').waitFor();
    const counter = page.getByTestId('step-counter');
    expect(await counter.textContent()).toMatch(/^Step 1 of /);

    // Offline mid-lesson: the page says so and keeps the place on the device.
    await context.setOffline(true);
    await context.route('**', refuseWorkerNetwork);
    await page.getByTestId('offline-banner').waitFor();
    for (let i = 0; i < 4; i++) await page.getByRole('button', { name: 'Next ▶' }).click();
    expect(await counter.textContent()).toMatch(/^Step 5 of /);
    await page.locator('[data-testid="save-state"][data-state="kept"]').waitFor();
    expect((await serverProgress()).stepIndex).toBe(0);
    await screenshot(page, 'offline-lesson-01-offline');

    // A reload without a connection: the worker's copy of the page, resumed at the device's place.
    const reloaded = await page.reload();
    expect(reloaded?.headers()['x-threadway-offline-copy']).toBe('1');
    await page.getByTestId('walkthrough').waitFor();
    expect(await counter.textContent()).toMatch(/^Step 5 of /);
    await page.getByTestId('offline-banner').waitFor();
    await page.getByRole('button', { name: 'Next ▶' }).click();
    expect(await counter.textContent()).toMatch(/^Step 6 of /);
    await screenshot(page, 'offline-lesson-02-reloaded-offline');

    // Back online: the queue goes out; the server holds step 6 (index 5) and nothing is left on the device.
    const sent = page.waitForResponse((r) => r.url().endsWith(`/api/lessons/${lessonId}/progress`) && r.request().method() === 'PUT' && r.status() === 200);
    await context.unroute('**', refuseWorkerNetwork);
    await context.setOffline(false);
    await sent;
    await page.locator('[data-testid="save-state"][data-state="saved"]').waitFor();
    expect(await page.getByTestId('offline-banner').count()).toBe(0);
    const held = await serverProgress();
    expect(held.stepIndex).toBe(5);
    expect(await page.locator('[data-progress]').textContent()).toBe(`You are on step 6 of ${held.totalSteps}.`);
    // Nothing left to send; the device remembers step 6 as taken.
    const kept = await page.evaluate(() => JSON.parse(localStorage.getItem('threadway.progressQueue') ?? 'null'));
    expect(kept.entries).toEqual([expect.objectContaining({ lessonId, stepIndex: 5, pending: false })]);
    await screenshot(page, 'offline-lesson-03-back-online');

    // Offline again: the worker's copy of the page still embeds step 1 (kept when the lesson was first opened); the
    // device's own place wins, so the student is not sent back, and the server is not moved back on return.
    await context.setOffline(true);
    await context.route('**', refuseWorkerNetwork);
    await page.reload();
    await page.getByTestId('walkthrough').waitFor();
    expect(await counter.textContent()).toMatch(/^Step 6 of /);
    await context.unroute('**', refuseWorkerNetwork);
    await context.setOffline(false);
    await page.locator('[data-testid="save-state"][data-state="saved"]').waitFor();
    expect((await serverProgress()).stepIndex).toBe(5);
  });
});
