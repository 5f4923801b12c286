// Issue 15 item 5 in chromium: a quilter builds a 2 × 2 quilt from the demo guild's 12 in drawings (built as the seed
// builds them), saves it, plans its order across the quilt, clicks "Printable plan (PDF)" and gets a PDF whose text
// (pdftotext, Debian poppler-utils) has the quilt map, the trim plan and the blocks' step lists. The download buttons
// on the workbench, the quilt page and a lesson page at 1440 × 900, 820 × 1180 and 390 × 844, and the pages as
// chromium prints them (emulated print media): controls gone, drawing and step list kept.
// Screenshots in test-output/screenshots (print-*.png, print-media-*.png).
import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it, onTestFinished } from 'vitest';
import { launchBrowser, screenshot, waitForIslands, type TestBrowser } from '../helpers/browser.ts';
import { createAccount, type TestAccount } from '../helpers/accounts.ts';
import { closeTestDb } from '../helpers/db.ts';
import { testEnv } from '../helpers/env.ts';
import { elementsWiderThanViewport, WIDTHS } from '../helpers/layout.ts';
import { marigoldDrawings, tobiasDrawings } from '../../scripts/seed/guildDrawings.ts';
import { buildWorld, type World } from '../api/teachingWorld.ts';

let browser: TestBrowser;
let quilter: TestAccount;
let world: World;
const ids = new Map<string, string>();

beforeAll(async () => {
  quilter = await createAccount({ displayName: 'Plan printer' });
  const { ditch, echoes } = marigoldDrawings();
  for (const d of [tobiasDrawings()[0]!, ditch, echoes]) {
    const res = await quilter.client.post('/api/designs', { title: d.title, notes: d.notes, design: d.design });
    expect(res.status, res.text).toBe(201);
    ids.set(d.title, res.body.design.id);
  }
  world = await buildWorld();
  browser = await launchBrowser(WIDTHS[0]);
  await browser.context.addCookies([{ name: 'tw_session', value: quilter.client.sessionToken!, url: testEnv.appUrl }]);
}, 120_000);
afterAll(async () => {
  await browser?.close();
  await closeTestDb();
});

