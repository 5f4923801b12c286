// A quilt's printed plan from what the service read (no database here, so the benchmark writes the demo quilt's
// plan exactly as the endpoint does): the map, trim table and budget in the viewer's units, and one block sheet per
// distinct placed design with where it sits in the quilt.
import type { Design, Units } from '@shared/design/design.schema.ts';
import type { DesignSummary } from '@shared/contract/figures.ts';
import type { PrintLayout } from '@shared/print/blockPlacement.ts';
import { buildBlockSheet, type BlockSheet } from '@shared/print/blockSheet.ts';
import { convertQuilt } from '@shared/quilt/convertQuilt.ts';
import type { Quilt } from '@shared/quilt/quilt.schema.ts';
import { budgetOf, trimTableOf } from '@shared/quilt/quiltFigures.ts';
import type { ThreadEnd } from '@shared/route/threadEnds.ts';
import type { RouteStrokeInput } from '@shared/walkthrough/walkthrough.types.ts';
import type { QuiltPlan } from '@shared/contract/quiltPlan.ts';
import type { PrintPlan } from './planPdf.ts';

/** One placed design as the plan needs it: its drawing, route (design units) and stored figures. */
export interface QuiltBlockInput {
  readonly title: string;
  readonly notes: string;
  readonly design: Design;
  readonly route: readonly RouteStrokeInput[];
  readonly threadEnds: readonly Pick<ThreadEnd, 'pass' | 'end' | 'place' | 'reason'>[];
  /** Where the route comes from, in words. */
  readonly note: string;
  /** The design's stored figures for its current version (the quilt budget waits for every block's). */
  readonly summary: DesignSummary | null;
}

/** The distinct designs placed in a quilt, in reading order. */
export function placedDesignIds(quilt: Quilt): string[] {
  const ids: string[] = [];
  for (const cells of quilt.placements) for (const p of cells) if (p && !ids.includes(p.designId)) ids.push(p.designId);
  return ids;
}

/** `chain`: the quilt's chained route (quilted in one piece) when it is known, printed after the budget. */
export function assembleQuiltPlan(title: string, stored: Quilt, designs: ReadonlyMap<string, QuiltBlockInput>, units: Units, layout: PrintLayout, chain: QuiltPlan | null = null): PrintPlan {
  const quilt = convertQuilt(stored, units);
  const { budget, missing } = budgetOf(quilt, new Map([...designs].map(([id, d]) => [id, d.summary])));
  const blocks: BlockSheet[] = [];
  for (const id of placedDesignIds(stored)) {
    const d = designs.get(id);
    if (!d) continue;
    const cells: string[] = [];
    stored.placements.forEach((cs, r) =>
      cs.forEach((p, c) => {
        if (p?.designId === id) cells.push(`row ${r + 1}, column ${c + 1}${p.mirror ? ', mirrored' : ''}${p.rotation ? `, turned ${p.rotation}°` : ''}`);
      }),
    );
    blocks.push(
      buildBlockSheet({
        title: d.title,
        design: d.design,
        route: d.route,
        threadEnds: d.threadEnds,
        viewerUnits: units,
        // The quilt is trimmed block by block (quilt-as-you-go), so the rotary cutter caution applies.
        texts: [d.title, d.notes, 'trim each block after quilting'],
        notes: [`In this quilt at ${cells.join('; ')}. Drawn as designed: turn or mirror the block as the quilt map says.`, d.note],
      }),
    );
  }
  return {
    title,
    viewerUnits: units,
    layout,
    quilt: { title, quilt, designTitles: new Map([...designs].map(([id, d]) => [id, d.title])), trim: trimTableOf(quilt), budget, missing, chain },
    blocks,
  };
}
