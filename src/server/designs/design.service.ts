// Rules for saving designs: every save bumps `version` and lands in the history (design_version);
// an update must name the version it was based on, and a stale one is refused with the current design
// (never a silent lost update). Saves never wait for the route engine: a new drawing is stored with its
// thumbnail and no figures, and designDerive.ts computes the figures afterwards (the caller asks for it).
// Drawings travel as validated JSON text (designBody.ts, designPayload.ts), never parsed here.
import type { Kysely } from 'kysely';
import type { Database } from '@db/schema.ts';
import { err, ok, type Result } from '@shared/result.ts';
import { inTransaction } from '../transaction.repository.ts';
import {
  findDesignRoute,
  findOwnedDesign,
  insertDesignVersion,
  setDesignDeleted,
  updateDesignIfVersion,
  type DesignChanges,
  type DesignRecordRow,
} from './design.repository.ts';
import { writeNewDesign } from './designWriter.ts';
import type { AcceptedDesign } from './designBody.ts';
import { storedSummary, toSavedRouteJson } from './designRecord.ts';

export type SaveFailure = { readonly kind: 'not-found' } | { readonly kind: 'conflict'; readonly current: DesignRecordRow };

/** A validated drawing ready to store: JSON text and its list thumbnail. */
export interface Drawing {
  readonly text: string;
  readonly thumbnailSvg: string;
}

const MAX_TITLE = 200;

export async function createDesign(db: Kysely<Database>, ownerId: string, input: { title: string; notes: string; design: Drawing }): Promise<DesignRecordRow> {
  return writeNewDesign(db, {
    ownerId,
    title: input.title,
    notes: input.notes,
    dataJson: input.design.text,
    thumbnailSvg: input.design.thumbnailSvg,
    summary: null,
    summaryCurrent: false,
    copiedFromTemplateVersionId: null,
    route: null,
  });
}

/** The drawing of an accepted create/update body (those always come with a thumbnail). */
export function drawingOf(design: AcceptedDesign): Drawing {
  if (design.thumbnailSvg === null) throw new Error('server/designs/design.service: a saved drawing needs its thumbnail');
  return { text: design.text, thumbnailSvg: design.thumbnailSvg };
}

/**
 * Saves new title/notes/drawing over `baseVersion`. The version test happens in the UPDATE itself, so a save
 * that raced with another loses nothing: it gets the conflict.
 */
export async function updateDesign(
  db: Kysely<Database>,
  ownerId: string,
  current: DesignRecordRow,
  input: { baseVersion: number; title?: string; notes?: string; design?: Drawing },
): Promise<Result<DesignRecordRow, SaveFailure>> {
  if (current.version !== input.baseVersion) return err({ kind: 'conflict', current });
  return saveOver(db, ownerId, current.id, input.baseVersion, {
    title: input.title ?? current.title,
    notes: input.notes ?? current.notes,
    drawing: input.design ? { dataJson: input.design.text, thumbnailSvg: input.design.thumbnailSvg } : null,
  });
}

/** Makes an old version the newest one (a new version with its title, notes and drawing). */
export async function restoreDesignVersion(
  db: Kysely<Database>,
  ownerId: string,
  current: DesignRecordRow,
  old: { title: string; notes: string; design: Drawing },
  baseVersion: number,
): Promise<Result<DesignRecordRow, SaveFailure>> {
  if (current.version !== baseVersion) return err({ kind: 'conflict', current });
  return saveOver(db, ownerId, current.id, baseVersion, { title: old.title, notes: old.notes, drawing: { dataJson: old.design.text, thumbnailSvg: old.design.thumbnailSvg } });
}

async function saveOver(db: Kysely<Database>, ownerId: string, id: string, baseVersion: number, next: DesignChanges): Promise<Result<DesignRecordRow, SaveFailure>> {
  return inTransaction(db, async (trx) => {
    const row = await updateDesignIfVersion(trx, ownerId, id, baseVersion, next);
    if (!row) {
      const now = await findOwnedDesign(trx, ownerId, id);
      return now ? err({ kind: 'conflict', current: now }) : err({ kind: 'not-found' });
    }
    await insertDesignVersion(trx, row.id);
    return ok(row);
  });
}

/** A new design (version 1) with the same drawing, titled "Copy of …"; a route that was current is copied too. */
export async function duplicateDesign(db: Kysely<Database>, ownerId: string, id: string): Promise<DesignRecordRow | undefined> {
  const source = await findOwnedDesign(db, ownerId, id);
  if (!source) return undefined;
  const summaryCurrent = source.summary_version === source.version;
  const found = await findDesignRoute(db, source.id);
  const route = found ? toSavedRouteJson(found, source.version) : null;
  return writeNewDesign(db, {
    ownerId,
    title: `Copy of ${source.title}`.slice(0, MAX_TITLE),
    notes: source.notes,
    dataJson: source.data_json,
    thumbnailSvg: source.thumbnail_svg,
    summary: summaryCurrent ? storedSummary(source) : null,
    summaryCurrent,
    copiedFromTemplateVersionId: null,
    route: route?.current ? { kind: route.kind, strokes: route.strokes, summary: route.summary } : null,
  });
}

/** Soft delete (undo with restoreDesign). Undefined when there is no such live design. */
export async function deleteDesign(db: Kysely<Database>, ownerId: string, id: string): Promise<DesignRecordRow | undefined> {
  const live = await findOwnedDesign(db, ownerId, id);
  if (!live) return undefined;
  return setDesignDeleted(db, ownerId, id, true);
}

/** Brings a soft-deleted design back (a live one is returned as it is). */
export async function restoreDesign(db: Kysely<Database>, ownerId: string, id: string): Promise<DesignRecordRow | undefined> {
  return setDesignDeleted(db, ownerId, id, false);
}