describe('printable plans in the browser', () => {
  it('a 2 × 2 quilt of demo designs, its order planned, downloads as a PDF with the map, trim plan and steps', async () => {
    const page = browser.page;
    await page.goto('/quilts');
    await waitForIslands(page);
    await page.getByLabel('Title').fill('Printed sampler');
    await page.getByLabel('Rows').fill('2');
    await page.getByLabel('Columns').fill('2');
    await page.getByLabel('Block (in)').fill('12');
    await page.getByRole('button', { name: 'New quilt' }).click();
    await page.waitForURL(/\/quilts\/[0-9a-f-]{36}$/);
    const cells: [string, string][] = [
      ['Row 1, column 1: empty', 'Heron Bend nine-patch'],
      ['Row 1, column 2: empty', 'Quilt-along week 1: pinwheel in the ditch'],
      ['Row 2, column 1: empty', 'Quilt-along week 2: pinwheel with echoed blades'],
      ['Row 2, column 2: empty', 'Heron Bend nine-patch'],
    ];
    for (const [cell, title] of cells) {
      await page.getByRole('button', { name: cell }).click();
      await page.getByLabel('Design', { exact: true }).selectOption({ label: title });
    }
    await page.getByRole('button', { name: 'Turn a quarter' }).click();
    await page.getByLabel('Sashing (in)').fill('1');
    await page.getByRole('button', { name: 'Add a border' }).click();
    await page.getByLabel('Border 1 (in)').fill('2');
    // While the map has unsaved changes the plan would print the saved copy, so the page says to save first.
    await page.getByText('Save the quilt to download its plan.').waitFor();
    await page.getByRole('button', { name: 'Save quilt' }).click();
    await page.getByText(/Saved, version \d+/).waitFor();

    await page.getByRole('button', { name: 'Plan the route across the quilt' }).click();
    const route = page.getByTestId('quilt-route');
    await route.waitFor({ timeout: 60_000 });
    expect(await route.locator('li').count()).toBe(4);

    const [download] = await Promise.all([page.waitForEvent('download', { timeout: 60_000 }), page.getByRole('link', { name: 'Printable plan (PDF)' }).click()]);
    expect(download.suggestedFilename()).toBe('Printed-sampler-plan.pdf');
    const file = await download.path();
    expect(readFileSync(file).subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const text = execFileSync('/usr/bin/pdftotext', ['-enc', 'UTF-8', file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
    // 2 · 12 + 1 + 2 · 2 = 29 in square (finishedSize.ts).
    expect(text).toContain('Printed sampler');
    expect(text).toContain('finished size 29 × 29 in · 2 × 2 blocks of 12 × 12 in · sashing 1 in · border 2 in');
    expect(text).toContain('Quilt-as-you-go trim plan');
    expect(text).toContain('Row 2, column 2');
    for (const title of ['Heron Bend nine-patch', 'Quilt-along week 1: pinwheel in the ditch', 'Quilt-along week 2: pinwheel with echoed blades']) expect(text).toContain(title);
    expect(text).toMatch(/Steps \(\d+, \d+ pass/);
    expect(text).toContain('1. Start pass 1');
    expect(text).toContain('Needle: Keep your fingers clear of the needle');
    expect(text).toContain('Rotary cutter:');

    for (const size of WIDTHS) {
      await page.setViewportSize(size);
      const section = page.getByRole('region', { name: 'Printable plan' });
      await section.scrollIntoViewIfNeeded();
      expect(await elementsWiderThanViewport(page), `${size.name}: wider than the viewport`).toEqual([]);
      await page.screenshot({ path: `${testEnv.outputDir}/screenshots/print-quilt-${size.name}.png` });
    }
    await page.setViewportSize(WIDTHS[0]);
    await page.emulateMedia({ media: 'print' });
    onTestFinished(() => page.emulateMedia({ media: 'screen' }));
    expect(await page.getByRole('link', { name: 'Printable plan (PDF)' }).isVisible()).toBe(false);
    expect(await page.getByRole('button', { name: 'Save quilt' }).isVisible()).toBe(false);
    expect(await page.getByRole('button', { name: 'Row 2, column 2: Heron Bend nine-patch, turned 90°' }).isVisible()).toBe(true);
    await screenshot(page, 'print-media-quilt');
    await page.emulateMedia({ media: 'screen' });
  });

  it('the workbench has the plan downloads beside the SVG, at every width', async () => {
    const page = browser.page;
    await page.goto(`/designs/${ids.get('Heron Bend nine-patch')}`);
    await waitForIslands(page);
    const link = page.getByRole('link', { name: 'Printable plan (PDF)' });
    await link.waitFor();
    expect(await link.getAttribute('href')).toBe(`/api/designs/${ids.get('Heron Bend nine-patch')}/plan.pdf`);
    expect(await page.getByRole('link', { name: 'True-size tiles (PDF)' }).getAttribute('href')).toBe(`/api/designs/${ids.get('Heron Bend nine-patch')}/plan.pdf?layout=tiles`);
    for (const size of WIDTHS) {
      await page.setViewportSize(size);
      await link.scrollIntoViewIfNeeded();
      expect(await link.isVisible(), size.name).toBe(true);
      await page.screenshot({ path: `${testEnv.outputDir}/screenshots/print-workbench-${size.name}.png` });
    }
    const [download] = await Promise.all([page.waitForEvent('download', { timeout: 60_000 }), page.getByRole('link', { name: 'True-size tiles (PDF)' }).click()]);
    const text = execFileSync('/usr/bin/pdftotext', ['-enc', 'UTF-8', await download.path(), '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
    expect(text).toContain('tile B2 of 4');
  });

  it('a lesson page offers the plan to its student, and prints without its controls', async () => {
    const page = browser.page;
    await browser.context.clearCookies();
    await browser.context.addCookies([{ name: 'tw_session', value: world.student.client.sessionToken!, url: testEnv.appUrl }]);
    await page.setViewportSize(WIDTHS[0]);
    await page.goto(`/classes/${world.classId}/lessons/${world.releasedLessonId}`);
    await waitForIslands(page);
    const link = page.getByRole('link', { name: 'Printable plan (PDF)' });
    expect(await link.getAttribute('href')).toBe(`/api/lessons/${world.releasedLessonId}/plan.pdf`);
    for (const size of WIDTHS) {
      await page.setViewportSize(size);
      await page.reload();
      await waitForIslands(page);
      await page.screenshot({ path: `${testEnv.outputDir}/screenshots/print-lesson-${size.name}.png` });
      expect(await elementsWiderThanViewport(page), `${size.name}: wider than the viewport`).toEqual([]);
    }
    const [download] = await Promise.all([page.waitForEvent('download', { timeout: 60_000 }), link.click()]);
    expect(download.suggestedFilename()).toBe('Lesson-1-the-first-line-plan.pdf');
    await page.setViewportSize(WIDTHS[0]);
    await page.emulateMedia({ media: 'print' });
    onTestFinished(() => page.emulateMedia({ media: 'screen' }));
    expect(await link.isVisible()).toBe(false);
    expect(await page.locator('body > header').isVisible()).toBe(false);
    // The block's picture and the step list stay when printed.
    expect(await page.getByRole('img', { name: /the block with its route/ }).isVisible()).toBe(true);
    expect(await page.getByRole('heading', { name: /steps/i }).first().isVisible()).toBe(true);
    await screenshot(page, 'print-media-lesson');
    const pdf = await page.pdf({ format: 'Letter' });
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    await page.emulateMedia({ media: 'screen' });
  });
});
