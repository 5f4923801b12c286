// Rows → the JSON the API sends. jsonb read back from Postgres is `unknown` until a schema accepts it: drawings
// are checked by the codec workers (designPayload.ts) and spliced in as text.
// Figures are different: they are derived data (the engine can always compute them again), so a summary or a
// saved route that fails its schema is logged and read as absent; one bad row never turns a list into a 500.
import type { z } from 'zod';
import type { DesignRouteRow, DesignRow } from '@db/schema.ts';
import { designSummarySchema, savedRouteSummarySchema, type DesignSummary } from '@shared/contract/figures.ts';
import type { CheckResult } from '@shared/contract/check.ts';
import type { DesignRecord, SavedRoute } from '@shared/contract/designs.ts';
import type { ProblemDetail } from '@shared/contract/errors.ts';
import { strokePathsSchema } from '@shared/contract/strokes.ts';
import type { DesignRecordRow, DesignVersionRecordRow } from './design.repository.ts';

/** The value when it fits the schema; otherwise null, and the bad row is logged (derived data only). */
function parseDerived<S extends z.ZodType>(schema: S, value: unknown, what: string): z.output<S> | null {
  if (value === null || value === undefined) return null;
  const parsed = schema.safeParse(value);
  if (parsed.success) return parsed.data;
  console.error(`[designs] stored ${what} fails its schema; read as absent: ${parsed.error.message}`);
  return null;
}

/** A design's table figures (`design.summary`), or null when there are none or they do not parse. */
export function storedSummary(row: { id: string; summary: unknown }): DesignSummary | null {
  return parseDerived(designSummarySchema, row.summary, `summary of design ${row.id}`);
}

/** Figures of the row's current version; null while pending or when the planner refused the design. */
export function currentSummaryOf(row: Pick<DesignRow, 'id' | 'summary' | 'summary_version' | 'version'>): DesignSummary | null {
  if (row.summary === null || row.summary_version !== row.version) return null;
  return storedSummary(row);
}

/**
 * DesignJson as JSON text, with the drawing spliced in as text: `designText` is canonical JSON that a schema
 * has accepted (designPayload.ts), so a heavy design is never parsed or re-serialised on the request thread.
 */
export function designJsonText(row: DesignRecordRow, designText: string): string {
  const meta: Omit<DesignRecord, 'design'> = {
    id: row.id,
    title: row.title,
    notes: row.notes,
    version: row.version,
    summary: currentSummaryOf(row),
    summaryPending: row.summary_version !== row.version,
    createdAt: row.created_at.toISOString(),
    updatedAt: row.updated_at.toISOString(),
  };
  return `{"design":${designText},${JSON.stringify(meta).slice(1)}`;
}

/**
 * The answer of a save with ?check=1 as JSON text (savedWithCheckAnswerSchema): the saved version (drawing spliced in
 * as in designJsonText) and its route check, or why there is none.
 */
export function savedWithCheckJsonText(row: DesignRecordRow, designText: string, check: CheckResult | null, checkError: ProblemDetail | null): string {
  return `{"design":${designJsonText(row, designText)},"check":${JSON.stringify(check)},"checkError":${JSON.stringify(checkError)}}`;
}

/** One saved version as JSON text (drawing spliced in as in designJsonText). */
export function designVersionJsonText(row: DesignVersionRecordRow, designText: string): string {
  const meta = { version: row.version, title: row.title, notes: row.notes, savedAt: row.saved_at.toISOString() };
  return `{"design":${designText},${JSON.stringify(meta).slice(1)}`;
}

/** The saved route as the API sends it; null (no saved route) when its strokes or figures do not parse. */
export function toSavedRouteJson(row: DesignRouteRow, currentVersion: number): SavedRoute | null {
  const strokes = parseDerived(strokePathsSchema, row.strokes, `route strokes of design ${row.design_id}`);
  const summary = parseDerived(savedRouteSummarySchema, row.summary, `route summary of design ${row.design_id}`);
  if (strokes === null || summary === null) return null;
  return {
    kind: row.kind,
    designVersion: row.design_version,
    current: row.design_version === currentVersion,
    strokes,
    summary,
    createdAt: row.created_at.toISOString(),
    updatedAt: row.updated_at.toISOString(),
  };
}
