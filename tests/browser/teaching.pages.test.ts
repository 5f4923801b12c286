// The teaching pages in headless chromium: the teacher's class page (lessons, invitations, join code, roster),
// the gallery and a template page, a student following an invitation e-mail link, joining, opening the released
// lesson (walkthrough mount point with the lesson's route data) and uploading a photo. Screenshots saved under
// test-output/screenshots/teaching-*.png. (The walkthrough replay itself is tested with its island.)
import sharp from 'sharp';
import { mkdtempSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, screenshot, type TestBrowser } from '../helpers/browser.ts';
import { closeTestDb } from '../helpers/db.ts';
import { testEnv } from '../helpers/env.ts';
import { createAccount, type TestAccount } from '../helpers/accounts.ts';
import { linksIn, waitForMail } from '../helpers/mail.ts';
import { buildWorld, type World } from '../api/teachingWorld.ts';

let w: World;
let browser: TestBrowser;
async function signInAs(account: TestAccount) {
  await browser.context.clearCookies();
  await browser.context.addCookies([{ name: 'tw_session', value: account.client.sessionToken!, url: testEnv.appUrl }]);
}

beforeAll(async () => {
  w = await buildWorld();
  await w.teacher.client.patch(`/api/classes/${w.classId}`, { description: 'One block a month, each quilted along a route in one or two passes.' });
  browser = await launchBrowser({ width: 1280, height: 900 });
});
afterAll(async () => {
  await browser?.close();
  await closeTestDb();
});

describe('teaching pages', () => {
  it('the teacher sees lessons, the join code and the roster', async () => {
    await signInAs(w.teacher);
    const page = browser.page;
    await page.goto(`/classes/${w.classId}`);
    expect(await page.textContent('h1')).toBe('Tuesday quilt-along');
    expect(await page.textContent('[data-join-code]')).toMatch(/^[A-Z2-9]{8}$/);
    expect(await page.locator('table tbody tr').count()).toBe(1);
    await screenshot(page, 'teaching-class-teacher');
    await page.goto('/templates');
    await screenshot(page, 'teaching-templates-gallery');
    await page.goto(`/templates/${w.templateId}`);
    expect(await page.locator('svg').count()).toBeGreaterThan(0);
    await screenshot(page, 'teaching-template-page');
  });

  it('a student follows the e-mailed invitation, joins, opens the lesson and uploads a photo', async () => {
    const student = await createAccount({ displayName: 'Ines Brookfield' });
    await w.teacher.client.post(`/api/classes/${w.classId}/invitations`, { emails: [student.email] });
    const mail = await waitForMail(student.email, { subject: 'invites you' });
    const link = linksIn(mail.text).find((l) => l.includes('/invitations/'))!;
    await signInAs(student);
    const page = browser.page;
    await page.setViewportSize({ width: 820, height: 1180 }); // a tablet beside the machine
    await page.goto(new URL(link).pathname);
    await screenshot(page, 'teaching-invitation');
    await page.getByRole('button', { name: 'Join the class' }).click();
    await page.waitForURL(`**/classes/${w.classId}`);
    await screenshot(page, 'teaching-class-student');
    await page.getByRole('link', { name: 'Open lesson' }).first().click();
    await page.waitForURL(`**/lessons/${w.releasedLessonId}`);
    const data = JSON.parse((await page.textContent('#walkthrough-data'))!);
    expect(data.template.route[0].points).toEqual([[0, 3], [12, 3]]);
    expect(await page.getAttribute('#walkthrough-root', 'data-progress-url')).toBe(`/api/lessons/${w.releasedLessonId}/progress`);

    const dir = mkdtempSync(path.join(os.tmpdir(), 'teaching-photo-'));
    const file = path.join(dir, 'block-front.jpg');
    writeFileSync(file, await sharp({ create: { width: 900, height: 900, channels: 3, background: '#6f8f72' } }).jpeg().toBuffer());
    await page.setInputFiles('input[type=file][data-raw]', file);
    await page.getByRole('button', { name: 'Upload photo' }).click();
    await page.waitForSelector('img[alt$="front"]');
    await screenshot(page, 'teaching-lesson-student');

    await signInAs(w.teacher);
    await page.setViewportSize({ width: 1280, height: 900 });
    await page.goto(`/classes/${w.classId}`);
    expect(await page.locator('table tbody tr').count()).toBe(2);
    expect(await page.locator(`img[alt^="Ines Brookfield"]`).count()).toBe(1);
    await screenshot(page, 'teaching-class-teacher-after');
  });

  it('a newcomer signs up on the way from the invitation link and lands in the class', async () => {
    const email = `newcomer-${Date.now()}@guild.test`;
    await w.teacher.client.post(`/api/classes/${w.classId}/invitations`, { emails: [email] });
    const link = linksIn((await waitForMail(email, { subject: 'invites you' })).text).find((l) => l.includes('/invitations/'))!;
    await browser.context.clearCookies();
    const page = browser.page;
    await page.goto(new URL(link).pathname);
    expect(await page.inputValue('input[name=email]')).toBe(email);
    await page.fill('input[name=displayName]', 'Newcomer Quilter');
    await page.fill('input[name=password]', 'heron-bend-newcomer-1');
    await screenshot(page, 'teaching-invitation-signup');
    await page.getByRole('button', { name: 'Create account and join' }).click();
    await page.waitForURL(`**/classes/${w.classId}`);
    expect(await page.textContent('h1')).toBe('Tuesday quilt-along');
  });
});
