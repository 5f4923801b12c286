/**
 * `npm run bench`: writing the demo guild's quilt-along quilt as a printed plan (scripts/seed/guildQuilt.ts, 4 × 3 of
 * Marigold's two 12 in lesson blocks, 1 in sashing, 3 in border), as GET /api/quilts/:id/plan.pdf writes it
 * (assembleQuiltPlan + renderPlanPdf), for an inch and a centimetre viewer, one page per block and true-size tiles.
 * Routes are planned once up front (the endpoint reads the saved ones). Prints a Markdown table: PDF size and pages,
 * median time of the whole document, and the longest stretch the event loop was held between two yields (the
 * endpoint yields with setImmediate after each part). Medians of BENCH_RUNS runs (default 5) after 2 warm-ups.
 */
import { performance } from 'node:perf_hooks';
import { loadHighsSolver } from '@shared/route/exact/highsSolver.ts';
import { planDesign } from '@shared/route/planDesign.ts';
import { strokePathOf, summaryOf } from '@shared/route/routeAnswers.ts';
import type { Units } from '@shared/design/design.schema.ts';
import type { PrintLayout } from '@shared/print/blockPlacement.ts';
import { renderPlanPdf } from '../src/server/print/planPdf.ts';
import { assembleQuiltPlan, type QuiltBlockInput } from '../src/server/print/quiltPrintPlan.ts';
import { marigoldDrawings } from '../scripts/seed/guildDrawings.ts';
import { demoQuilt, DEMO_QUILT_TITLE } from '../scripts/seed/guildQuilt.ts';

const RUNS = Number(process.env.BENCH_RUNS ?? 5);
const WARM_UP = 2;

const solver = await loadHighsSolver();
const { ditch, echoes } = marigoldDrawings();
const designs = new Map<string, QuiltBlockInput>();
for (const [id, d] of [['ditch', ditch], ['echoes', echoes]] as const) {
  const plan = planDesign(d.design, { solver, clock: () => performance.now() });
  if (!plan.ok) throw new Error(`bench/printPlan: ${d.title} cannot be planned`);
  designs.set(id, { title: d.title, notes: d.notes, design: d.design, route: plan.value.route.map(strokePathOf), threadEnds: plan.value.threadEnds, note: 'Route: the planner’s route.', summary: summaryOf(plan.value) });
}
const quilt = demoQuilt('ditch', 'echoes');

const median = (xs: number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
const rows: string[] = [];
for (const units of ['in', 'cm'] as Units[]) {
  for (const layout of ['page', 'tiles'] as PrintLayout[]) {
    const totals: number[] = [];
    const held: number[] = [];
    let bytes = 0;
    let pages = 0;
    for (let i = 0; i < WARM_UP + RUNS; i++) {
      const start = performance.now();
      let mark = start;
      let longest = 0;
      const plan = assembleQuiltPlan(DEMO_QUILT_TITLE, quilt, designs, units, layout);
      const pdf = await renderPlanPdf(plan, {
        between: async () => {
          longest = Math.max(longest, performance.now() - mark);
          await new Promise((r) => setImmediate(r));
          mark = performance.now();
        },
      });
      longest = Math.max(longest, performance.now() - mark);
      if (i >= WARM_UP) {
        totals.push(performance.now() - start);
        held.push(longest);
      }
      bytes = pdf.length;
      pages = (pdf.toString('latin1').match(/\/Type \/Page\b/g) ?? []).length;
    }
    rows.push(`| ${units} | ${layout} | ${pages} | ${(bytes / 1024).toFixed(0)} KiB | ${median(totals).toFixed(0)} ms | ${median(held).toFixed(0)} ms |`);
  }
}
console.log(`\n### Printed plan of the demo quilt (“${DEMO_QUILT_TITLE}”, 4 × 3 blocks, 2 distinct designs)\n`);
console.log('| viewer | layout | pages | PDF size | whole document (median) | longest hold of the event loop (median) |');
console.log('| --- | --- | --- | --- | --- | --- |');
for (const r of rows) console.log(r);
