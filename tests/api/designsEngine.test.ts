// Route check, planning, saved routes and SVG export through the API (engine in the server's worker pool).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createAccount, type TestAccount } from '../helpers/accounts.ts';
import { closeTestDb } from '../helpers/db.ts';
import { block, e9Grid } from './designFixtures.ts';

let ann: TestAccount;
beforeAll(async () => {
  ann = await createAccount({ displayName: 'Ann' });
});
afterAll(closeTestDb);

async function create(title: string, design: Record<string, unknown>): Promise<{ id: string; version: number }> {
  const res = await ann.client.post('/api/designs', { title, design });
  expect(res.status, res.text).toBe(201);
  return res.body.design;
}

describe('check and plan against worked example E9 (docs/engine.md §7.2)', () => {
  // E9: border + N vertical and N horizontal lines at s/2 + n·s on a 12 in block, all stitched; the odd points are the
  // 4N T-junctions on the border, spaced s apart around it, so the least retrace from (0,0) to (12,12) is 2N·s = 24
  // for every N (derived in docs/engine.md §7.2, checked with exact rationals and networkx).
  for (const n of [4, 12]) {
    it(`N = ${n}: one pass, ${4 * n} odd points, stitch ${48 + 24 * n} in, retrace 24 in, proven optimal`, async () => {
      const d = await create(`E9 grid N=${n}`, e9Grid(n));
      const check = await ann.client.post(`/api/designs/${d.id}/check`, {});
      expect(check.status, check.text).toBe(200);
      expect(check.body).toMatchObject({ designVersion: 1, draft: false });
      expect(check.body.check).toMatchObject({ pieces: 1, passesWithTravel: 1, onePassWithoutTravel: false, units: 'in' });
      expect(check.body.check.oddPoints.count).toBe(4 * n);
      expect(check.body.check.stitchLength).toBeCloseTo(48 + 24 * n, 9);
      expect(check.body.plan.retraceLength).toBeCloseTo(24, 9);
      expect(check.body.threadBudget.stitchCount).toBeGreaterThan(0);

      const plan = await ann.client.post(`/api/designs/${d.id}/plan`, {});
      expect(plan.status, plan.text).toBe(200);
      const p = plan.body.plan;
      expect(p).toMatchObject({ passes: 1, stops: 0, optimal: true, units: 'in' });
      expect(p.retraceLength).toBeCloseTo(24, 9);
      expect(p.travelLowerBound).toBeCloseTo(24, 9);
      expect(p.route[0].points[0]).toEqual([0, 0]);
      expect(p.route.at(-1).points.at(-1)).toEqual([12, 12]);
      const stitched = p.route.filter((s: any) => s.kind === 'stitch').reduce((sum: number, s: any) => sum + s.length, 0);
      expect(stitched).toBeCloseTo(48 + 24 * n, 9);
    });
  }

  it('checks an unsaved draft sent in the body without saving it', async () => {
    const d = await create('Draft check', block());
    const check = await ann.client.post(`/api/designs/${d.id}/check`, { design: e9Grid(4) });
    expect(check.status).toBe(200);
    expect(check.body).toMatchObject({ draft: true, designVersion: 1 });
    expect(check.body.check.oddPoints.count).toBe(16);
    expect((await ann.client.get(`/api/designs/${d.id}`)).body.design.design.lines).toHaveLength(2);
  });

  it('names the problem when the engine cannot check the design (no quilting lines)', async () => {
    const d = await create('Nothing to quilt', block({ lines: [] }));
    const check = await ann.client.post(`/api/designs/${d.id}/check`, {});
    expect(check.status).toBe(400);
    expect(check.body.error.fields['design.lines']).toMatch(/no quilting lines/);
  });

  it('plans with settings: the proof, the stops-vs-travel table and where each thread end is', async () => {
    // Two lines across the block, joined by 6 in of ditch or edge travel; one extra stop makes them two passes with
    // no travel (worked by hand; the engine's own tests check such answers against CBC).
    const d = await create('Two lines', block());
    const plan = await ann.client.post(`/api/designs/${d.id}/plan`, { settings: { extraStops: 1, timeBudgetMs: 3000 } });
    expect(plan.status, plan.text).toBe(200);
    const p = plan.body.plan;
    expect(p).toMatchObject({ passes: 2, stops: 1, optimal: true, gapPercent: 0, lowerBound: 0, travelLength: 0 });
    expect(p.settings).toEqual({ extraStops: 1, timeBudgetMs: 3000, hiddenEndAllowance: 0 });
    expect(p.stopsTable.map((r: { travelLength: number }) => Number(r.travelLength.toFixed(9)))).toEqual([6, 0, 0, 0]);
    expect(p.threadEnds).toHaveLength(4);
    for (const end of p.threadEnds) expect(end.place).toBe('edge');
  });

  it('refuses bad plan settings with 400, naming each field', async () => {
    const d = await create('Bad settings', block());
    const bad = await ann.client.post(`/api/designs/${d.id}/plan`, { settings: { extraStops: 9, timeBudgetMs: 50, colour: 'red' } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['settings.extraStops']).toMatch(/At most 3 extra stops/);
    expect(bad.body.error.fields['settings.timeBudgetMs']).toMatch(/at least 100 ms/);
  });

  it('serves concurrent checks (the pool runs them in worker threads)', async () => {
    const d = await create('Concurrent', e9Grid(12));
    // One running and ENGINE_MAX_QUEUED_PER_ACCOUNT (4) waiting: all answered (a sixth could get 429).
    const answers = await Promise.all(Array.from({ length: 5 }, () => ann.client.post(`/api/designs/${d.id}/check`, {})));
    for (const a of answers) {
      expect(a.status).toBe(200);
      expect(a.body.plan.retraceLength).toBeCloseTo(24, 9);
    }
  });
});

describe('saved routes', () => {
  it('keeps the planned route for the current version, marks it out of date after an edit, and refuses a stale version', async () => {
    const d = await create('Route keeper', e9Grid(4));
    const saved = await ann.client.put(`/api/designs/${d.id}/route`, { kind: 'planned', designVersion: 1 });
    expect(saved.status, saved.text).toBe(200);
    expect(saved.body.route).toMatchObject({ kind: 'planned', designVersion: 1, current: true, summary: { passes: 1, optimal: true } });
    expect(saved.body.route.summary.retraceLength).toBeCloseTo(24, 9);
    const again = await ann.client.get(`/api/designs/${d.id}/route`);
    expect(again.body.route.strokes).toEqual(saved.body.route.strokes);

    await ann.client.put(`/api/designs/${d.id}`, { baseVersion: 1, title: 'Route keeper (renamed)' });
    expect((await ann.client.get(`/api/designs/${d.id}/route`)).body.route.current).toBe(false);
    const stale = await ann.client.put(`/api/designs/${d.id}/route`, { kind: 'planned', designVersion: 1 });
    expect(stale.status).toBe(409);
    expect(stale.body.design.version).toBe(2);
  });
});

describe("the quilter's own route", () => {
  // block(): seam x = 6 and quilting lines y = 3 and y = 9 across a 12 in block (edge travel on).
  const along = [[[0, 3], [12, 3]], [[12, 3], [12, 9]], [[12, 9], [0, 9]]];
  const jump = [[[0, 3], [12, 3]], [[0, 9], [12, 9]]];

  it('checks a drawn route with the draft: one pass with 6 in of edge travel; a jump is a new pass (a stop)', async () => {
    const d = await create('Own route', block());
    const one = await ann.client.post(`/api/designs/${d.id}/check`, { design: block({ route: along }) });
    expect(one.status, one.text).toBe(200);
    expect(one.body.ownRoute).toMatchObject({ passes: 1, stops: 0, unstitched: { count: 0 } });
    expect(one.body.ownRoute.stitchLength).toBeCloseTo(24, 9);
    expect(one.body.ownRoute.edgeLength).toBeCloseTo(6, 9);
    // The planner's least travel for the same lines is also 6 in (4 odd points, 2 free ends, the others 6 in apart).
    expect(one.body.plan.travelLength).toBeCloseTo(6, 9);
    const two = await ann.client.post(`/api/designs/${d.id}/check`, { design: block({ route: jump }) });
    expect(two.body.ownRoute).toMatchObject({ passes: 2, stops: 1, travelLength: 0 });
    const none = await ann.client.post(`/api/designs/${d.id}/check`, {});
    expect(none.body.ownRoute).toBeNull();
  });

  it('saves the own route with strokes computed on the server, and refuses a malformed stroke naming it', async () => {
    const d = await create('Own route saved', block());
    const saved = await ann.client.put(`/api/designs/${d.id}/route`, { kind: 'own', designVersion: 1, route: along });
    expect(saved.status, saved.text).toBe(200);
    expect(saved.body.route).toMatchObject({ kind: 'own', current: true, summary: { passes: 1, stops: 0, optimal: null } });
    expect(saved.body.route.strokes.map((s: any) => [s.pass, s.kind])).toEqual([[1, 'stitch'], [1, 'edge'], [1, 'stitch']]);
    const bad = await ann.client.put(`/api/designs/${d.id}/route`, { kind: 'own', designVersion: 1, route: [[[1, 1]], [[0, 0], [900, 0]]] });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields['route.0']).toMatch(/at least 2 points/);
    expect(bad.body.error.fields['route.1.1']).toMatch(/far outside/);
  });
});

