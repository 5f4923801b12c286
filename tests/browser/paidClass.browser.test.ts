// A student pays for a class on the local payments fake's checkout page and reads its lessons: join code on the
// Classes page → the fake's page (test card) → back to /payments/return → the class → its released lesson. Then the
// payment screens at the three widths (screenshots paid-*.png), with nothing wider than the viewport.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, screenshot, type TestBrowser } from '../helpers/browser.ts';
import { closeTestDb } from '../helpers/db.ts';
import { createAccount, type TestAccount } from '../helpers/accounts.ts';
import { testEnv } from '../helpers/env.ts';
import { paymentsEnv } from '../helpers/payments.ts';
import { elementsWiderThanViewport, WIDTHS } from '../helpers/layout.ts';
import { buildPaidClassWorld, type PaidClassWorld } from '../api/paidClassWorld.ts';

let w: PaidClassWorld;
let buyer: TestAccount;
let browser: TestBrowser;
beforeAll(async () => {
  w = await buildPaidClassWorld('Heron Bend stitch-along (paid)');
  buyer = await createAccount({ displayName: 'Clementine Basting' });
  browser = await launchBrowser({ width: 1440, height: 900 });
}, 60_000);
afterAll(async () => {
  await browser?.close();
  await closeTestDb();
});

async function signInBrowserAs(account: TestAccount) {
  await browser.context.clearCookies();
  await browser.context.addCookies([{ name: 'tw_session', value: account.client.sessionToken!, url: testEnv.appUrl }]);
}

describe('paying for a class', () => {
  it('pays on the fake checkout page and opens the released lesson', async () => {
    await signInBrowserAs(buyer);
    const page = browser.page;
    await page.goto('/classes');
    await page.getByLabel('Join with a class code').fill(w.joinCode);
    await page.getByRole('button', { name: 'Join' }).click();
    await page.waitForURL((u) => u.href.startsWith(`${paymentsEnv.apiUrl}/checkout/`));
    expect(await page.textContent('body')).toContain('Local stand-in for the payments service');
    await screenshot(page, 'paid-checkout-fake');
    await page.getByRole('button', { name: /^Pay / }).click();
    await page.waitForURL(/\/payments\/return\?session_id=/);
    await page.getByText('€45.00 paid for').waitFor();
    await page.getByRole('link', { name: 'Go to the class' }).click();
    await page.getByRole('heading', { level: 1, name: 'Heron Bend stitch-along (paid)' }).waitFor();
    expect(await page.textContent('body')).not.toContain('Evening lesson 2');
    await page.getByRole('link', { name: /Evening lesson 1/ }).first().click();
    await page.getByText(/Step 1 of/).first().waitFor({ timeout: 30_000 });
  }, 90_000);

  it('shows the payment screens at 1440, 820 and 390 px without sideways scrolling', async () => {
    const page = browser.page;
    const screens: { who: TestAccount; path: string; name: string; wait: string }[] = [
      { who: buyer, path: `/classes/${w.classId}`, name: 'class-student', wait: 'Evening lesson 1' },
      { who: buyer, path: '/payments', name: 'receipts', wait: 'My receipts' },
      { who: w.teacher, path: '/payments', name: 'teacher', wait: 'Totals for my classes' },
      { who: w.admin, path: '/payments', name: 'admin', wait: 'All payments' },
    ];
    for (const size of WIDTHS) {
      await page.setViewportSize({ width: size.width, height: size.height });
      for (const s of screens) {
        await signInBrowserAs(s.who);
        await page.goto(s.path);
        await page.getByText(s.wait).first().waitFor();
        expect(await elementsWiderThanViewport(page), `${s.name} at ${size.name}`).toEqual([]);
        // Also what that check leaves out: an absolutely placed child escaping its scroll box widens the page too.
        expect(await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth), `${s.name} at ${size.name} scrolls sideways`).toBe(0);
        await screenshot(page, `paid-${s.name}-${size.name}`);
      }
    }
  }, 120_000);

  it('after the teacher refunds, the student’s class page says the released lessons stay theirs', async () => {
    const page = browser.page;
    await signInBrowserAs(w.teacher);
    await page.setViewportSize({ width: 390, height: 844 });
    await page.goto('/payments');
    await page.getByRole('button', { name: 'Refund…' }).click();
    await page.getByRole('dialog').getByRole('button', { name: 'Refund in full' }).click();
    await page.waitForLoadState('load');
    for (let i = 0; i < 40 && !(await page.textContent('[data-payment-state]'))?.includes('refunded'); i += 1) {
      await new Promise((r) => setTimeout(r, 250));
      await page.reload();
    }
    expect(await page.textContent('[data-payment-state]')).toContain('refunded');
    await screenshot(page, 'paid-teacher-refunded-phone');
    await signInBrowserAs(buyer);
    await page.goto(`/classes/${w.classId}`);
    await page.getByText('You keep the lessons').waitFor();
    await page.getByRole('link', { name: /Evening lesson 1/ }).first().waitFor();
    await screenshot(page, 'paid-class-refunded-phone');
  }, 60_000);
});
