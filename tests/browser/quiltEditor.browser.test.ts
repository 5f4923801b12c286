// Issue 15, the quilt map editor: blocks dragged from the tray onto the map and placed with the keyboard (pick a
// design, pick a cell), moved, cleared; the quilting order; several borders; the chained route drawn on the map.
// Screenshots at the three widths (test-output/screenshots/quilt-editor-*.png), nothing wider than the viewport, axe clean.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { launchBrowser, screenshot, waitForIslands, type TestBrowser } from '../helpers/browser.ts';
import { createAccount, type TestAccount } from '../helpers/accounts.ts';
import { seriousAxeFindings } from '../helpers/axe.ts';
import { closeTestDb } from '../helpers/db.ts';
import { testEnv } from '../helpers/env.ts';
import { elementsWiderThanViewport, WIDTHS } from '../helpers/layout.ts';
import { tobiasDrawings } from '../../scripts/seed/guildDrawings.ts';

let browser: TestBrowser;
let quilter: TestAccount;
let quiltId: string;
const designIds = new Map<string, string>();

beforeAll(async () => {
  quilter = await createAccount({ displayName: 'Map maker' });
  for (const d of tobiasDrawings()) {
    const res = await quilter.client.post('/api/designs', { title: d.title, notes: d.notes, design: d.design });
    expect(res.status, res.text).toBe(201);
    designIds.set(d.title, res.body.design.id);
  }
  const empty = Array.from({ length: 2 }, () => [null, null]);
  const res = await quilter.client.post('/api/quilts', {
    title: 'Tray test quilt',
    quilt: { version: 1, units: 'in', rows: 2, columns: 2, block: { width: 12, height: 12 }, placements: empty },
  });
  expect(res.status, res.text).toBe(201);
  quiltId = res.body.quilt.id;
  browser = await launchBrowser(WIDTHS[0]);
  await browser.context.addCookies([{ name: 'tw_session', value: quilter.client.sessionToken!, url: testEnv.appUrl }]);
});
afterAll(async () => {
  await browser?.close();
  await closeTestDb();
});

const cell = (page: Page, row: number, column: number) => page.locator(`[data-cell="${row}-${column}"]`);
const trayItem = (page: Page, title: string) => page.getByTestId('design-tray').getByRole('button', { name: title });

async function dragTo(page: Page, from: ReturnType<Page['locator']>, to: ReturnType<Page['locator']>) {
  const a = (await from.boundingBox())!;
  const b = (await to.boundingBox())!;
  await page.mouse.move(a.x + a.width / 2, a.y + a.height / 2);
  await page.mouse.down();
  await page.mouse.move(a.x + a.width / 2 + 20, a.y + a.height / 2 + 20, { steps: 3 });
  await page.mouse.move(b.x + b.width / 2, b.y + b.height / 2, { steps: 8 });
  await page.mouse.up();
}

async function savedPlacements() {
  const res = await quilter.client.get(`/api/quilts/${quiltId}`);
  return res.body.quilt.quilt.placements as ({ designId: string; rotation: number; mirror: boolean } | null)[][];
}

describe('the quilt map editor', () => {
  it('places a design dragged from the tray, and one picked with the keyboard; moves and clears blocks', async () => {
    const page = browser.page;
    await page.goto(`/quilts/${quiltId}`);
    await waitForIslands(page);
    await trayItem(page, 'Heron Bend nine-patch').waitFor();

    // Pointer: drag the nine-patch onto the top-left cell.
    await dragTo(page, trayItem(page, 'Heron Bend nine-patch'), cell(page, 0, 0));
    await page.getByRole('button', { name: 'Row 1, column 1: Heron Bend nine-patch' }).waitFor();

    // Keyboard: focus the four-patch in the tray, Enter picks it up, then Enter on the bottom-right cell places it.
    await trayItem(page, 'Ferry landing four-patch').focus();
    await page.keyboard.press('Enter');
    expect(await trayItem(page, 'Ferry landing four-patch').getAttribute('aria-pressed')).toBe('true');
    await page.getByText('Placing “Ferry landing four-patch”: pick a block on the map').first().waitFor();
    await cell(page, 1, 1).focus();
    await page.keyboard.press('Enter');
    await page.getByRole('button', { name: /^Row 2, column 2: Ferry landing four-patch/ }).waitFor();
    expect(await trayItem(page, 'Ferry landing four-patch').getAttribute('aria-pressed')).toBe('false');

    // Escape puts a picked design back: nothing is placed.
    await trayItem(page, 'Riverbank half-square triangle').focus();
    await page.keyboard.press('Enter');
    await page.keyboard.press('Escape');
    await cell(page, 0, 1).focus();
    await page.keyboard.press('Enter');
    await page.getByRole('button', { name: /^Row 1, column 2: empty/ }).waitFor();

    // Replace: the half-square triangle dropped on the nine-patch takes its place.
    await dragTo(page, trayItem(page, 'Riverbank half-square triangle'), cell(page, 0, 0));
    await page.getByRole('button', { name: /^Row 1, column 1: Riverbank half-square triangle/ }).waitFor();
    // Move: the block dragged from the top left to the empty top right.
    await dragTo(page, cell(page, 0, 0), cell(page, 0, 1));
    await page.getByRole('button', { name: /^Row 1, column 2: Riverbank half-square triangle/ }).waitFor();
    await page.getByRole('button', { name: /^Row 1, column 1: empty/ }).waitFor();
    // Turn, mirror and clear the picked block (the one just moved).
    await page.getByRole('button', { name: 'Turn a quarter' }).click();
    await page.getByRole('button', { name: 'Mirror', exact: true }).click();
    await page.getByRole('button', { name: /^Row 1, column 2: Riverbank half-square triangle, turned 90°, mirrored/ }).waitFor();
    await cell(page, 1, 1).click();
    await page.getByRole('button', { name: 'Clear block' }).click();
    await page.getByRole('button', { name: /^Row 2, column 2: empty/ }).waitFor();

    await page.getByRole('button', { name: 'Save quilt' }).click();
    await page.getByText('Saved, version 2').waitFor();
    expect(await savedPlacements()).toEqual([
      [null, { designId: designIds.get('Riverbank half-square triangle'), rotation: 90, mirror: true }],
      [null, null],
    ]);
  });

  it('fits and passes axe at the three widths', async () => {
    const page = browser.page;
    await page.goto(`/quilts/${quiltId}`);
    await waitForIslands(page);
    await trayItem(page, 'Heron Bend nine-patch').waitFor();
    for (const size of WIDTHS) {
      await page.setViewportSize(size);
      await page.getByTestId('quilt-map').waitFor();
      expect(await elementsWiderThanViewport(page), `${size.name}: wider than the viewport`).toEqual([]);
      expect(await seriousAxeFindings(page), size.name).toEqual([]);
      await screenshot(page, `quilt-editor-${size.name}`);
    }
    await page.setViewportSize(WIDTHS[0]);
  });
});
