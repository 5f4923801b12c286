// Gathers what a printed plan shows — a design, a lesson's template version or a quilt with its blocks — and hands it
// to planPdf.ts. Each block's route is the saved one when it belongs to the current version (the route contract's
// strokes); a design without one is planned in the engine's worker pool for the printout (not saved), as the
// workbench's "Plan" would. Everything is redrawn in the viewer's units.
import type { Kysely } from 'kysely';
import type { Database, QuiltRow } from '@db/schema.ts';
import { designSchema, type Design, type Units } from '@shared/design/design.schema.ts';
import type { PrintLayout } from '@shared/print/blockPlacement.ts';
import { buildBlockSheet } from '@shared/print/blockSheet.ts';
import type { TemplateVersionJson } from '@shared/contract/templates.ts';
import { err, ok, type Result } from '@shared/result.ts';
import { parseWalkthroughInput } from '@shared/walkthrough/walkthroughInput.ts';
import type { RouteStrokeInput } from '@shared/walkthrough/walkthrough.types.ts';
import type { ThreadEnd } from '@shared/route/threadEnds.ts';
import { findDesignRoute, findOwnedDesign, type DesignRecordRow } from '../designs/design.repository.ts';
import { toSavedRouteJson, currentSummaryOf } from '../designs/designRecord.ts';
import { designPayloadOf, planDesignOnServer, type EngineFailure } from '../designs/designRoute.service.ts';
import { quiltOf } from '../quilts/quilt.service.ts';
import { storedQuiltPlan } from '../quilts/quiltPlan.service.ts';
import type { PrintPlan } from './planPdf.ts';
import { assembleQuiltPlan, placedDesignIds, type QuiltBlockInput } from './quiltPrintPlan.ts';

/** Why a plan cannot be printed: the engine failed or refused a drawing, or a lesson's saved route cannot be read. */
export type PrintFailure = EngineFailure | { readonly kind: 'unreadable'; readonly message: string };

interface RouteOfDesign {
  readonly route: readonly RouteStrokeInput[];
  readonly threadEnds: readonly Pick<ThreadEnd, 'pass' | 'end' | 'place' | 'reason'>[];
  readonly note: string;
}

/** The saved route of the current version, else the planner's route (in the worker pool, interactive lane). */
async function routeOf(db: Kysely<Database>, row: DesignRecordRow, account: string, signal?: AbortSignal): Promise<Result<RouteOfDesign, EngineFailure>> {
  const saved = await findDesignRoute(db, row.id);
  const route = saved ? toSavedRouteJson(saved, row.version) : null;
  if (route?.current) {
    return ok({ route: route.strokes, threadEnds: [], note: route.kind === 'own' ? 'Route: your own stitching order, as saved.' : 'Route: the planner’s route, as saved.' });
  }
  const planned = await planDesignOnServer(designPayloadOf(row, null), account, undefined, signal);
  if (!planned.ok) return planned;
  const why = route ? `the saved route was made for version ${route.designVersion}` : 'no route was saved';
  return ok({ route: planned.value.route, threadEnds: planned.value.threadEnds, note: `Route: planned for this printout (${why}; this is version ${row.version}). Keep it on the workbench to save it.` });
}

/** A stored drawing: stored designs passed the schema on the way in; one that fails now is a bug and throws. */
function storedDesign(row: DesignRecordRow): Design {
  return designSchema.parse(JSON.parse(row.data_json));
}

/** The printed plan of one of the viewer's designs. */
export async function designPrintPlan(db: Kysely<Database>, row: DesignRecordRow, viewer: { id: string; units: Units }, layout: PrintLayout, signal?: AbortSignal): Promise<Result<PrintPlan, PrintFailure>> {
  const r = await routeOf(db, row, viewer.id, signal);
  if (!r.ok) return r;
  const sheet = buildBlockSheet({
    title: row.title,
    design: storedDesign(row),
    route: r.value.route,
    threadEnds: r.value.threadEnds,
    viewerUnits: viewer.units,
    texts: [row.title, row.notes],
    notes: [r.value.note],
  });
  return ok({ title: row.title, viewerUnits: viewer.units, layout, blocks: [sheet] });
}

/** The printed plan of a lesson: its template version's block and saved route, cautions chosen from the notes too. */
export function lessonPrintPlan(lesson: { title: string; notesMd: string }, version: TemplateVersionJson, viewerUnits: Units, layout: PrintLayout): Result<PrintPlan, PrintFailure> {
  const input = parseWalkthroughInput(version.design, version.route);
  if (!input.ok) return err({ kind: 'unreadable', message: input.error });
  const sheet = buildBlockSheet({
    title: `${lesson.title}: ${version.title}`,
    design: input.value.design,
    route: input.value.route,
    viewerUnits,
    texts: [lesson.title, lesson.notesMd, version.title, version.description],
    notes: [`From the template “${version.title}”, version ${version.version}.`],
  });
  return ok({ title: lesson.title, viewerUnits, layout, blocks: [sheet] });
}

/**
 * The printed plan of a quilt: the map, trim plan and budget (in the viewer's units), then one block sheet per
 * distinct placed design, saying where it sits. A placed design deleted since the quilt was saved is listed as
 * missing on the map and has no block page.
 */
export async function quiltPrintPlan(db: Kysely<Database>, row: QuiltRow, viewer: { id: string; units: Units }, layout: PrintLayout, signal?: AbortSignal): Promise<Result<PrintPlan, PrintFailure>> {
  const stored = quiltOf(row);
  const designs = new Map<string, QuiltBlockInput>();
  for (const id of placedDesignIds(stored)) {
    const d = await findOwnedDesign(db, viewer.id, id);
    if (!d) continue;
    const r = await routeOf(db, d, viewer.id, signal);
    if (!r.ok) return r;
    designs.set(id, { title: d.title, notes: d.notes, design: storedDesign(d), summary: currentSummaryOf(d), ...r.value });
  }
  // The chained route when it is known without planning (planned before, or every block's corner costs stored).
  const chain = await storedQuiltPlan(db, viewer.id, { id: row.id, version: row.version, map: stored });
  return ok(assembleQuiltPlan(row.title, stored, designs, viewer.units, layout, chain));
}
