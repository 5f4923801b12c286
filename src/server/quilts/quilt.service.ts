// Rules for quilts: a quilt belongs to one account; its map is checked by the shared quilt schema before it is
// stored and again when it is read back; every placement must name one of the owner's own live designs (a design
// that is someone else's, deleted or unknown is refused naming the placement, never revealed); a save names the
// version it was based on, and a stale one is refused with the current quilt (never a silent lost update).
import type { Kysely } from 'kysely';
import type { Database, QuiltRow } from '@db/schema.ts';
import { quiltSchema, type Quilt } from '@shared/quilt/quilt.schema.ts';
import type { QuiltListItem, QuiltRecord } from '@shared/contract/quilts.ts';
import { err, ok, type Result } from '@shared/result.ts';
import { inTransaction } from '../transaction.repository.ts';
import { findOwnedQuilt, insertQuilt, liveOwnedDesignIds, listOwnedQuilts, softDeleteQuilt, updateQuiltIfVersion } from './quilt.repository.ts';

/** Most quilts the list returns (no paging yet: a quilter makes a handful). */
export const QUILT_LIST_LIMIT = 200;

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

export type QuiltSaveFailure =
  | { readonly kind: 'not-found' }
  | { readonly kind: 'conflict'; readonly current: QuiltRow }
  /** Field path → message, e.g. `quilt.placements.0.1.designId`. */
  | { readonly kind: 'bad-placements'; readonly fields: Readonly<Record<string, string>> };

/** The stored map of a row. A stored quilt the schema refuses is a bug (it was checked on the way in): throws. */
export function quiltOf(row: QuiltRow): Quilt {
  const parsed = quiltSchema.safeParse(row.data);
  if (!parsed.success) throw new Error(`server/quilts/quilt.service: stored quilt ${row.id} fails its schema: ${parsed.error.message}`);
  return parsed.data;
}

export function toQuiltRecord(row: QuiltRow): QuiltRecord {
  return { id: row.id, title: row.title, version: row.version, quilt: quiltOf(row), createdAt: row.created_at.toISOString(), updatedAt: row.updated_at.toISOString() };
}

export function toQuiltListItem(row: QuiltRow): QuiltListItem {
  const q = quiltOf(row);
  const placed = q.placements.reduce((n, r) => n + r.filter((c) => c !== null).length, 0);
  return { id: row.id, title: row.title, version: row.version, units: q.units, rows: q.rows, columns: q.columns, placed, updatedAt: row.updated_at.toISOString() };
}

/** Placements whose design is not one of the owner's live designs, as field errors (empty when all are fine). */
export async function badPlacements(db: Kysely<Database>, ownerId: string, quilt: Quilt): Promise<Record<string, string>> {
  const ids = new Set<string>();
  for (const row of quilt.placements) for (const p of row) if (p && UUID.test(p.designId)) ids.add(p.designId.toLowerCase());
  const mine = await liveOwnedDesignIds(db, ownerId, [...ids]);
  const fields: Record<string, string> = Object.create(null);
  quilt.placements.forEach((row, r) =>
    row.forEach((p, c) => {
      if (p && !mine.has(p.designId.toLowerCase())) {
        fields[`quilt.placements.${r}.${c}.designId`] = `Row ${r + 1}, column ${c + 1}: no design of yours has this id (it may have been deleted). Pick one of your designs.`;
      }
    }),
  );
  return fields;
}

export async function listQuilts(db: Kysely<Database>, ownerId: string): Promise<QuiltListItem[]> {
  return (await listOwnedQuilts(db, ownerId, QUILT_LIST_LIMIT)).map(toQuiltListItem);
}

export async function createQuilt(db: Kysely<Database>, ownerId: string, input: { title: string; quilt: Quilt }): Promise<Result<QuiltRow, QuiltSaveFailure>> {
  const bad = await badPlacements(db, ownerId, input.quilt);
  if (Object.keys(bad).length > 0) return err({ kind: 'bad-placements', fields: bad });
  return ok(await insertQuilt(db, { ownerId, title: input.title, dataJson: JSON.stringify(input.quilt) }));
}

/** Saves over `baseVersion`; the version test is in the UPDATE itself, so a save that raced loses nothing. */
export async function updateQuilt(
  db: Kysely<Database>,
  ownerId: string,
  id: string,
  input: { baseVersion: number; title?: string | undefined; quilt?: Quilt | undefined },
): Promise<Result<QuiltRow, QuiltSaveFailure>> {
  if (input.quilt) {
    const bad = await badPlacements(db, ownerId, input.quilt);
    if (Object.keys(bad).length > 0) return err({ kind: 'bad-placements', fields: bad });
  }
  return inTransaction(db, async (trx) => {
    const current = await findOwnedQuilt(trx, ownerId, id);
    if (!current) return err({ kind: 'not-found' });
    if (current.version !== input.baseVersion) return err({ kind: 'conflict', current });
    const row = await updateQuiltIfVersion(trx, ownerId, id, input.baseVersion, {
      title: input.title ?? current.title,
      dataJson: input.quilt ? JSON.stringify(input.quilt) : JSON.stringify(current.data),
    });
    if (row) return ok(row);
    const now = await findOwnedQuilt(trx, ownerId, id);
    return now ? err({ kind: 'conflict', current: now }) : err({ kind: 'not-found' });
  });
}

export async function findQuilt(db: Kysely<Database>, ownerId: string, id: string): Promise<QuiltRow | undefined> {
  if (!UUID.test(id)) return undefined;
  return findOwnedQuilt(db, ownerId, id);
}

/** Soft delete; undefined when there is no such live quilt. */
export async function deleteQuilt(db: Kysely<Database>, ownerId: string, id: string): Promise<QuiltRow | undefined> {
  if (!UUID.test(id)) return undefined;
  return softDeleteQuilt(db, ownerId, id);
}
