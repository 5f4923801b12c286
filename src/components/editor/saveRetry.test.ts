import { describe, expect, it } from 'vitest';
import type { ApiFailure } from '../designs/apiClient.ts';
import { canWorkOnDraftWhileUnavailable, saveFailureAction } from './saveRetry.ts';

const http = (status: number, retryAfterMs?: number): ApiFailure => ({
  kind: 'http',
  status,
  code: status === 503 ? 'database_unavailable' : 'x',
  message: `answered ${status}`,
  body: null,
  ...(retryAfterMs === undefined ? {} : { retryAfterMs }),
});
const offline: ApiFailure = { kind: 'offline', message: 'The server could not be reached.' };

describe('saveFailureAction', () => {
  it('re-sends unsaved edits when the database restarts (503), the network fails, or the server is busy', () => {
    expect(saveFailureAction(http(503, 5_000), 1)).toEqual({ kind: 'retry', delayMs: 5_000, reason: 'answered 503' });
    expect(saveFailureAction(offline, 1)).toEqual({ kind: 'retry', delayMs: 1_000, reason: 'The server could not be reached.' });
    expect(saveFailureAction(offline, 3)).toMatchObject({ kind: 'retry', delayMs: 4_000 });
    expect(saveFailureAction(http(500), 2)).toMatchObject({ kind: 'retry', delayMs: 2_000 });
    expect(saveFailureAction(http(429, 2_000), 1)).toMatchObject({ kind: 'retry', delayMs: 2_000 });
    // A silly Retry-After is bounded both ways.
    expect(saveFailureAction(http(503, 3_600_000), 1)).toMatchObject({ kind: 'retry', delayMs: 60_000 });
    expect(saveFailureAction(http(503, 0), 1)).toMatchObject({ kind: 'retry', delayMs: 500 });
  });

  it('stops on answers that a retry cannot change', () => {
    expect(saveFailureAction(http(409), 1)).toEqual({ kind: 'conflict' });
    expect(saveFailureAction(http(400), 1)).toEqual({ kind: 'refused', message: 'answered 400' });
    expect(saveFailureAction(http(413), 1)).toMatchObject({ kind: 'refused' });
    expect(saveFailureAction(http(404), 1)).toMatchObject({ kind: 'refused' });
  });
});

describe('canWorkOnDraftWhileUnavailable', () => {
  it('keeps the local draft when the server is down for now (offline, 503, 5xx, 429), not when the design is gone', () => {
    expect(canWorkOnDraftWhileUnavailable(offline)).toBe(true);
    expect(canWorkOnDraftWhileUnavailable(http(503, 5_000))).toBe(true);
    expect(canWorkOnDraftWhileUnavailable(http(502))).toBe(true);
    expect(canWorkOnDraftWhileUnavailable(http(429))).toBe(true);
    expect(canWorkOnDraftWhileUnavailable(http(404))).toBe(false);
    expect(canWorkOnDraftWhileUnavailable(http(401))).toBe(false);
  });
});
