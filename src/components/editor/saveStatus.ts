import { assertNever } from '@shared/assertNever.ts';
import type { SaveState } from '@shared/editor/saveMachine.ts';

/**
 * Where the design stands against the server, as the save indicator tells it: read off the save machine's
 * state (shared/editor/saveMachine.ts) by saveStatusOf.
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

/** The indicator's state for a save machine state: edits waiting behind a save on its way read as unsaved. */
export function saveStatusOf(state: SaveState<unknown>): SaveStatus {
  switch (state.phase) {
    case 'saved':
      return { kind: 'saved' };
    case 'edited':
      return { kind: 'unsaved' };
    case 'saving':
      return state.inFlight !== null && state.inFlight < state.revision ? { kind: 'unsaved' } : { kind: 'saving' };
    case 'conflict':
      return { kind: 'conflict', serverVersion: state.server?.version ?? state.baseVersion };
    case 'refused':
      return { kind: 'refused', message: state.message };
    case 'offline':
      return { kind: 'retrying', attempt: state.attempt, retryAt: state.retryAt, reason: state.message };
    default:
      return assertNever(state.phase);
  }
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
