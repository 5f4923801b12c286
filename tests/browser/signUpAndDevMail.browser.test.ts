// The screens issue 10 changed, at 1440×900, 820×1180 and 390×844: sign-up's "check your inbox" answer, the
// page the e-mailed link opens, the invitation page's sign-up (for the invited address only), and the
// captured-mail page with its "local fake" banner (admins only).
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEFAULT_PASSWORD, createAccount, uniqueEmail } from '../helpers/accounts.ts';
import { launchBrowser, screenshot, waitForIslands, type TestBrowser } from '../helpers/browser.ts';
import { closeTestDb } from '../helpers/db.ts';
import { testEnv } from '../helpers/env.ts';
import { linksIn, waitForMail } from '../helpers/mail.ts';
import { buildWorld } from '../api/teachingWorld.ts';

const SIZES = [
  ['desktop', { width: 1440, height: 900 }],
  ['tablet', { width: 820, height: 1180 }],
  ['phone', { width: 390, height: 844 }],
] as const;

let browser: TestBrowser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await closeTestDb();
});

async function noOverflow(name: string) {
  const overflow = await browser.page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
  expect(overflow, `${name}: nothing wider than the screen`).toBeLessThanOrEqual(0);
}

describe('sign-up by e-mailed link, and the captured-mail page', () => {
  it('signs up at every width: the form answers "check your inbox", the link page creates the account', async () => {
    const { page } = browser;
    for (const [size, viewport] of SIZES) {
      await browser.context.clearCookies();
      await page.setViewportSize(viewport);
      const email = uniqueEmail(`browser-${size}`);
      await page.goto('/sign-up');
      await waitForIslands(page);
      await page.getByLabel('Display name').fill('Ottilie Brambleworth');
      await page.getByLabel('E-mail').fill(email);
      await page.getByLabel('Password').fill(DEFAULT_PASSWORD);
      const since = new Date();
      await page.getByRole('button', { name: 'Create account' }).click();
      await page.getByRole('status').filter({ hasText: 'Check your inbox' }).waitFor();
      await noOverflow(`sign-up ${size}`);
      await screenshot(page, `security-sign-up-sent-${size}`);

      const mail = await waitForMail(email, { subject: 'Finish creating your Threadway account', since });
      const link = new URL(linksIn(mail.text).find((l) => l.includes('/sign-up/confirm?token='))!);
      await page.goto(link.pathname + link.search);
      await waitForIslands(page);
      expect(await page.getByRole('heading', { level: 1 }).textContent()).toContain('Finish creating your account');
      await noOverflow(`confirm ${size}`);
      await screenshot(page, `security-sign-up-confirm-${size}`);
      await page.getByRole('button', { name: 'Create my account' }).click();
      await page.waitForURL('**/dashboard');
      expect(await page.getByRole('heading', { level: 1 }).textContent()).toContain('Ottilie Brambleworth');
    }
  });

  it('shows the captured mail to an admin under a banner that says it is a local fake', async () => {
    const { page } = browser;
    const admin = await createAccount({ role: 'admin', displayName: 'Guild Admin' });
    await browser.context.clearCookies();
    await page.goto('/sign-in?next=/dev/mail');
    await waitForIslands(page);
    await page.getByLabel('E-mail').fill(admin.email);
    await page.getByLabel('Password').fill(admin.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL((u) => u.pathname === '/dev/mail');
    for (const [size, viewport] of SIZES) {
      await page.setViewportSize(viewport);
      await page.reload();
      await page.getByText('Local fake mail server', { exact: false }).waitFor();
      expect(await page.getByRole('heading', { level: 1 }).textContent()).toContain('Captured mail');
      await noOverflow(`dev mail ${size}`);
      // The viewport only: by now the capture folder holds every message of the test run.
      await page.screenshot({ path: path.join(testEnv.outputDir, 'screenshots', `security-dev-mail-${size}.png`) });
    }
  });

  it('shows the invitation sign-up with the invited address fixed, at every width', async () => {
    const { page } = browser;
    const w = await buildWorld();
    const email = uniqueEmail('invited-browser');
    const since = new Date();
    await w.teacher.client.post(`/api/classes/${w.classId}/invitations`, { emails: [email] });
    const link = new URL(linksIn((await waitForMail(email, { subject: 'invites you', since })).text).find((l) => l.includes('/invitations/'))!);
    await browser.context.clearCookies();
    for (const [size, viewport] of SIZES) {
      await page.setViewportSize(viewport);
      await page.goto(link.pathname);
      expect(await page.inputValue('input[name=email]')).toBe(email);
      expect(await page.getAttribute('input[name=email]', 'readonly')).not.toBeNull();
      await noOverflow(`invitation ${size}`);
      await screenshot(page, `security-invitation-sign-up-${size}`);
    }
  });
});
