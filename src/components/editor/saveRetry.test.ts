import { describe, expect, it } from 'vitest';
import type { ApiFailure } from '../designs/apiClient.ts';
import { canWorkOnDraftWhileUnavailable, sortSaveFailure } from './saveRetry.ts';

const http = (status: number, retryAfterMs?: number): ApiFailure => ({
  kind: 'http',
  status,
  code: status === 503 ? 'database_unavailable' : 'x',
  message: `answered ${status}`,
  body: null,
  ...(retryAfterMs === undefined ? {} : { retryAfterMs }),
});
const offline: ApiFailure = { kind: 'offline', message: 'The server could not be reached.' };

describe('sortSaveFailure', () => {
  it('re-sends unsaved edits when the database restarts (503), the network fails, or the server is busy', () => {
    expect(sortSaveFailure(http(503, 5_000))).toEqual({ kind: 'unavailable', reason: 'answered 503', retryAfterMs: 5_000 });
    expect(sortSaveFailure(offline)).toEqual({ kind: 'unavailable', reason: 'The server could not be reached.' });
    expect(sortSaveFailure(http(500))).toEqual({ kind: 'unavailable', reason: 'answered 500' });
    expect(sortSaveFailure(http(429, 2_000))).toMatchObject({ kind: 'unavailable', retryAfterMs: 2_000 });
  });

  it('stops on answers that cannot change by retrying, keeping the server\'s copy of a 409', () => {
    expect(sortSaveFailure(http(409))).toEqual({ kind: 'conflict', server: null });
    const design = { version: 1, units: 'in', width: 12, height: 12, seams: [], lines: [], edgeTravel: true };
    const record = { id: '00000000-0000-4000-8000-000000000001', title: 'Theirs', notes: '', version: 7, design, summary: null, summaryPending: false, createdAt: '2026-12-05T05:00:00.000Z', updatedAt: '2026-12-05T06:00:00.000Z' };
    const conflict = sortSaveFailure({ kind: 'http', status: 409, code: 'version_conflict', message: 'answered 409', body: { design: record } });
    expect(conflict.kind === 'conflict' ? conflict.server?.version : null).toBe(7);
    expect(sortSaveFailure(http(400))).toEqual({ kind: 'refused', message: 'answered 400' });
    expect(sortSaveFailure(http(413))).toMatchObject({ kind: 'refused' });
    expect(sortSaveFailure(http(404))).toMatchObject({ kind: 'refused' });
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
