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
  // Mouse events only reach what is on screen: bring the pair into view (they are close together in these tests).
  await to.scrollIntoViewIfNeeded();
  await from.scrollIntoViewIfNeeded();
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

  it('orders the blocks row by row, serpentine, or by hand (dragging a number, or Earlier and Later from the keyboard)', async () => {
    const page = browser.page;
    const now = await quilter.client.get(`/api/quilts/${quiltId}`);
    const p = (title: string) => ({ designId: designIds.get(title), rotation: 0, mirror: false });
    const put = await quilter.client.put(`/api/quilts/${quiltId}`, {
      baseVersion: now.body.quilt.version,
      quilt: { ...now.body.quilt.quilt, placements: [[p('Heron Bend nine-patch'), p('Ferry landing four-patch')], [p('Riverbank half-square triangle'), p('Heron Bend nine-patch')]] },
    });
    expect(put.status, put.text).toBe(200);
    await page.goto(`/quilts/${quiltId}`);
    await waitForIslands(page);
    await page.getByTestId('quilt-map').waitFor();
    const numbers = () => page.locator('[data-cell]').evaluateAll((cells) => cells.map((c) => `${(c as HTMLElement).dataset.cell}:${c.querySelector<HTMLElement>('[data-order]')?.dataset.order ?? '-'}`).join(' '));

    // Row by row from the top left is the default.
    await expect.poll(numbers).toBe('0-0:1 0-1:2 1-0:3 1-1:4');
    await page.getByLabel('Serpentine: every other row right to left').check();
    await expect.poll(numbers).toBe('0-0:1 0-1:2 1-0:4 1-1:3');
    await page.getByLabel('By hand').check();
    const list = page.getByTestId('order-list');
    expect(await list.locator('li').count()).toBe(4);
    await expect.poll(numbers).toBe('0-0:1 0-1:2 1-0:4 1-1:3');

    // Pointer: drag the 4th number (bottom left) to the top of the list.
    await dragTo(page, list.locator('[data-order-handle="3"]'), list.locator('li').first());
    await expect.poll(numbers).toBe('0-0:2 0-1:3 1-0:1 1-1:4');
    // Keyboard: the top-left block (now 2nd) goes one later, twice; focus stays on its Later button.
    await page.getByRole('button', { name: 'Quilt row 1, column 1 later' }).focus();
    await page.keyboard.press('Enter');
    await expect.poll(numbers).toBe('0-0:3 0-1:2 1-0:1 1-1:4');
    expect(await page.evaluate(() => document.activeElement?.getAttribute('aria-label'))).toBe('Quilt row 1, column 1 later');
    await page.keyboard.press('Enter');
    await expect.poll(numbers).toBe('0-0:4 0-1:2 1-0:1 1-1:3');
    expect(await page.getByRole('button', { name: 'Quilt row 1, column 1 later' }).isDisabled()).toBe(true);
    // The map's buttons say it too.
    await page.getByRole('button', { name: /^Row 2, column 1: Riverbank half-square triangle; number 1 in the quilting order$/ }).waitFor();

    await page.getByRole('button', { name: 'Save quilt' }).click();
    await page.getByText(/^Saved, version \d+$/).waitFor();
    const saved = await quilter.client.get(`/api/quilts/${quiltId}`);
    expect(saved.body.quilt.quilt.order).toEqual({ kind: 'hand', cells: [{ row: 1, column: 0 }, { row: 0, column: 1 }, { row: 1, column: 1 }, { row: 0, column: 0 }] });
  });

  it('takes several borders, each with its width, and shows the finished size after each in eighths of an inch', async () => {
    const page = browser.page;
    await page.goto(`/quilts/${quiltId}`);
    await waitForIslands(page);
    const size = page.getByTestId('finished-size');
    // 2 × 2 blocks of 12 in, no sashing or border yet.
    await expect.poll(() => size.textContent()).toBe('24 × 24 in');
    await page.getByLabel('Sashing (in)').fill('1 1/2');
    await page.getByRole('button', { name: 'Add a border' }).click();
    await page.getByLabel('Border 1 (in)').fill('2 1/2');
    await page.getByRole('button', { name: 'Add a border' }).click();
    await page.getByLabel('Border 2 (in)').fill('4 1/8');
    // 2·12 + 1 1/2 = 25 1/2; + 2·2 1/2 = 30 1/2; + 2·4 1/8 = 38 3/4.
    await expect.poll(() => size.textContent()).toBe('38 3/4 × 38 3/4 in');
    expect(await page.getByTestId('size-after-border-1').textContent()).toBe('30 1/2 × 30 1/2 in');
    expect(await page.locator('[data-border]').count()).toBe(2);
    // Half-typed, the field says what it needs and the quilt keeps its last width.
    await page.getByLabel('Border 2 (in)').fill('4 1/');
    await page.getByText('Border 2 (in) must be a number or a fraction like 2 1/2.').waitFor();
    expect(await size.textContent()).toBe('38 3/4 × 38 3/4 in');
    await page.getByLabel('Border 2 (in)').fill('4');
    await page.getByRole('button', { name: 'Remove border 1' }).click();
    // 25 1/2 + 2·4 = 33 1/2; the 4 in border is now border 1.
    await expect.poll(() => size.textContent()).toBe('33 1/2 × 33 1/2 in');
    expect(await page.getByLabel('Border 1 (in)').inputValue()).toBe('4');
    await page.getByRole('button', { name: 'Add a border' }).click();
    await page.getByLabel('Border 2 (in)').fill('1/4');
    await page.getByRole('button', { name: 'Save quilt' }).click();
    await page.getByText(/^Saved, version \d+$/).waitFor();
    const saved = await quilter.client.get(`/api/quilts/${quiltId}`);
    expect(saved.body.quilt.quilt.borders).toEqual([4, 0.25]);
    expect(saved.body.quilt.quilt.sashing).toBe(1.5);
  });

  it('draws the planned chained route on the map, corner for corner as the plan lists it, and plays it on request', async () => {
    const page = browser.page;
    const now = await quilter.client.get(`/api/quilts/${quiltId}`);
    const nine = { designId: designIds.get('Heron Bend nine-patch'), rotation: 0, mirror: false };
    const put = await quilter.client.put(`/api/quilts/${quiltId}`, {
      baseVersion: now.body.quilt.version,
      quilt: { ...now.body.quilt.quilt, placements: [[nine, { ...nine, rotation: 90 }], [nine, nine]], order: { kind: 'serpentine' } },
    });
    expect(put.status, put.text).toBe(200);
    await page.goto(`/quilts/${quiltId}`);
    await waitForIslands(page);
    await page.getByRole('button', { name: 'Plan the route across the quilt' }).click();
    const overlay = page.getByTestId('chain-route');
    await overlay.waitFor({ timeout: 60_000 });

    // The plan's steps as the panel words them, against the drawing: 1.5 in sashing, borders 4 + 1/4 in, 12 in blocks,
    // so block (r, c) has its top left at (4.25 + 13.5·c, 4.25 + 13.5·r).
    const words = ['top left', 'top right', 'bottom right', 'bottom left'];
    const steps = (await page.getByTestId('quilt-route').locator('li').allTextContents()).map((t) => {
      const m = /^Row (\d+), column (\d+): start at the (top left|top right|bottom right|bottom left) corner, end at the (top left|top right|bottom right|bottom left)\b/.exec(t)!;
      return { row: Number(m[1]) - 1, column: Number(m[2]) - 1, entry: words.indexOf(m[3]!), exit: words.indexOf(m[4]!) };
    });
    // Serpentine: top row left to right, bottom row right to left.
    expect(steps.map((s) => `${s.row}${s.column}`)).toEqual(['00', '01', '11', '10']);
    const corner = (row: number, column: number, k: number): [number, number] => {
      const x = 4.25 + 13.5 * column;
      const y = 4.25 + 13.5 * row;
      return [[x, y], [x + 12, y], [x + 12, y + 12], [x, y + 12]][k] as [number, number];
    };
    const through = await overlay.locator('[data-through]').evaluateAll((els) => els.map((e) => (e.getAttribute('d') ?? '').match(/-?[\d.]+/g)!.map(Number)));
    expect(through).toHaveLength(4);
    through.forEach((d, i) => {
      const s = steps[i]!;
      expect([d[0], d[1]], `block ${i + 1} entry`).toEqual(corner(s.row, s.column, s.entry));
      expect([d[4], d[5]], `block ${i + 1} exit`).toEqual(corner(s.row, s.column, s.exit));
    });
    // Each drawn link runs from the last block's exit to the next block's entry.
    const links = await overlay.locator('[data-link]').evaluateAll((els) => els.map((e) => ({ step: Number(e.getAttribute('data-link')), d: (e.getAttribute('d') ?? '').match(/-?[\d.]+/g)!.map(Number) })));
    for (const l of links) {
      const prev = steps[l.step - 2]!;
      const next = steps[l.step - 1]!;
      expect(l.d.slice(0, 2)).toEqual(corner(prev.row, prev.column, prev.exit));
      expect(l.d.slice(-2)).toEqual(corner(next.row, next.column, next.entry));
    }
    // The link colour is the route's stitching colour from the one line-style table (Okabe–Ito blue).
    expect(await overlay.locator('[data-through="1"]').getAttribute('stroke')).toBe('#0072B2');

    // Played on request: the needle goes block by block and the replay ends on the last block.
    const caption = page.getByTestId('route-caption');
    await page.getByRole('button', { name: 'Play the route' }).click();
    await overlay.locator('[data-needle]').waitFor();
    await expect.poll(() => caption.textContent(), { timeout: 15_000 }).toMatch(/^Block 4 of 4: row 2, column 1/);
    await page.getByRole('button', { name: 'Play the route' }).waitFor({ timeout: 15_000 });

    // With reduced motion the needle never slides: every position seen is a block corner.
    await page.emulateMedia({ reducedMotion: 'reduce' });
    await page.getByRole('button', { name: 'Back to start' }).click();
    await page.getByRole('button', { name: 'Play the route' }).click();
    await expect.poll(() => caption.textContent()).toContain('Reduced motion');
    const corners = new Set(steps.flatMap((s) => [corner(s.row, s.column, s.entry), corner(s.row, s.column, s.exit)]).map((p) => p.join(',')));
    for (let k = 0; k < 12; k++) {
      const at = await overlay.locator('[data-needle]').evaluate((c) => `${Number(c.getAttribute('cx'))},${Number(c.getAttribute('cy'))}`);
      expect(corners.has(at), at).toBe(true);
      await page.waitForTimeout(150);
    }
    await page.emulateMedia({ reducedMotion: 'no-preference' });
    const pause = page.getByRole('button', { name: 'Pause' });
    if (await pause.isVisible()) await pause.click();

    for (const size of WIDTHS) {
      await page.setViewportSize(size);
      await overlay.waitFor();
      expect(await elementsWiderThanViewport(page), `${size.name}: wider than the viewport`).toEqual([]);
      expect(await seriousAxeFindings(page), size.name).toEqual([]);
      await screenshot(page, `quilt-route-map-${size.name}`);
    }
    await page.setViewportSize(WIDTHS[0]);
  });

  it('fits and passes axe at the three widths', async () => {
    const page = browser.page;
    await page.goto(`/quilts/${quiltId}`);
    await waitForIslands(page);
    await trayItem(page, 'Heron Bend nine-patch').waitFor();
    // The schedule: one block a month from a chosen day, in the quilting order (serpentine, set above).
    await page.getByLabel('First block on').fill('2027-01-31');
    await page.getByRole('button', { name: 'Save schedule' }).click();
    await page.getByText('Schedule saved.').waitFor();
    const dates = await page.getByTestId('schedule-table').locator('tbody tr').evaluateAll((rows) => rows.map((r) => r.querySelectorAll('td')[0]!.textContent + ' ' + r.querySelector('th')!.textContent!.replace(/:.*/, '')));
    // Serpentine over 2 × 2: top left, top right, bottom right, bottom left.
    expect(dates).toEqual(['1 Row 1, column 1', '2 Row 1, column 2', '3 Row 2, column 2', '4 Row 2, column 1']);
    // 31 January 2027 + 1 month → 28 February (2027 is not a leap year, Gregorian rule).
    expect(await page.getByTestId('schedule-table').locator('tbody tr').nth(1).locator('td').nth(1).textContent()).toMatch(/28 Feb 2027|Feb 28, 2027/);
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
