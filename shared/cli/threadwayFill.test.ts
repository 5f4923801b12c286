import { spawn } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { designSchema } from '../design/design.schema.ts';
import type { Point } from '../geometry/point.ts';
import { buildPiecedLayout, type PiecedLayoutId } from '../layouts/piecedLayouts.ts';
import { fillDesign, type Fills } from '../motifs/fillDesign.ts';
import { MOTIFS, type MotifParamsInput } from '../motifs/motifs.ts';
import { isInsideOrOn } from '../motifs/polygon.ts';
import { planDesign } from '../route/planDesign.ts';

const ROOT = path.resolve(import.meta.dirname, '../..');
const dir = mkdtempSync(path.join(tmpdir(), 'threadway-fill-'));
const write = (name: string, body: unknown): string => {
  const file = path.join(dir, name);
  writeFileSync(file, typeof body === 'string' ? body : JSON.stringify(body));
  return file;
};
function run(...args: string[]): Promise<{ status: number | null; stdout: string; stderr: string }> {
  return new Promise((resolve, reject) => {
    const child = spawn(path.join(ROOT, 'node_modules/.bin/tsx'), ['shared/cli/threadway.ts', ...args], { cwd: ROOT });
    let stdout = '';
    let stderr = '';
    child.stdout.on('data', (d: Buffer) => (stdout += d.toString()));
    child.stderr.on('data', (d: Buffer) => (stderr += d.toString()));
    child.on('error', reject);
    child.on('close', (status) => resolve({ status, stdout, stderr }));
  });
}

/** One motif of every kind the panel offers, in inches. */
const MOTIF_IN: Record<string, MotifParamsInput> = {
  'straight-lines': { kind: 'straight-lines', spacing: 0.5, angle: 45 },
  crosshatch: { kind: 'crosshatch', spacing: 0.75, angle: 0, crossAngle: 90 },
  echo: { kind: 'echo', spacing: 0.375 },
  pebbles: { kind: 'pebbles', minRadius: 0.2, maxRadius: 0.45, overlap: 0.02 },
  'ribbon-candy': { kind: 'ribbon-candy', pitch: 0.75 },
  arches: { kind: 'arches', archWidth: 1, rowSpacing: 0.75 },
};

function block(id: PiecedLayoutId) {
  const layout = buildPiecedLayout(id, 12, 12);
  const design = designSchema.parse({ version: 1, units: 'in', width: 12, height: 12, seams: layout.seams, lines: [] });
  // Reading order worked out here from the layout's own patches (by centre: rows top to bottom, then left to right).
  const centre = (poly: readonly Point[]): Point => [poly.reduce((s, p) => s + p[0], 0) / poly.length, poly.reduce((s, p) => s + p[1], 0) / poly.length];
  const area = (poly: readonly Point[]) => poly.reduce((s, p, i) => s + p[0] * poly[(i + 1) % poly.length]![1] - poly[(i + 1) % poly.length]![0] * p[1], 0) / 2;
  const areaCentre = (poly: readonly Point[]): Point => {
    const a = area(poly);
    let [cx, cy] = [0, 0];
    poly.forEach((p, i) => {
      const q = poly[(i + 1) % poly.length]!;
      const f = p[0] * q[1] - q[0] * p[1];
      cx += (p[0] + q[0]) * f;
      cy += (p[1] + q[1]) * f;
    });
    return a === 0 ? centre(poly) : [cx / (6 * a), cy / (6 * a)];
  };
  const patches = [...layout.patches].sort((a, b) => {
    const [ca, cb] = [areaCentre(a.polygon), areaCentre(b.polygon)];
    return Math.abs(ca[1] - cb[1]) > 1e-6 ? ca[1] - cb[1] : ca[0] - cb[0];
  });
  return { design, patches };
}

describe('threadway fill', () => {
  it.each(['nine-patch', 'square-in-a-square', 'flying-geese'] as const)('fills a %s block with every motif kind, one line group', async (id) => {
    const { design, patches } = block(id);
    const fills: Fills['fills'] = MOTIFS.map((m, i) => ({ patch: i % patches.length, motif: MOTIF_IN[m.kind]! })) as Fills['fills'];
    const r = await run('fill', write(`${id}.json`, design), write(`${id}.fills.json`, { fills }));
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    const out = designSchema.parse(JSON.parse(r.stdout));
    expect(out.seams).toEqual(design.seams);
    // Each fill's lines lie in the patch of that number (the layout's own polygon) and none is missing.
    let total = 0;
    for (const fill of fills) {
      const one = fillDesign(design, { fills: [fill] });
      if (!one.ok) throw new Error(one.error.message);
      expect(one.value.lines.length).toBeGreaterThan(0);
      const polygon = patches[fill.patch as number]!.polygon;
      one.value.lines.forEach((line) => line.forEach((p) => expect(isInsideOrOn(p, polygon, 1e-6)).toBe(true)));
      total += one.value.lines.length;
    }
    expect(out.lines.length).toBe(total);
    // Joined motifs: the filled block plans to one pass (seams in the ditch, edge travel on).
    const plan = planDesign(out);
    expect(plan.ok && plan.value.passes).toBe(1);
  }, 120_000);

  it('fills every patch with "all"', async () => {
    const { design, patches } = block('nine-patch');
    const r = await run('fill', write('all.json', design), write('all.fills.json', { fills: [{ patch: 'all', motif: MOTIF_IN['echo'] }] }));
    expect(r.status).toBe(0);
    const out = designSchema.parse(JSON.parse(r.stdout));
    // One spiral per patch: nine lines, each starting on its own patch's outline.
    expect(out.lines.length).toBe(patches.length);
    expect(planDesign(out).ok).toBe(true);
  }, 120_000);

  it('rejects bad fills files with exit code 2, naming the field', async () => {
    const design = write('nine.json', block('nine-patch').design);
    const cases = [
      [{ fill: [] }, /fills: /],
      [{ fills: [{ patch: 9, motif: MOTIF_IN['echo'] }] }, /fills\.0\.patch: there is no patch 9/],
      [{ fills: [{ patch: 'some', motif: MOTIF_IN['echo'] }] }, /fills\.0\.patch/],
      [{ fills: [{ patch: 0, motif: { kind: 'echo', spacing: -1 } }] }, /fills\.0\.motif\.spacing/],
      [{ fills: [{ patch: 0, motif: { kind: 'spirals' } }] }, /fills\.0\.motif\.kind/],
      ['{ nope', /not valid JSON/],
    ] as const;
    const results = await Promise.all(cases.map(([body], i) => run('fill', design, write(`bad${i}.json`, body))));
    results.forEach((r, i) => {
      expect(r.status).toBe(2);
      expect(r.stderr).toMatch(cases[i]![1]);
      expect(r.stdout).toBe('');
    });
    const usage = await run('fill', design);
    expect(usage.status).toBe(2);
    expect(usage.stderr).toMatch(/usage/);
  }, 180_000);
});
