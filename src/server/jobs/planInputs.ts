// What a whole-quilt plan depends on, written as keys: the planner settings its corner pairs are planned with
// (part of every corner_cost row's key) and the quilt's design versions (part of every job's key). App instances and
// planning workers both read the stored tables through here, so both see the same cache.
import { createHash } from 'node:crypto';
import { unitsSchema } from '@shared/design/design.schema.ts';
import { designCornerCostsSchema, type DesignCornerCosts } from '@shared/quilt/cornerCosts.ts';
import type { Quilt } from '@shared/quilt/quilt.schema.ts';
import type { PlanSettings } from '@shared/route/planSettings.ts';
import { findCornerCosts, upsertCornerCosts, type Db } from './cornerCost.repository.ts';
import type { CornerCostStore, RunDesign } from './quiltPlanRun.ts';
import { liveOwnedDesignShapes, liveOwnedDesignVersions } from '../quilts/quilt.repository.ts';

/**
 * Settings of every corner-pair plan of a whole-quilt plan. The exact search gets 100 ms a pair (the planner's
 * least): a pair it cannot prove in that time keeps its heuristic cost and its lower bound, and the answer says how
 * far from proven the quilt is (`lowerBound`). Chosen for the 10 s target of a cold 6 × 8 quilt on 2 cores.
 */
export const QUILT_JOB_SETTINGS: PlanSettings = { timeBudgetMs: 100, extraStops: 0, hiddenEndAllowance: 0 };
/** Prove the pairs the chain uses (docs/engine.md §11.3), not only the heuristic tables. */
export const QUILT_JOB_PROVES = true;
/**
 * Proving rounds start only within this many ms of a job's start (see runQuiltPlan `proveWithinMs`), so a cold 6 × 8
 * quilt answers in about 10 s on 2 cores (the last round finishes after it) with its lower bound; the pairs proved
 * stay stored, and every later plan over these designs uses them.
 */
export const QUILT_JOB_PROVE_WITHIN_MS = 8_000;
/** Bumped when what a stored table means changes (a new field, another way of planning pairs): old rows are then unused. */
const CORNER_COST_FORMAT = 1;

export function settingsKey(s: PlanSettings = QUILT_JOB_SETTINGS): string {
  return `f${CORNER_COST_FORMAT};t${s.timeBudgetMs};x${s.extraStops};h${s.hiddenEndAllowance};p${QUILT_JOB_PROVES ? 1 : 0}`;
}

/** The key of a job's settings: the tables' key and how long a job may prove (the same tables, another answer). */
function jobSettingsKey(): string {
  return `${settingsKey()};w${QUILT_JOB_PROVE_WITHIN_MS}`;
}

/** The key of a job's inputs: the settings and every placed design's version (a saved design makes a new plan). */
export function inputsKey(designs: readonly { id: string; version: number }[]): string {
  const versions = designs.map((d) => `${d.id}@${d.version}`).sort();
  return `${jobSettingsKey()};${createHash('sha256').update(versions.join(',')).digest('hex')}`;
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** The distinct design ids a quilt places (only uuids: anything else cannot name a design and is reported missing). */
export function placedDesignIds(quilt: Quilt): string[] {
  const ids = new Set<string>();
  for (const row of quilt.placements) for (const p of row) if (p && UUID.test(p.designId)) ids.add(p.designId);
  return [...ids];
}

/** The owner's live placed designs' versions: what a job's inputs key is made of (no drawing is read). */
export function placedDesignVersions(db: Db, ownerId: string, quilt: Quilt): Promise<{ id: string; version: number }[]> {
  return liveOwnedDesignVersions(db, ownerId, placedDesignIds(quilt));
}

/** The owner's live placed designs with their size and version (no drawing: enough to check fits and find tables). */
export async function placedDesignShapes(db: Db, ownerId: string, quilt: Quilt): Promise<Omit<RunDesign, 'designText'>[]> {
  const rows = await liveOwnedDesignShapes(db, ownerId, placedDesignIds(quilt));
  return rows.flatMap((r) => {
    const units = unitsSchema.safeParse(r.units);
    // A stored design without its units or size cannot be placed; planQuiltRoute then names its cell as missing.
    if (!units.success || !Number.isFinite(r.width) || !Number.isFinite(r.height)) return [];
    return [{ id: r.id, version: r.version, shape: { units: units.data, width: r.width, height: r.height } }];
  });
}

/** The corner-pair tables stored in PostgreSQL, behind the run's store interface. */
export function postgresCornerCostStore(db: Db, key = settingsKey()): CornerCostStore {
  return {
    load: async (designs) => {
      const rows = await findCornerCosts(db, designs, key);
      const tables = new Map<string, DesignCornerCosts>();
      for (const row of rows) {
        const parsed = designCornerCostsSchema.safeParse(row.pairs);
        // A row the schema refuses is planned again (and overwritten) rather than trusted.
        if (parsed.success) tables.set(row.design_id, parsed.data);
        else console.error(`[corner-cost] stored table for ${row.design_id}@${row.design_version} fails its schema; planning it again`);
      }
      return tables;
    },
    save: (designId, version, table) => upsertCornerCosts(db, { designId, designVersion: version, settingsKey: key, pairsJson: JSON.stringify(table) }),
  };
}
