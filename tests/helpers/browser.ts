// Headless Debian chromium through playwright-core (never a downloaded browser), with a fresh profile.
import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';
import { testEnv } from './env.ts';

export const CHROMIUM_ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export interface TestBrowser {
  context: BrowserContext;
  page: Page;
  close(): Promise<void>;
}

/** Launches chromium with a throwaway user-data dir; `width`/`height` set the viewport (default desktop). */
export async function launchBrowser(viewport: { width: number; height: number } = { width: 1280, height: 900 }): Promise<TestBrowser> {
  const profile = mkdtempSync(path.join(os.tmpdir(), 'threadway-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: testEnv.chromiumPath,
    headless: true,
    args: CHROMIUM_ARGS,
    viewport,
    baseURL: testEnv.appUrl,
  });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    async close() {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

/** Saves a full-page PNG as $TEST_OUTPUT_DIR/screenshots/<name>.png and returns its path. */
export async function screenshot(page: Page, name: string): Promise<string> {
  const dir = path.join(testEnv.outputDir, 'screenshots');
  mkdirSync(dir, { recursive: true });
  const file = path.join(dir, `${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}

/**
 * Waits until every React island on the page has hydrated (Astro removes the `ssr` attribute from
 * <astro-island> then). Call it after goto() and before typing into island forms: until then their
 * submit buttons are disabled.
 */
export async function waitForIslands(page: Page, timeoutMs = 30_000): Promise<void> {
  await page.waitForFunction(() => document.querySelectorAll('astro-island[ssr]').length === 0, undefined, { timeout: timeoutMs });
}

/** Signs the browser in as one of the demo guild's people (by display name), replacing any session it had. */
export async function signInDemoBrowser(context: BrowserContext, displayName: string): Promise<void> {
  const { demoGuild, signIn } = await import('./accounts.ts');
  const account = demoGuild.accounts.find((a) => a.displayName === displayName);
  if (!account) throw new Error(`tests/helpers/browser: the demo guild has no ${displayName}`);
  const client = await signIn(account.email, demoGuild.password);
  await context.clearCookies();
  await context.addCookies([{ name: 'tw_session', value: client.sessionToken!, url: testEnv.appUrl }]);
}
