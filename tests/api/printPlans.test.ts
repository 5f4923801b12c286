// Printed plans (GET …/plan.pdf for designs, lessons and quilts), read back with Debian's poppler-utils:
// pdftotext for the words, pdffonts for the embedded faces, pdfinfo for the paper, pdftoppm for the true-size check.
// Sources: Letter is 612 × 792 pt (8.5 × 11 in, ANSI/ASME Y14.1), A4 is 595.28 × 841.89 pt (210 × 297 mm, ISO 216),
// one PDF unit is 1/72 in (ISO 32000-1 §8.3.2.3); the step list and the budget are compared with what the shared
// walkthrough and thread-budget code give for the same saved route (the screens' own words).
import { quiltPlanAnswerSchema, quiltPlanJobAnswerSchema, quiltPlanQueuedSchema, type QuiltPlan } from '@shared/contract/quiltPlan.ts';
import { chainStepWords, chainSummaryWords } from '@shared/quilt/chainWords.ts';
import { execFileSync, spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { strokePathsSchema } from '@shared/contract/strokes.ts';
import { designSchema } from '@shared/design/design.schema.ts';
import { buildBlockSheet } from '@shared/print/blockSheet.ts';
import { createAccount, type TestAccount } from '../helpers/accounts.ts';
import type { TestClient } from '../helpers/client.ts';
import { closeTestDb } from '../helpers/db.ts';
import { testEnv } from '../helpers/env.ts';
import { buildWorld, type World } from './teachingWorld.ts';

const scratch = mkdtempSync(path.join(tmpdir(), 'threadway-pdf-'));
let n = 0;

interface PdfAnswer {
  status: number;
  headers: Headers;
  bytes: Buffer;
  file: string;
}

/** GET as the client's browser would, keeping the body as bytes (TestClient reads text). */
async function getPdf(client: TestClient, p: string): Promise<PdfAnswer> {
  const res = await fetch(new URL(p, testEnv.appUrl), { headers: { cookie: [...client.cookies].map(([k, v]) => `${k}=${v}`).join('; ') }, redirect: 'manual' });
  const bytes = Buffer.from(await res.arrayBuffer());
  const file = path.join(scratch, `plan-${++n}.pdf`);
  writeFileSync(file, bytes);
  return { status: res.status, headers: res.headers, bytes, file };
}

/** Runs a poppler tool; anything it reports on stderr ("Syntax Error: …", e.g. an unbalanced graphics state) fails the test. */
function poppler(tool: string, ...args: string[]): string {
  const r = spawnSync(`/usr/bin/${tool}`, args, { encoding: 'utf8', maxBuffer: 64 * 1024 * 1024 });
  if (r.status !== 0 || r.stderr.trim() !== '') throw new Error(`${tool} ${args.join(' ')}: exit ${r.status}, ${r.stderr.trim()}`);
  return r.stdout;
}
/** pdftotext's words with every run of white space (line wraps included) as one space. */
const words = (file: string): string => poppler('pdftotext', '-enc', 'UTF-8', file, '-').replace(/\s+/g, ' ');
const pages = (file: string): number => Number(/Pages:\s+(\d+)/.exec(poppler('pdfinfo', file))![1]);
const pageSize = (file: string): string => /Page size:\s+([^\n]+)/.exec(poppler('pdfinfo', file))![1]!.trim();

/**
 * The true-size check: page 1 rendered by pdftoppm at 100 DPI in grey, then the longest straight run of dark pixels
 * (< 160 of 255) along any row and any column. The block's outline and the quilting line across it are the longest
 * lines on the page, so at true size a 6 × 4 in block gives runs of 600 and 400 px.
 */
function longestDarkRuns(file: string): { horizontal: number; vertical: number } {
  const stem = path.join(scratch, `page-${++n}`);
  execFileSync('/usr/bin/pdftoppm', ['-r', '100', '-gray', '-f', '1', '-l', '1', '-singlefile', file, stem]);
  const pgm = readFileSync(`${stem}.pgm`);
  const header = /^P5\s+(\d+)\s+(\d+)\s+(\d+)\s/.exec(pgm.subarray(0, 40).toString('latin1'))!;
  const [width, height] = [Number(header[1]), Number(header[2])];
  const px = pgm.subarray(header[0].length);
  const dark = (x: number, y: number) => px[y * width + x]! < 160;
  let horizontal = 0;
  let vertical = 0;
  for (let y = 0; y < height; y++) {
    let run = 0;
    for (let x = 0; x < width; x++) horizontal = Math.max(horizontal, (run = dark(x, y) ? run + 1 : 0));
  }
  for (let x = 0; x < width; x++) {
    let run = 0;
    for (let y = 0; y < height; y++) vertical = Math.max(vertical, (run = dark(x, y) ? run + 1 : 0));
  }
  return { horizontal, vertical };
}

/** A block of `width` × `height` in: one seam down the middle, one quilting line across the middle and the seam quilted in the ditch. */
const blockOf = (width: number, height: number) => ({
  version: 1,
  units: 'in',
  width,
  height,
  seams: [[[width / 2, 0], [width / 2, height]]],
  lines: [[[0, height / 2], [width, height / 2]], [[width / 2, 0], [width / 2, height]]],
});

let owner: TestAccount;
let metric: TestAccount;
let stranger: TestAccount;
let smallId: string;
let bigId: string;
let world: World;

async function designWithSavedRoute(account: TestAccount, title: string, design: Record<string, unknown>): Promise<string> {
  const made = await account.client.post('/api/designs', { title, design });
  expect(made.status, made.text).toBe(201);
  const id: string = made.body.design.id;
  const saved = await account.client.put(`/api/designs/${id}/route`, { kind: 'planned', designVersion: 1 });
  expect(saved.status, saved.text).toBe(200);
  return id;
}

beforeAll(async () => {
  [owner, metric, stranger] = await Promise.all([createAccount({ displayName: 'Print owner' }), createAccount({ displayName: 'Metric printer' }), createAccount({ displayName: 'Print stranger' })]);
  expect((await metric.client.patch('/api/account', { units: 'cm' })).status).toBe(200);
  smallId = await designWithSavedRoute(owner, 'Plan test 6 × 4 Łąka', blockOf(6, 4));
  bigId = await designWithSavedRoute(owner, 'Big twelve', blockOf(12, 12));
  world = await buildWorld();
}, 120_000);
afterAll(closeTestDb);

describe('a design’s printed plan', () => {
  it('is a Letter PDF with the embedded Source Sans 3, a safe file name, the step list, the budget and the cautions', async () => {
    const pdf = await getPdf(owner.client, `/api/designs/${smallId}/plan.pdf`);
    expect(pdf.status, pdf.bytes.toString('utf8', 0, 300)).toBe(200);
    expect(pdf.headers.get('content-type')).toBe('application/pdf');
    expect(pdf.bytes.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    // The title's letters are kept (Ł, ą) in the UTF-8 name, the rest one hyphen; the ASCII fallback has no quotes.
    expect(pdf.headers.get('content-disposition')).toBe(`attachment; filename="Plan-test-6-4-__ka-plan.pdf"; filename*=UTF-8''${encodeURIComponent('Plan-test-6-4-Łąka-plan.pdf')}`);
    expect(pageSize(pdf.file)).toBe('612 x 792 pts (letter)');
    const fonts = poppler('pdffonts', pdf.file);
    expect(fonts).toMatch(/\+SourceSans3-Regular\s+CID TrueType\s+Identity-H\s+yes\s+yes\s+yes/);
    expect(fonts).toMatch(/\+SourceSans3-Bold\s+CID TrueType\s+Identity-H\s+yes\s+yes\s+yes/);
    expect(fonts).not.toMatch(/Helvetica|Times|Courier/);

    const text = words(pdf.file);
    // The title with its latin-ext letters survives extraction (set in the latin-ext face, run by run).
    expect(text).toContain('Plan test 6 × 4 Łąka');
    // The step list as the walkthrough words it for the saved route, every step in order.
    const design = designSchema.parse((await owner.client.get(`/api/designs/${smallId}`)).body.design.design);
    const strokes = strokePathsSchema.parse((await owner.client.get(`/api/designs/${smallId}/route`)).body.route.strokes);
    const sheet = buildBlockSheet({ title: 'x', design, route: strokes, viewerUnits: 'in' });
    expect(sheet.walkthrough.steps.length).toBeGreaterThan(2);
    let from = 0;
    for (const step of sheet.walkthrough.steps) {
      const line = `${step.index + 1}. ${step.title}${step.lengthText ? ` (${step.lengthText})` : ''}: ${step.instruction}`.replace(/\s+/g, ' ');
      const at = text.indexOf(line, from);
      expect(at, `step ${step.index + 1}: ${line}`).toBeGreaterThan(-1);
      from = at + line.length;
    }
    // The block's thread budget with the model's source named, as the route panel names it.
    expect(text).toContain('Thread budget for this block');
    expect(text).toContain(`Stitches ${sheet.budget.stitchCount.toLocaleString('en-US')}`);
    expect(text).toContain(`Bobbins ${sheet.budget.bobbins}`);
    expect(text).toContain('Thread model: lockstitch 301');
    expect(text).toContain('geometric derivation (ours)');
    // Cautions: the needle always, deferring to the manual.
    expect(text).toContain('Safety Needle: Keep your fingers clear of the needle');
    expect(text).toContain('your machine’s manual');
  });

  it('draws a block that fits at true size: a 6 × 4 in block measures 600 × 400 px at 100 DPI (pdftoppm)', async () => {
    const pdf = await getPdf(owner.client, `/api/designs/${smallId}/plan.pdf`);
    const runs = longestDarkRuns(pdf.file);
    // ±2 px is ±0.02 in: the outline's own width and anti-aliasing.
    expect(Math.abs(runs.horizontal - 600)).toBeLessThanOrEqual(2);
    expect(Math.abs(runs.vertical - 400)).toBeLessThanOrEqual(2);
    expect(words(pdf.file)).toContain('true size on Letter');
  });

  it('scales a block too big for the paper and says so, or tiles it at true size with labelled tiles and alignment marks', async () => {
    const one = await getPdf(owner.client, `/api/designs/${bigId}/plan.pdf`);
    expect(one.status).toBe(200);
    expect(words(one.file)).toMatch(/drawn at \d+ % to fit the page, NOT true size/);
    const tiled = await getPdf(owner.client, `/api/designs/${bigId}/plan.pdf?layout=tiles`);
    expect(tiled.status).toBe(200);
    const text = words(tiled.file);
    // 12 in = 864 pt on Letter's 540 × 668 pt tile area with 36 pt overlap: ⌈(864 − 36) / 504⌉ = 2 columns, ⌈828 / 632⌉ = 2 rows.
    expect(text).toContain('true size on 4 tiles (2 × 2)');
    for (const label of ['A1', 'A2', 'B1', 'B2']) expect(text).toContain(`tile ${label} of 4`);
    expect(text).toContain('Lay the crosses over the matching crosses');
    expect(pages(tiled.file)).toBeGreaterThanOrEqual(6);
    // A tile is true size: on tile A1 the quilting line across the middle runs from the block's left edge to the
    // tile's right edge, 540 pt = 7.5 in = 750 px at 100 DPI (pdftoppm), not shrunk.
    const tileFile = path.join(scratch, `tile-${++n}.pdf`);
    execFileSync('/usr/bin/pdfseparate', ['-f', '2', '-l', '2', tiled.file, tileFile]);
    expect(Math.abs(longestDarkRuns(tileFile).horizontal - 750)).toBeLessThanOrEqual(3);
  });

  it('answers bad input with a 4xx naming the field, and 404 to anyone but the owner', async () => {
    for (const q of ['?layout=huge', '?layout=page&layout=tiles', '?layout=']) {
      const res = await owner.client.get(`/api/designs/${smallId}/plan.pdf${q}`);
      expect(res.status, q).toBe(400);
      expect(Object.keys(res.body.error.fields)).toEqual(['layout']);
      expect(res.body.error.message).toMatch(/Layout must be/);
    }
    const extra = await owner.client.get(`/api/designs/${smallId}/plan.pdf?tiles=1`);
    expect(extra.status).toBe(400);
    expect(Object.keys(extra.body.error.fields)).toEqual(['tiles']);
    expect((await owner.client.get('/api/designs/not-a-uuid/plan.pdf')).status).toBe(404);
    expect((await stranger.client.get(`/api/designs/${smallId}/plan.pdf`)).status).toBe(404);
  });
});

describe('a centimetre quilter’s plan', () => {
  it('is A4 and shows centimetres and metres, and no inch or yard figure', async () => {
    const id = await designWithSavedRoute(metric, 'Metric block', blockOf(6, 4));
    const pdf = await getPdf(metric.client, `/api/designs/${id}/plan.pdf`);
    expect(pdf.status).toBe(200);
    expect(pageSize(pdf.file)).toBe('595.276 x 841.89 pts (A4)');
    const text = words(pdf.file);
    // 6 × 4 in = 15.24 × 10.16 cm, written to one decimal as the screens write sizes.
    expect(text).toContain('Block 15.2 × 10.2 cm');
    expect(text).toMatch(/Top thread [\d.]+ m/);
    expect(text).toContain('Stitches per centimetre');
    expect(text).not.toMatch(/\d\s*(in|yd)\b|\binch|Letter/);
    // A4's true size: 6 in is 600 px at 100 DPI whatever the paper.
    expect(Math.abs(longestDarkRuns(pdf.file).horizontal - 600)).toBeLessThanOrEqual(2);
  });
});

describe('a quilt’s printed plan', () => {
  it('has the quilt map with the order, the budget, the trim table and a page per placed design', async () => {
    // The budget waits for the designs' stored figures (written after the save); wait for them.
    for (let i = 0; i < 50; i++) {
      const list = await owner.client.get('/api/designs?pageSize=100');
      if (list.body.designs.every((d: { summary: unknown }) => d.summary !== null)) break;
      await new Promise((r) => setTimeout(r, 200));
    }
    const made = await owner.client.post('/api/quilts', {
      title: 'Printed pair',
      quilt: { version: 1, units: 'in', rows: 1, columns: 2, block: { width: 6, height: 4 }, sashing: 1, borders: [2], placements: [[{ designId: smallId }, { designId: smallId, rotation: 180 }]] },
    });
    expect(made.status, made.text).toBe(201);
    const pdf = await getPdf(owner.client, `/api/quilts/${made.body.quilt.id}/plan.pdf`);
    expect(pdf.status).toBe(200);
    expect(pdf.headers.get('content-disposition')).toContain('filename="Printed-pair-plan.pdf"');
    const text = words(pdf.file);
    // Finished size: 2 · 6 + 1 + 2 · 2 = 17 in wide, 4 + 2 · 2 = 8 in long (finishedSize.ts).
    expect(text).toContain('Quilt map · finished size 17 × 8 in · 1 × 2 blocks of 6 × 4 in · sashing 1 in · border 2 in');
    expect(text).toContain('turned 180°');
    expect(text).toContain('Numbers give the quilting order (row by row from the top left)');
    expect(text).toContain('Quilt budget');
    expect(text).toContain('Each block quilted on its own');
    expect(text).toContain('Quilt-as-you-go trim plan');
    expect(text).toContain('Row 1, column 2');
    expect(text).toContain('In this quilt at row 1, column 1; row 1, column 2, turned 180°');
    // Trimming means the rotary cutter caution as well as the needle's.
    expect(text).toContain('Rotary cutter: When trimming, cut away from yourself');
    expect((await stranger.client.get(`/api/quilts/${made.body.quilt.id}/plan.pdf`)).status).toBe(404);
    expect((await owner.client.get(`/api/quilts/${made.body.quilt.id}/plan.pdf?layout=x`)).status).toBe(400);
    // Printing makes no plan of its own: before the route across the quilt is planned the page says so.
    expect(text).toContain('Quilted in one piece: the route across the quilt');
    expect(text).toContain('Not planned yet');
  });

  it('prints the route across the quilt once it is planned: each block’s start and end corner, as the quilt page says', async () => {
    const made = await owner.client.post('/api/quilts', {
      title: 'Printed chain',
      quilt: { version: 1, units: 'in', rows: 1, columns: 2, block: { width: 6, height: 4 }, sashing: 1, placements: [[{ designId: smallId }, { designId: smallId, mirror: true }]] },
    });
    expect(made.status, made.text).toBe(201);
    const id = made.body.quilt.id as string;
    let plan: QuiltPlan | null = null;
    const asked = await owner.client.post(`/api/quilts/${id}/plan`);
    if (asked.status === 200) plan = quiltPlanAnswerSchema.parse(asked.body).plan;
    else {
      expect(asked.status, asked.text).toBe(202);
      const jobId = quiltPlanQueuedSchema.parse(asked.body).job.id;
      for (let i = 0; i < 300 && !plan; i++) {
        const polled = quiltPlanJobAnswerSchema.parse((await owner.client.get(`/api/quilts/${id}/plan-jobs/${jobId}`)).body);
        expect(polled.job.state).not.toBe('failed');
        plan = polled.plan;
        if (!plan) await new Promise((r) => setTimeout(r, 200));
      }
    }
    expect(plan, 'the planning worker finished').not.toBeNull();
    const text = words((await getPdf(owner.client, `/api/quilts/${id}/plan.pdf`)).file);
    expect(text).toContain('Quilted in one piece: the route across the quilt');
    expect(text).not.toContain('Not planned yet');
    expect(text).toContain(chainSummaryWords(plan!, 'in'));
    plan!.steps.forEach((_, i) => expect(text).toContain(`${i + 1}. ${chainStepWords(plan!, i, 'in')}`));
  });
});

describe('a lesson’s printed plan', () => {
  it('is for the enrolled student once released and the teacher, with the lesson’s step list', async () => {
    const pdf = await getPdf(world.student.client, `/api/lessons/${world.releasedLessonId}/plan.pdf`);
    expect(pdf.status).toBe(200);
    const text = words(pdf.file);
    expect(text).toContain('Lesson 1: the first line: Heron ribbon block');
    // The template's route is one 12 in line across the block (teachingWorld.ts).
    expect(text).toMatch(/\d+\. Stitch \(12 in\)/);
    expect(text).toContain('Start pass 1');
    expect(text).toContain('Thread budget for this block');
    expect((await getPdf(world.teacher.client, `/api/lessons/${world.releasedLessonId}/plan.pdf`)).status).toBe(200);
    expect((await world.student.client.get(`/api/lessons/${world.futureLessonId}/plan.pdf`)).status).toBe(404);
    expect((await world.otherStudent.client.get(`/api/lessons/${world.releasedLessonId}/plan.pdf`)).status).toBe(404);
  });
});