describe('gap check', () => {
  it('finds the widest empty spot: a 6 in square between the two lines and the seam holds a circle of diameter 6', async () => {
    // Analytic: the largest circle inside a 6 × 6 in square has radius 3 (the other regions are 3 in strips).
    const d = await create('Gap', block({ thread: { battingSpacing: 4 } }));
    const check = await ann.client.post(`/api/designs/${d.id}/check`, {});
    // The search is certified: the true radius lies in [radius, radius + precision].
    const { radius, precision } = check.body.gap;
    expect(radius).toBeLessThanOrEqual(3 + 1e-9);
    expect(radius + precision).toBeGreaterThanOrEqual(3 - 1e-9);
    expect(precision).toBeLessThan(0.05);
    expect(check.body.gap).toMatchObject({ limit: 4, status: 'over' });
  });
});

describe('SVG export', () => {
  it('exports the design at true size with its current route: one path per stroke, travel dashed, pass numbers', async () => {
    const d = await create('Export: E9 & friends', e9Grid(4));
    await ann.client.put(`/api/designs/${d.id}/route`, { kind: 'planned', designVersion: 1 });
    const res = await ann.client.get(`/api/designs/${d.id}/export.svg`);
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toContain('image/svg+xml');
    expect(res.headers.get('content-disposition')).toContain('Export-E9-friends.svg');
    expect(res.text).toMatch(/^<svg [^>]*width="[\d.]+in"/);
    expect(res.text).toContain('<title>Export: E9 &amp; friends</title>');
    const route = (await ann.client.get(`/api/designs/${d.id}/route`)).body.route;
    expect(res.text.match(/data-pass="/g)).toHaveLength(route.strokes.length);
    expect(res.text).toContain('class="retrace"');
    expect(res.text).toContain('Block 12 × 12 in (30.5 × 30.5 cm)');
  });
});
