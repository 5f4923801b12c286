import { assertNever } from '@shared/assertNever.ts';

/**
 * Where the design stands against the server. Edits are numbered (`revision`); the server has
 * everything up to `savedRevision`. Nothing here touches the network: useAutosave drives it.
 */
export type SaveStatus =
  | { readonly kind: 'saved' }
  | { readonly kind: 'unsaved' }
  | { readonly kind: 'saving' }
  /** The server could not be reached or failed; edits are kept locally and sent again at `retryAt` (ms). */
  | { readonly kind: 'retrying'; readonly attempt: number; readonly retryAt: number; readonly reason: string }
  /** Someone (another tab) saved a newer version; the quilter chooses reload or keep mine. */
  | { readonly kind: 'conflict'; readonly serverVersion: number }
  /** The server refused the design (too large, invalid); retrying would not help. */
  | { readonly kind: 'refused'; readonly message: string };

/** First retry after 1 s, doubling up to 30 s (common practice for backoff, no source). */
export function retryDelayMs(attempt: number): number {
  return Math.min(30_000, 1000 * 2 ** Math.max(0, attempt - 1));
}

/** The indicator's words; `now` in ms to count down a retry. */
export function describeSaveStatus(status: SaveStatus, now: number): string {
  switch (status.kind) {
    case 'saved':
      return 'All changes saved';
    case 'unsaved':
      return 'Unsaved changes';
    case 'saving':
      return 'Saving…';
    case 'retrying': {
      const s = Math.max(0, Math.ceil((status.retryAt - now) / 1000));
      return `Not saved: ${status.reason} Kept on this device; trying again in ${s} s`;
    }
    case 'conflict':
      return 'Saved elsewhere in the meantime: choose which copy to keep';
    case 'refused':
      return `Not saved: ${status.message}`;
    default:
      return assertNever(status);
  }
}

/** True when the quilter may lose work by leaving the page. */
export function hasUnsavedWork(status: SaveStatus): boolean {
  return status.kind !== 'saved';
}
