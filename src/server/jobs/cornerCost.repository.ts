// Queries on corner_cost: a design's corner-pair table, one row per design, design version and planner settings.
import { sql, type Kysely, type Transaction } from 'kysely';
import type { CornerCostRow, Database } from '@db/schema.ts';

export type Db = Kysely<Database> | Transaction<Database>;

/** The stored tables among these (design id, version) pairs for one settings key. */
export async function findCornerCosts(db: Db, designs: readonly { id: string; version: number }[], settingsKey: string): Promise<CornerCostRow[]> {
  if (designs.length === 0) return [];
  return db
    .selectFrom('corner_cost')
    .selectAll()
    .where('settings_key', '=', settingsKey)
    .where((eb) => eb.or(designs.map((d) => eb.and([eb('design_id', '=', d.id), eb('design_version', '=', d.version)]))))
    .execute();
}

/** Writes a design version's table (replacing an older answer for the same key: a refined pair only improves it). */
export async function upsertCornerCosts(db: Db, v: { designId: string; designVersion: number; settingsKey: string; pairsJson: string }): Promise<void> {
  await db
    .insertInto('corner_cost')
    .values({ design_id: v.designId, design_version: v.designVersion, settings_key: v.settingsKey, pairs: v.pairsJson })
    .onConflict((oc) => oc.columns(['design_id', 'design_version', 'settings_key']).doUpdateSet({ pairs: v.pairsJson, updated_at: sql<Date>`now()` }))
    .execute();
}
