// The design endpoints' one way to the route engine: route check, planning, the check of a version just saved, and
// saved routes. The engine runs in the worker pool; its refusals (DesignProblem) and the pool's failures (time cap,
// busy) come back as values the endpoints turn into answers. Answers are the route contract's (shared/contract).
import type { Kysely } from 'kysely';
import { z } from 'zod';
import type { Database } from '@db/schema.ts';
import type { DesignProblem } from '@shared/graph/designProblem.ts';
import type { PlanSettings } from '@shared/route/planSettings.ts';
import { err, ok, type Result } from '@shared/result.ts';
import type { CheckResult } from '@shared/contract/check.ts';
import type { PlanResult } from '@shared/contract/plan.ts';
import { strokePathOf, summaryOf, summaryOfCheck } from '@shared/route/routeAnswers.ts';
import type { DesignPayload } from '../engine/engine.types.ts';
import { runEngine } from '../engine/enginePool.ts';
import type { PoolFailure } from '../engine/workerPool.ts';
import { setDesignSummary, upsertDesignRoute, type DesignRecordRow } from './design.repository.ts';
import { requestDesignDerive } from './designDerive.ts';

export type EngineFailure = { readonly kind: 'engine'; readonly failure: PoolFailure } | { readonly kind: 'problem'; readonly problem: DesignProblem };
/** Saving an own route can also fail on the route's shape (a zod error at paths `route.i.j`). */
export type OwnRouteFailure = EngineFailure | { readonly kind: 'invalid'; readonly error: z.ZodError };

/** The drawing the engine should use: a draft the request carried (validated JSON text) or the saved one. */
export function designPayloadOf(row: DesignRecordRow, draftText: string | null): DesignPayload {
  return { designText: draftText ?? row.data_json };
}

/** `signal`: the request's; a check whose client went away leaves the queue without running. */
export async function checkDesignOnServer(design: DesignPayload, account: string, signal?: AbortSignal): Promise<Result<CheckResult, EngineFailure>> {
  const r = await runEngine({ op: 'check', ...design }, { key: account, ...(signal ? { signal } : {}) });
  if (!r.ok) return err({ kind: 'engine', failure: r.error });
  return r.value.ok ? ok(r.value.value) : err({ kind: 'problem', problem: r.value.problem });
}

export async function planDesignOnServer(
  design: DesignPayload,
  account: string,
  settings?: PlanSettings,
  signal?: AbortSignal,
): Promise<Result<PlanResult, EngineFailure>> {
  const r = await runEngine({ op: 'plan', ...design, ...(settings ? { settings } : {}) }, { key: account, ...(signal ? { signal } : {}) });
  if (!r.ok) return err({ kind: 'engine', failure: r.error });
  return r.value.ok ? ok(r.value.value) : err({ kind: 'problem', problem: r.value.problem });
}

/** The check of a version just saved, and the row as it now stands (its figures written from that check, or pending). */
export interface SavedVersionCheck {
  readonly row: DesignRecordRow;
  readonly check: Result<CheckResult, EngineFailure>;
}

/**
 * Checks the version `row` that was just saved (its drawing as validated text) once, in the interactive lane, and
 * writes the designs table's figures from that check: the check's plan is the plan the figures come from, so no
 * second engine job runs. A drawing the engine refuses or cannot finish gets no figures (as designDerive.ts does);
 * when the pool is busy the figures are left to the background lane.
 */
export async function checkSavedVersion(db: Kysely<Database>, row: DesignRecordRow, designText: string, signal?: AbortSignal): Promise<SavedVersionCheck> {
  const check = await checkDesignOnServer({ designText }, row.owner_id, signal);
  const failure = check.ok ? null : check.error;
  if (failure?.kind === 'engine' && failure.failure.kind !== 'timeout' && failure.failure.kind !== 'failed') {
    requestDesignDerive(row);
    return { row, check };
  }
  const summary = check.ok ? summaryOfCheck(check.value) : null;
  const written = await setDesignSummary(db, row.id, row.version, summary);
  return { row: written ? { ...row, summary, summary_version: row.version } : row, check };
}

/** Keeps the planner's route for the design as saved at `row.version` (planned again here: never trusted from a client). */
export async function savePlannedRoute(db: Kysely<Database>, row: DesignRecordRow): Promise<Result<Awaited<ReturnType<typeof upsertDesignRoute>>, EngineFailure>> {
  const planned = await planDesignOnServer(designPayloadOf(row, null), row.owner_id);
  if (!planned.ok) return planned;
  const p = planned.value;
  return ok(await upsertDesignRoute(db, { designId: row.id, kind: 'planned', strokes: p.route.map(strokePathOf), summary: summaryOf(p), designVersion: row.version }));
}

/**
 * Keeps the quilter's own route (polylines in stitching order, as JSON text) for the design as saved at
 * `row.version`. The engine checks the route against the block like the design's lines (designSchema), then
 * measures it; strokes and figures are computed there, never taken from the client.
 */
export async function saveOwnRoute(db: Kysely<Database>, row: DesignRecordRow, routeText: string): Promise<Result<Awaited<ReturnType<typeof upsertDesignRoute>>, OwnRouteFailure>> {
  const r = await runEngine({ op: 'ownRoute', designText: row.data_json, routeText }, { key: row.owner_id });
  if (!r.ok) return err({ kind: 'engine', failure: r.error });
  if (!r.value.ok) {
    if ('invalid' in r.value) return err({ kind: 'invalid', error: new z.ZodError(r.value.invalid.map((i) => ({ ...i, path: [...i.path] })) as z.core.$ZodIssue[]) });
    return err({ kind: 'problem', problem: r.value.problem });
  }
  const { strokes, summary } = r.value.value;
  return ok(await upsertDesignRoute(db, { designId: row.id, kind: 'own', strokes, summary, designVersion: row.version }));
}
