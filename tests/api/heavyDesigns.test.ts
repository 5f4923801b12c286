// Issue 10, defect 6: a design at the 200,000-point cap is parsed and validated off the request thread, and the
// designs list carries a thumbnail simplified to a few hundred points, not every point (it was 2.4 MB).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createAccount, type TestAccount } from '../helpers/accounts.ts';
import { closeTestDb, testDb } from '../helpers/db.ts';
import { seededRandom } from '@shared/seededRandom.ts';

type Pt = [number, number];
/** 2,000 freehand-like strokes of 100 points (seeded random walks, steps up to 0.2 in): 200,000 points. */
function capDesign(): Record<string, unknown> {
  const rand = seededRandom(11);
  const lines = Array.from({ length: 2_000 }, () => {
    let p: Pt = [0.5 + rand() * 11, 0.5 + rand() * 11];
    return Array.from({ length: 100 }, (): Pt => {
      p = [Math.min(11.9, Math.max(0.1, p[0] + (rand() - 0.5) * 0.4)), Math.min(11.9, Math.max(0.1, p[1] + (rand() - 0.5) * 0.4))];
      return [Math.round(p[0] * 1e4) / 1e4, Math.round(p[1] * 1e4) / 1e4];
    });
  });
  return { version: 1, units: 'in', width: 12, height: 12, seams: [], lines, edgeTravel: true };
}

let quilter: TestAccount;
let heavyId: string;
const heavy = capDesign();
beforeAll(async () => {
  quilter = await createAccount({ displayName: 'Dense Freehand Quilter' });
});
afterAll(closeTestDb);

describe('a design at the point cap', () => {
  it('is saved (201) and read back whole', async () => {
    const res = await quilter.client.post('/api/designs', { title: 'Stipple storm', design: heavy });
    expect(res.status, res.text.slice(0, 500)).toBe(201);
    heavyId = res.body.design.id;
    expect(res.body.design.design).toEqual(heavy);
    const read = await quilter.client.get(`/api/designs/${heavyId}`);
    expect(read.status).toBe(200);
    expect(read.body.design.design.lines).toHaveLength(2_000);
    expect(read.body.design.design).toEqual(heavy);
    const saved = await quilter.client.put(`/api/designs/${heavyId}`, { baseVersion: 1, title: 'Stipple storm 2', design: heavy });
    expect(saved.status).toBe(200);
    const version1 = await quilter.client.get(`/api/designs/${heavyId}/versions/1`);
    expect(version1.body.version.design.lines).toHaveLength(2_000);
  });

  it('shows in the designs list with a thumbnail of a few kilobytes (not every point)', async () => {
    const list = await quilter.client.get('/api/designs');
    expect(list.status).toBe(200);
    const row = list.body.designs.find((d: any) => d.id === heavyId);
    expect(row.thumbnailSvg).toMatch(/^<svg /);
    expect(row.thumbnailSvg.length).toBeLessThan(16 * 1024);
    expect(list.text.length).toBeLessThan(24 * 1024);
  });

  it('replaces an oversized thumbnail written before the budget: not sent, rebuilt in the background', async () => {
    const huge = `<svg xmlns="http://www.w3.org/2000/svg">${'<path d="M0 0L1 1"/>'.repeat(20_000)}</svg>`;
    await testDb().updateTable('design').set({ thumbnail_svg: huge }).where('id', '=', heavyId).execute();
    const first = await quilter.client.get('/api/designs');
    expect(first.body.designs.find((d: any) => d.id === heavyId).thumbnailSvg).toBeNull();
    expect(first.text.length).toBeLessThan(24 * 1024);
    const deadline = Date.now() + 60_000;
    let thumbnail: string | null = null;
    while (thumbnail === null && Date.now() < deadline) {
      await new Promise((r) => setTimeout(r, 200));
      thumbnail = (await quilter.client.get('/api/designs')).body.designs.find((d: any) => d.id === heavyId).thumbnailSvg;
    }
    expect(thumbnail).toMatch(/^<svg /);
    expect(thumbnail!.length).toBeLessThan(16 * 1024);
  });
});
