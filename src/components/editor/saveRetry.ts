import type { ApiFailure } from '../designs/apiClient.ts';
import { retryDelayMs } from './saveStatus.ts';

/**
 * What the workbench does when a save does not go through. Only answers that say "this save can never
 * succeed as it is" stop it (409: someone saved in between; 400/413: the design is refused; 404: it is gone).
 * Everything else — no answer, 5xx (e.g. 503 while the database restarts), 429 — keeps the edits on this
 * device and sends them again: after the server's Retry-After when it gave one, else after the backoff.
 */
export type SaveFailureAction =
  | { readonly kind: 'conflict' }
  | { readonly kind: 'refused'; readonly message: string }
  | { readonly kind: 'retry'; readonly delayMs: number; readonly reason: string };

/** Longest wait we accept from a Retry-After (ms): a save should not sit for minutes on a bad header. */
const MAX_RETRY_AFTER_MS = 60_000;

export function saveFailureAction(failure: ApiFailure, attempt: number): SaveFailureAction {
  if (failure.kind === 'http') {
    if (failure.status === 409) return { kind: 'conflict' };
    if (failure.status === 400 || failure.status === 413 || failure.status === 404) return { kind: 'refused', message: failure.message };
  }
  const backoff = retryDelayMs(attempt);
  const asked = failure.kind === 'http' ? failure.retryAfterMs : undefined;
  const delayMs = asked === undefined ? backoff : Math.min(MAX_RETRY_AFTER_MS, Math.max(asked, 500));
  return { kind: 'retry', delayMs, reason: failure.message };
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
