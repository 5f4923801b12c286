// The one place a new design is written: the design row, its history entry (design_version 1) and, when one
// comes with it, its saved route, in one transaction. Creating, duplicating, copying a template version and the
// demo seed all come through here, so a new design always has the same three parts.
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { inTransaction } from '../transaction.repository.ts';
import { insertDesign, insertDesignVersion, upsertDesignRoute, type DesignRecordRow, type NewDesignValues, type RouteValues } from './design.repository.ts';

/** A route saved with the new design: it belongs to version 1. */
export type NewDesignRoute = Omit<RouteValues, 'designId' | 'designVersion'>;

export interface NewDesign extends NewDesignValues {
  /** The route to keep with the design, or null when it has none yet. */
  readonly route: NewDesignRoute | null;
}

/** Writes design + design_version 1 (+ design_route) together; the new design's row. */
export async function writeNewDesign(db: Kysely<Database>, d: NewDesign): Promise<DesignRecordRow> {
  const { route, ...values } = d;
  return inTransaction(db, async (trx) => {
    const row = await insertDesign(trx, values);
    await insertDesignVersion(trx, row.id);
    if (route) await upsertDesignRoute(trx, { designId: row.id, kind: route.kind, strokes: route.strokes, summary: route.summary, designVersion: row.version });
    return row;
  });
}
