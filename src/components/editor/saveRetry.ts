import type { SaveFailure } from '@shared/editor/saveMachine.ts';
import type { ApiFailure } from '../designs/apiClient.ts';
import { parseDesignRecord } from '../designs/designsApi.ts';
import { serverCopyOf, type EditedDocument } from './editedDocument.ts';

/**
 * How a save that did not go through reads to the save machine. Only answers that say "this save can never
 * succeed as it is" stop it (409: someone saved in between, with their copy in the body; 400/413: the design is
 * refused; 404: it is gone). Everything else — no answer, 5xx (e.g. 503 while the database restarts), 429 — is
 * `unavailable`: the machine keeps the edits on this device and sends them again, after the server's Retry-After
 * when it gave one.
 */
export function sortSaveFailure(failure: ApiFailure): SaveFailure<EditedDocument> {
  if (failure.kind === 'http') {
    if (failure.status === 409) {
      const record = parseDesignRecord(failure.body);
      return { kind: 'conflict', server: record ? serverCopyOf(record) : null };
    }
    if (failure.status === 400 || failure.status === 413 || failure.status === 404) return { kind: 'refused', message: failure.message };
    if (failure.retryAfterMs !== undefined) return { kind: 'unavailable', reason: failure.message, retryAfterMs: failure.retryAfterMs };
  }
  return { kind: 'unavailable', reason: failure.message };
}

/**
 * When the design cannot be loaded but this device holds unsaved edits for it: keep working on them (and send
 * them later) if the server is only unreachable for now — no answer, a 5xx or a 429 — not when it said the
 * design is gone or not ours (404) or anything else final.
 */
export function canWorkOnDraftWhileUnavailable(failure: ApiFailure): boolean {
  if (failure.kind === 'offline') return true;
  return failure.status >= 500 || failure.status === 429;
}
