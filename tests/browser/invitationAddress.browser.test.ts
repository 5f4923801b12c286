// Invitations in headless chromium (issue 14, item 7): the teacher's list with bad addresses is refused naming each
// one beside the field; an invitation opened while signed in as another account says so in a plain sentence and
// offers to sign out and sign in as the invited address, which then joins. Screenshots at three sizes.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, screenshot, waitForIslands, type TestBrowser } from '../helpers/browser.ts';
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
const SIZES = [
  { name: 'desktop', width: 1440, height: 900 },
  { name: 'tablet', width: 820, height: 1180 },
  { name: 'phone', width: 390, height: 844 },
] as const;

beforeAll(async () => {
  w = await buildWorld();
  browser = await launchBrowser({ width: 1440, height: 900 });
});
afterAll(async () => {
  await browser?.close();
  await closeTestDb();
});

describe('invitations by address', () => {
  it('names each bad address beside the list, then sends; the link refuses another account and lets the invited one join', async () => {
    const invited = await createAccount({ displayName: 'Rosalind Tack' });
    const other = await createAccount({ displayName: 'Barnaby Hem' });
    const page = browser.page;
    await signInAs(w.teacher);
    await page.goto(`/classes/${w.classId}`);
    const form = page.locator('form', { has: page.getByRole('heading', { name: 'Invite by e-mail' }) });
    await form.getByLabel('E-mail addresses (one per line)').fill(`${invited.email}\nrosalind@\nbarnaby at the guild`);
    await form.getByRole('button', { name: 'Send invitations' }).click();
    const said = 'These are not e-mail addresses: “rosalind@”, “barnaby at the guild”. Nothing was sent; fix them and send again.';
    await form.locator('[data-form-alert]:not([hidden])').filter({ hasText: said }).waitFor();
    expect(await form.locator('[data-field-error]').textContent()).toBe('Not e-mail addresses: “rosalind@”, “barnaby at the guild”.');
    await screenshot(page, 'invitation-bad-addresses');

    const sentAt = new Date();
    await form.getByLabel('E-mail addresses (one per line)').fill(invited.email);
    await form.getByRole('button', { name: 'Send invitations' }).click();
    await page.getByText(`${invited.email}: waiting`).waitFor();
    const mail = await waitForMail(invited.email, { subject: 'invites you', since: sentAt });
    const link = new URL(linksIn(mail.text).find((l) => l.includes('/invitations/'))!).pathname;

    await signInAs(other);
    for (const size of SIZES) {
      await page.setViewportSize(size);
      await page.goto(link);
      const alert = page.getByRole('alert');
      expect(await alert.textContent()).toBe(`This invitation was sent to ${invited.email}, but you are signed in as ${other.email}. Only ${invited.email} can use it.`);
      expect(await page.getByRole('button', { name: 'Join the class' }).count()).toBe(0);
      expect(await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth)).toBeLessThanOrEqual(0);
      await screenshot(page, `invitation-other-account-${size.name}`);
    }
    await page.setViewportSize({ width: 1440, height: 900 });
    await page.getByRole('button', { name: `Sign out and sign in as ${invited.email}` }).click();
    await page.waitForURL((u) => u.pathname === '/sign-in' && u.searchParams.get('next') === link);
    await waitForIslands(page);
    await page.getByLabel('E-mail').fill(invited.email);
    await page.getByLabel('Password').fill(invited.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL((u) => u.pathname === link);
    await page.getByRole('button', { name: 'Join the class' }).click();
    await page.waitForURL((u) => u.pathname === `/classes/${w.classId}`);
    expect(await page.textContent('h1')).toBe('Tuesday quilt-along');
  });
});
