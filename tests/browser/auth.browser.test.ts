// The account flow in headless chromium: sign up → e-mailed link → dashboard → sign out → sign in → dashboard → sign out,
// an admin changing a role, and the home page at phone and desktop widths. One browser for the file
// (launching is the slow part); cookies are cleared between tests. Screenshots: $TEST_OUTPUT_DIR/screenshots/.
import { afterAll, beforeAll, beforeEach, describe, expect, it } from 'vitest';
import { DEFAULT_PASSWORD, createAccount, uniqueEmail } from '../helpers/accounts.ts';
import { launchBrowser, screenshot, waitForIslands, type TestBrowser } from '../helpers/browser.ts';
import { closeTestDb, testDb } from '../helpers/db.ts';
import { finishSignUpFromMail } from '../helpers/signUpFlow.ts';

let browser: TestBrowser;
beforeAll(async () => {
  browser = await launchBrowser();
});
beforeEach(async () => {
  await browser.context.clearCookies();
  await browser.page.setViewportSize({ width: 1280, height: 900 });
});
afterAll(async () => {
  await browser?.close();
  await closeTestDb();
});

describe('account flow in the browser', () => {
  it('signs up, reaches the dashboard, signs out, signs in with the keyboard and signs out again', async () => {
    const { page } = browser;
    const email = uniqueEmail('browser');
    await page.goto('/sign-up');
    await waitForIslands(page);
    await page.getByLabel('Display name').fill('Hollis Fairweather');
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill(DEFAULT_PASSWORD);
    await page.getByLabel('Centimetres').check();
    await screenshot(page, '01-sign-up-filled');
    const since = new Date();
    await page.getByRole('button', { name: 'Create account' }).click();
    await page.getByRole('status').filter({ hasText: 'Check your inbox' }).waitFor();
    await screenshot(page, '01b-sign-up-check-inbox');
    await finishSignUpFromMail(page, email, since);
    expect(await page.getByRole('heading', { level: 1 }).textContent()).toContain('Hollis Fairweather');
    expect(await page.getByRole('link', { name: 'All my designs' }).getAttribute('href')).toBe('/designs');
    expect(await page.getByText('centimetres').count()).toBeGreaterThan(0);
    await screenshot(page, '02-dashboard');

    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL((u) => u.pathname === '/' && u.search.includes('signed-out'));
    expect(await page.getByRole('status').first().textContent()).toContain('signed out');
    await screenshot(page, '03-signed-out-home');

    // A guarded page sends us to sign-in, and back to it afterwards.
    await page.goto('/account');
    await page.waitForURL('**/sign-in?next=%2Faccount');
    await waitForIslands(page);
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password').fill('not-the-password');
    await page.getByLabel('Password').press('Enter');
    await page.getByRole('alert').filter({ hasText: 'do not match' }).waitFor();
    await screenshot(page, '04-sign-in-wrong-password');
    await page.getByLabel('Password').fill(DEFAULT_PASSWORD);
    await page.getByLabel('Password').press('Enter');
    await page.waitForURL('**/account');
    await waitForIslands(page);
    expect(await page.getByLabel('Display name').inputValue()).toBe('Hollis Fairweather');
    await screenshot(page, '05-account');

    await page.goto('/dashboard');
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.waitForURL((u) => u.pathname === '/');
    await page.goto('/dashboard');
    await page.waitForURL('**/sign-in?next=%2Fdashboard');
  });

  it('lets an admin search accounts and change a role', async () => {
    const { page } = browser;
    const admin = await createAccount({ role: 'admin', displayName: 'Juniper Admin' });
    const member = await createAccount({ displayName: `Marlowe Stitch ${Date.now()}` });
    await page.goto('/sign-in?next=/admin/accounts');
    await waitForIslands(page);
    await page.getByLabel('E-mail').fill(admin.email);
    await page.getByLabel('Password').fill(admin.password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL('**/admin/accounts');
    await waitForIslands(page);
    await page.getByRole('searchbox', { name: 'Search by name or e-mail' }).fill(member.displayName);
    await page.getByRole('button', { name: 'Search' }).click();
    await page.getByRole('combobox', { name: `Role of ${member.displayName}` }).selectOption('teacher');
    // Nothing changes until the admin says yes to a question in plain words.
    const question = page.getByRole('group', { name: /^Make Marlowe Stitch/ });
    expect(await question.textContent()).toContain(`Make ${member.displayName} a teacher? A teacher also publishes templates and runs classes.`);
    expect((await testDb().selectFrom('account').select('role').where('id', '=', member.id).executeTakeFirstOrThrow()).role).toBe('quilter');
    await screenshot(page, '06-admin-accounts-question');
    await question.getByRole('button', { name: `Yes, make ${member.displayName} a teacher` }).click();
    await page.getByRole('status').filter({ hasText: 'is now a teacher' }).waitFor();
    await screenshot(page, '06-admin-accounts');

    // The only admin cannot step down: the refusal says why, beside the account. (Other admins are made teachers
    // for the moment and restored after, as in tests/api/admin.test.ts.)
    const db = testDb();
    const others = (await db.selectFrom('account').select('id').where('role', '=', 'admin').where('id', '!=', admin.id).execute()).map((o) => o.id);
    try {
      if (others.length) await db.updateTable('account').set({ role: 'teacher' }).where('id', 'in', others).execute();
      await page.getByRole('searchbox', { name: 'Search by name or e-mail' }).fill(admin.email);
      await page.getByRole('button', { name: 'Search' }).click();
      await page.getByRole('combobox', { name: 'Role of Juniper Admin' }).selectOption('teacher');
      await page.getByRole('button', { name: 'Yes, make Juniper Admin a teacher' }).click();
      const why = 'This is the only admin account, and there must always be one admin so that someone can change roles. Make someone else an admin first.';
      await page.locator(`#role-error-${admin.id}`).filter({ hasText: why }).waitFor();
      expect(await page.getByRole('combobox', { name: 'Role of Juniper Admin' }).inputValue()).toBe('admin');
      await screenshot(page, '06-admin-accounts-last-admin');
    } finally {
      if (others.length) await db.updateTable('account').set({ role: 'admin' }).where('id', 'in', others).execute();
    }
  });

  it('shows the home page at phone and desktop widths, with a skip link first in the Tab order', async () => {
    const { page } = browser;
    for (const [name, viewport] of [
      ['07-home-phone', { width: 390, height: 844 }],
      ['08-home-desktop', { width: 1280, height: 900 }],
    ] as const) {
      await page.setViewportSize(viewport);
      await page.goto('/');
      expect(await page.getByRole('heading', { level: 1 }).textContent()).toContain('one unbroken line');
      const overflow = await page.evaluate(() => document.documentElement.scrollWidth - window.innerWidth);
      expect(overflow, `${name}: nothing wider than the screen`).toBeLessThanOrEqual(0);
      await screenshot(page, name);
      await page.keyboard.press('Tab');
      expect(await page.evaluate(() => document.activeElement?.textContent)).toBe('Skip to content');
    }
  });
});
