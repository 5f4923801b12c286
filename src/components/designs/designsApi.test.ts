import { describe, expect, it } from 'vitest';
import { designListSchema } from '@shared/contract/designs.ts';
import { pendingRefreshDelayMs } from './designsApi.ts';

const item = (over: Record<string, unknown>) => ({
  id: 'a', title: 'Nine-patch', version: 1, units: 'in', width: 12, height: 12, thumbnailSvg: '<svg/>',
  createdAt: '2026-12-04T09:00:00Z', updatedAt: '2026-12-04T10:00:00Z', summary: null, summaryPending: false, ...over,
});
const list = (...designs: Record<string, unknown>[]) => designListSchema.parse({ designs, total: designs.length, page: 1, pageSize: 25, sort: 'updated', dir: 'desc', q: '' });

describe('pendingRefreshDelayMs', () => {
  it('asks again while figures or a thumbnail are on the way, less often as time goes on, and stops after a while', () => {
    const pending = list(item({ summaryPending: true }), item({ id: 'b' }));
    expect(pendingRefreshDelayMs(pending, 0)).toBe(1_500);
    expect(pendingRefreshDelayMs(pending, 1)).toBeCloseTo(1_875, 6);
    expect(pendingRefreshDelayMs(pending, 15)).toBe(10_000);
    expect(pendingRefreshDelayMs(pending, 20)).toBeNull();
    expect(pendingRefreshDelayMs(list(item({ thumbnailSvg: null })), 0)).toBe(1_500);
  });

  it('does not poll when every row is complete', () => {
    expect(pendingRefreshDelayMs(list(item({}), item({ id: 'b' })), 0)).toBeNull();
  });
});
