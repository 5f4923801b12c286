import { z } from 'zod';
import { designSchema, type Design } from '@shared/design/design.schema.ts';

/**
 * Unsaved edits kept in the browser (localStorage) so nothing is lost when the network or the server
 * drops: written on every edit, removed once the server has the same version, re-sent on the next load.
 */
export interface Draft {
  /** The server version the edits were made on (sent as `baseVersion`). */
  readonly baseVersion: number;
  readonly title: string;
  readonly design: Design;
  /** When the draft was written (ms since epoch), to tell the quilter how old it is. */
  readonly writtenAt: number;
}

const draftSchema = z.object({
  baseVersion: z.number().int().nonnegative(),
  title: z.string().max(200),
  design: designSchema,
  writtenAt: z.number().finite(),
});

/** The minimal storage a draft store needs (window.localStorage fits; tests pass a Map-backed one). */
export interface KeyValueStore {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
  removeItem(key: string): void;
}

export function draftKey(designId: string): string {
  return `threadway:draft:${designId}`;
}

/** The stored draft, or null when there is none or it does not parse (a corrupt draft is removed). */
export function loadDraft(store: KeyValueStore, designId: string): Draft | null {
  const raw = store.getItem(draftKey(designId));
  if (raw === null) return null;
  let data: unknown;
  try {
    data = JSON.parse(raw);
  } catch {
    store.removeItem(draftKey(designId));
    return null;
  }
  const parsed = draftSchema.safeParse(data);
  if (!parsed.success) {
    store.removeItem(draftKey(designId));
    return null;
  }
  return parsed.data;
}

/** Writes the draft; false when storage refused it (full or disabled), so the UI can warn. */
export function saveDraft(store: KeyValueStore, designId: string, draft: Draft): boolean {
  try {
    store.setItem(draftKey(designId), JSON.stringify(draft));
    return true;
  } catch {
    return false;
  }
}

export function clearDraft(store: KeyValueStore, designId: string): void {
  store.removeItem(draftKey(designId));
}
