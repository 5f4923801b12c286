import { sql, type Kysely } from 'kysely';
import { z } from 'zod';

// Frozen in time: never import app code here, never edit after merge.
// Until this date, copying a template whose route was the teacher's own stitching order wrote that route's
// figures (no travel lower bound, `optimal: null`) into design.summary, which holds the planner's figures and is
// read with a schema that refuses them: the copier's designs list and the copy itself answered 500. The planner's
// figures cannot be computed in SQL, so such summaries become null ("no figures yet"; the next save fills them),
// and the copied route, which was always stored as 'planned', gets its true kind 'own'.

// The shape design.summary had to have on 2026-12-04 (server/designs/designRecord.ts at that date).
const figure = z.number().finite();
const summaryShape = z.object({
  passes: figure,
  stops: figure,
  pieces: figure,
  oddPoints: figure,
  stitchLength: figure,
  travelLength: figure,
  retraceLength: figure,
  ditchLength: figure,
  edgeLength: figure,
  travelLowerBound: figure,
  optimal: z.boolean(),
  units: z.enum(['in', 'cm']),
  thread: z.object({ totalYards: figure, topYards: figure, bobbinYards: figure, bobbins: figure, stitches: figure, minutes: figure }),
});

const BATCH = 500;

export async function up(db: Kysely<any>): Promise<void> {
  // Keyset pages over every design with figures, so a large table is never read whole.
  let after = '00000000-0000-0000-0000-000000000000';
  for (;;) {
    const rows: { id: string; summary: unknown }[] = await db
      .selectFrom('design')
      .select(['id', 'summary'])
      .where('summary', 'is not', null)
      .where('id', '>', after)
      .orderBy('id')
      .limit(BATCH)
      .execute();
    if (rows.length === 0) break;
    const broken = rows.filter((r) => !summaryShape.safeParse(r.summary).success).map((r) => r.id);
    if (broken.length > 0) await db.updateTable('design').set({ summary: null }).where('id', 'in', broken).execute();
    after = rows[rows.length - 1]!.id;
  }
  // Planned routes always carry the planner's proof status (true or false); only an own order has null.
  await db
    .updateTable('design_route')
    .set({ kind: 'own' })
    .where('kind', '=', 'planned')
    .where(sql<boolean>`summary->'optimal' = 'null'::jsonb`)
    .execute();
}

export async function down(): Promise<void> {
  // A repair of data: the broken figures are not worth bringing back.
}
