// Marigold's quilt-along top (invented demo content): the two lesson blocks of her Tuesday quilt-along set 4 rows × 3,
// ditch and echoed blades alternating like a checkerboard, 1 in sashing and a 3 in border, quilted row by row from
// the top left, its schedule her class's dated lessons. Stored through the app's own quilt service; idempotent by
// owner + title.
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { quiltSchema, type Quilt } from '@shared/quilt/quilt.schema.ts';
import { findLiveDesignIdByTitle } from '@server/designs/design.repository.ts';
import { createQuilt, listQuilts } from '@server/quilts/quilt.service.ts';
import { findTaughtClassIdByTitle } from '@server/classes/class.repository.ts';
import { tieUnscheduledQuiltToClass } from '@server/quilts/quiltSchedule.repository.ts';
import { CLASS_TITLE } from './guildClass.ts';
import { marigoldDrawings } from './guildDrawings.ts';

export const DEMO_QUILT_TITLE = 'Tuesday quilt-along top';

/** The quilt map, given the ids of the ditch block and the echoes block. Pure, so a test can plan it. */
export function demoQuilt(ditchId: string, echoesId: string): Quilt {
  const place = (row: number, column: number) => ({ designId: (row + column) % 2 === 0 ? ditchId : echoesId, rotation: 0 as const, mirror: false });
  return quiltSchema.parse({
    version: 1,
    units: 'in',
    rows: 4,
    columns: 3,
    block: { width: 12, height: 12 },
    placements: [0, 1, 2, 3].map((row) => [0, 1, 2].map((column) => place(row, column))),
    sashing: 1,
    borders: [3],
    order: { kind: 'rows' },
  });
}

/**
 * 1 when the quilt was added, 0 when it was there already. Either way a quilt with no schedule yet is tied to
 * Marigold's Tuesday quilt-along, so its schedule is her dated lessons, one block each (a database seeded before
 * schedules existed gets the tie too).
 */
export async function seedGuildQuilt(db: Kysely<Database>, teacherId: string): Promise<number> {
  const classId = await findTaughtClassIdByTitle(db, teacherId, CLASS_TITLE);
  const existing = (await listQuilts(db, teacherId)).find((q) => q.title === DEMO_QUILT_TITLE);
  if (existing) {
    if (classId) await tieUnscheduledQuiltToClass(db, teacherId, existing.id, classId);
    return 0;
  }
  const drawings = marigoldDrawings();
  const ditchId = await findLiveDesignIdByTitle(db, teacherId, drawings.ditch.title);
  const echoesId = await findLiveDesignIdByTitle(db, teacherId, drawings.echoes.title);
  if (!ditchId || !echoesId) throw new Error('scripts/seed/guildQuilt: the lesson blocks must be seeded first (guildClass.ts)');
  const created = await createQuilt(db, teacherId, { title: DEMO_QUILT_TITLE, quilt: demoQuilt(ditchId, echoesId) });
  if (!created.ok) throw new Error(`scripts/seed/guildQuilt: ${JSON.stringify(created.error)}`);
  if (classId) await tieUnscheduledQuiltToClass(db, teacherId, created.value.id, classId);
  return 1;
}
