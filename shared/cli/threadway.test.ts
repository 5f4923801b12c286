import { spawn } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

const ROOT = path.resolve(import.meta.dirname, '../..');
const dir = mkdtempSync(path.join(tmpdir(), 'threadway-cli-'));
const write = (name: string, body: unknown): string => {
  const file = path.join(dir, name);
  writeFileSync(file, typeof body === 'string' ? body : JSON.stringify(body));
  return file;
};
/** Spawns without blocking the test worker (a blocked worker misses vitest's RPC heartbeats on a busy machine). */
function spawnText(cmd: string, args: readonly string[]): Promise<{ status: number | null; stdout: string; stderr: string }> {
  return new Promise((resolve, reject) => {
    const child = spawn(cmd, args, { cwd: ROOT });
    let stdout = '';
    let stderr = '';
    child.stdout.on('data', (d: Buffer) => (stdout += d.toString()));
    child.stderr.on('data', (d: Buffer) => (stderr += d.toString()));
    child.on('error', reject);
    child.on('close', (status) => resolve({ status, stdout, stderr }));
  });
}
const run = (...args: string[]) => spawnText(path.join(ROOT, 'node_modules/.bin/tsx'), ['shared/cli/threadway.ts', ...args]);

// E10 of docs/engine.md §7.3 (exhaustive oracle): lines y = 4 and y = 8 across a 12 in block with edge
// travel; the open route (0,4) → (0,8) has travel 4 (total 28).
const e10 = { version: 1, units: 'in', width: 12, height: 12, seams: [], lines: [[[0, 4], [12, 4]], [[0, 8], [12, 8]]], start: [0, 4], end: [0, 8] };

describe('threadway CLI', () => {
  it('plan prints the planner figures and a continuous route', async () => {
    const r = await run('plan', write('e10.json', e10));
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out).toMatchObject({ pieces: 2, oddPoints: 4, passes: 1, stops: 0, optimal: true });
    expect(out.stitchLength).toBeCloseTo(24, 9);
    expect(out.travelLength).toBeCloseTo(4, 9);
    expect(out.edgeLength).toBeCloseTo(4, 9);
    expect(out.travelLowerBound).toBeCloseTo(4, 9);
    expect(out.route[0].points[0]).toEqual([0, 4]);
    const last = out.route[out.route.length - 1];
    expect(last.points[last.points.length - 1]).toEqual([0, 8]);
    for (let i = 1; i < out.route.length; i++) expect(out.route[i].points[0]).toEqual(out.route[i - 1].points.at(-1));
  });

  it('plan prints the proof and the stops-vs-travel table; --extra-stops plans with more passes', async () => {
    // Free ends: E10's lines joined by one 4 in edge run; with one more stop no travel is needed (two passes), each
    // pass starting and tying off at the block edge, under the binding (derived; exhaustive check in E10).
    const free = { ...e10, start: undefined, end: undefined };
    const r = await run('plan', write('free.json', free), '--extra-stops', '1', '--time-budget', '3000');
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out).toMatchObject({ passes: 2, stops: 1, optimal: true, gapPercent: 0, lowerBound: 0, travelLength: 0 });
    expect(out.settings).toEqual({ timeBudgetMs: 3000, extraStops: 1, hiddenEndAllowance: 0 });
    expect(out.stopsTable.map((row: { travelLength: number }) => row.travelLength)).toEqual([4, 0, 0, 0]);
    expect(out.threadEnds).toHaveLength(4);
    for (const end of out.threadEnds) expect(end).toMatchObject({ place: 'edge', reason: 'hidden' });
  });

  it('check measures the design’s own route, in centimetres too', async () => {
    const cm = (p: number[]) => p.map((v) => v * 2.54);
    const design = {
      ...e10,
      units: 'cm',
      width: 12 * 2.54,
      height: 12 * 2.54,
      lines: e10.lines.map((l) => l.map(cm)),
      start: undefined,
      end: undefined,
      route: [[[0, 4], [12, 4]], [[0, 8], [12, 8]]].map((l) => l.map(cm)),
    };
    const r = await run('check', write('own.json', design));
    expect(r.status).toBe(0);
    const out = JSON.parse(r.stdout);
    expect(out).toMatchObject({ passes: 2, stops: 1, pieces: 2, oddPoints: 4 });
    expect(out.stitchLength).toBeCloseTo(24 * 2.54, 9);
    expect(out.travelLength).toBe(0);
  });

  it('runs through npm run --silent threadway', async () => {
    const r = await spawnText('npm', ['run', '--silent', 'threadway', '--', 'plan', write('npm.json', e10)]);
    expect(r.status).toBe(0);
    expect(JSON.parse(r.stdout).passes).toBe(1);
  });

  it('rejects bad files with a message on stderr and exit code 2', async () => {
    const cases = [
      [['plan', write('bad.json', '{ not json')], /not valid JSON/],
      [['plan', write('schema.json', { ...e10, width: -1 })], /not a valid design/],
      [['plan', path.join(dir, 'missing.json')], /cannot read/],
      [['check', write('noroute.json', e10)], /no `route`/],
      [['frobnicate', 'x'], /usage/],
      [['plan', write('flags.json', e10), '--extra-stops', '7'], /extraStops: At most 3 extra stops/],
      [['plan', write('flags2.json', e10), '--time-budget', 'soon'], /usage/],
      [['plan', write('flags3.json', e10), '--hidden-end-allowance', '-1'], /hiddenEndAllowance: The allowance cannot be negative/],
    ] as const;
    const results = await Promise.all(cases.map(([args]) => run(...args)));
    results.forEach((r, i) => {
      expect(r.status).toBe(2);
      expect(r.stderr).toMatch(cases[i]![1]);
      expect(r.stdout).toBe('');
    });
  });
});
