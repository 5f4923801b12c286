// The second half of signing up in the browser: the e-mailed link (read from the fake mail server's capture
// folder), its page, and the button that creates the account and opens the dashboard.
import type { Page } from 'playwright-core';
import { waitForIslands } from './browser.ts';
import { linksIn, waitForMail } from './mail.ts';

export async function finishSignUpFromMail(page: Page, email: string, since: Date): Promise<void> {
  const mail = await waitForMail(email, { subject: 'Finish creating your Threadway account', since });
  const link = linksIn(mail.text).find((l) => l.includes('/sign-up/confirm?token='));
  if (!link) throw new Error(`tests/helpers/signUpFlow: no sign-up link in the mail to ${email}`);
  const url = new URL(link);
  await page.goto(url.pathname + url.search);
  await waitForIslands(page);
  await page.getByRole('button', { name: 'Create my account' }).click();
  await page.waitForURL('**/dashboard');
}
