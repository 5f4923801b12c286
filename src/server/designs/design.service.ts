// Rules for saving designs: every save bumps `version` and lands in the history (design_version);
// an update must name the version it was based on, and a stale one is refused with the current design
// (never a silent lost update). Figures for the designs table come from the engine pool when the design
// changes; a design the planner refuses or cannot finish in time is still saved, with no figures.
import type { Kysely } from 'kysely';
import type { Database, DesignRow } from '../../../db/schema.ts';
import type { Design } from '../../../shared/design/design.schema.ts';
import { buildDesignThumbnailSvg } from '../../../shared/export/designSvg.ts';
import { err, ok, type Result } from '../../../shared/result.ts';
import type { DesignSummary } from '../engine/engine.types.ts';
import {
  findDesignRoute,
  findDesignVersion,
  findOwnedDesign,
  insertDesign,
  insertDesignVersion,
  setDesignDeleted,
  updateDesignIfVersion,
  upsertDesignRoute,
} from './design.repository.ts';
import { storedDesign } from './designRecord.ts';
import type { UpdateDesignInput } from './designApi.schema.ts';

/** Computes the table figures for a design (the engine pool in the app); null when there are none. */
export type Summarize = (design: Design) => Promise<DesignSummary | null>;

export type SaveFailure = { readonly kind: 'not-found' } | { readonly kind: 'conflict'; readonly current: DesignRow };

const MAX_TITLE = 200;

export async function createDesign(
  db: Kysely<Database>,
  summarize: Summarize,
  ownerId: string,
  input: { title: string; notes: string; design: Design },
): Promise<DesignRow> {
  const summary = await summarize(input.design);
  return db.transaction().execute(async (trx) => {
    const row = await insertDesign(trx, { ownerId, ...input, data: input.design, thumbnailSvg: buildDesignThumbnailSvg(input.design), summary });
    await insertDesignVersion(trx, row);
    return row;
  });
}

/**
 * Saves new title/notes/design over `baseVersion`. The version test happens twice: early (no engine work for a
 * stale save) and in the UPDATE itself (a save that raced in between still loses nothing: it gets the conflict).
 */
export async function updateDesign(
  db: Kysely<Database>,
  summarize: Summarize,
  ownerId: string,
  id: string,
  input: UpdateDesignInput,
): Promise<Result<DesignRow, SaveFailure>> {
  const current = await findOwnedDesign(db, ownerId, id);
  if (!current) return err({ kind: 'not-found' });
  if (current.version !== input.baseVersion) return err({ kind: 'conflict', current });
  const design = input.design ?? storedDesign(current);
  const summary = input.design ? await summarize(design) : current.summary;
  return saveOver(db, ownerId, current, input.baseVersion, {
    title: input.title ?? current.title,
    notes: input.notes ?? current.notes,
    design,
    summary,
  });
}

/** Makes an old version the newest one (a new version with its title, notes and design). */
export async function restoreDesignVersion(
  db: Kysely<Database>,
  summarize: Summarize,
  ownerId: string,
  id: string,
  version: number,
  baseVersion: number,
): Promise<Result<DesignRow, SaveFailure>> {
  const current = await findOwnedDesign(db, ownerId, id);
  if (!current) return err({ kind: 'not-found' });
  const old = await findDesignVersion(db, id, version);
  if (!old) return err({ kind: 'not-found' });
  if (current.version !== baseVersion) return err({ kind: 'conflict', current });
  const design = storedDesign({ id, data: old.data });
  return saveOver(db, ownerId, current, baseVersion, { title: old.title, notes: old.notes, design, summary: await summarize(design) });
}

async function saveOver(
  db: Kysely<Database>,
  ownerId: string,
  current: DesignRow,
  baseVersion: number,
  next: { title: string; notes: string; design: Design; summary: unknown },
): Promise<Result<DesignRow, SaveFailure>> {
  return db.transaction().execute(async (trx) => {
    const row = await updateDesignIfVersion(trx, ownerId, current.id, baseVersion, {
      title: next.title,
      notes: next.notes,
      data: next.design,
      thumbnailSvg: buildDesignThumbnailSvg(next.design),
      summary: next.summary ?? null,
    });
    if (!row) {
      const now = await findOwnedDesign(trx, ownerId, current.id);
      return now ? err({ kind: 'conflict', current: now }) : err({ kind: 'not-found' });
    }
    await insertDesignVersion(trx, row);
    return ok(row);
  });
}

/** A new design (version 1) with the same drawing, titled "Copy of …"; a route that was current is copied too. */
export async function duplicateDesign(db: Kysely<Database>, ownerId: string, id: string): Promise<DesignRow | undefined> {
  const source = await findOwnedDesign(db, ownerId, id);
  if (!source) return undefined;
  const design = storedDesign(source);
  return db.transaction().execute(async (trx) => {
    const row = await insertDesign(trx, {
      ownerId,
      title: `Copy of ${source.title}`.slice(0, MAX_TITLE),
      notes: source.notes,
      data: design,
      thumbnailSvg: source.thumbnail_svg,
      summary: source.summary,
    });
    await insertDesignVersion(trx, row);
    const route = await findDesignRoute(trx, source.id);
    if (route && route.design_version === source.version) {
      await upsertDesignRoute(trx, { designId: row.id, kind: route.kind, strokes: route.strokes, summary: route.summary, designVersion: row.version });
    }
    return row;
  });
}

/** Soft delete (undo with restoreDesign). Undefined when there is no such live design. */
export async function deleteDesign(db: Kysely<Database>, ownerId: string, id: string): Promise<DesignRow | undefined> {
  const live = await findOwnedDesign(db, ownerId, id);
  if (!live) return undefined;
  return setDesignDeleted(db, ownerId, id, true);
}

/** Brings a soft-deleted design back (a live one is returned as it is). */
export async function restoreDesign(db: Kysely<Database>, ownerId: string, id: string): Promise<DesignRow | undefined> {
  return setDesignDeleted(db, ownerId, id, false);
}
