import { describe, expect, it } from 'vitest';
import { designListSchema, pendingRefreshDelayMs } from './designsApi.ts';

const item = (over: Record<string, unknown>) => ({ id: 'a', title: 'Nine-patch', units: 'in', width: 12, height: 12, thumbnailSvg: '<svg/>', updatedAt: '2026-12-04T10:00:00Z', summary: null, ...over });
const list = (...designs: Record<string, unknown>[]) => designListSchema.parse({ designs, total: designs.length, page: 1, pageSize: 25 });

describe('pendingRefreshDelayMs', () => {
  it('asks again while figures or a thumbnail are on the way, less often as time goes on, and stops after a while', () => {
    const pending = list(item({ summaryPending: true }), item({ id: 'b' }));
    expect(pendingRefreshDelayMs(pending, 0)).toBe(1_500);
    expect(pendingRefreshDelayMs(pending, 1)).toBeCloseTo(1_875, 6);
    expect(pendingRefreshDelayMs(pending, 15)).toBe(10_000);
    expect(pendingRefreshDelayMs(pending, 20)).toBeNull();
    expect(pendingRefreshDelayMs(list(item({ thumbnailSvg: null })), 0)).toBe(1_500);
  });

  it('does not poll when every row is complete (older servers send no summaryPending)', () => {
    expect(pendingRefreshDelayMs(list(item({}), item({ id: 'b', summaryPending: false })), 0)).toBeNull();
  });
});
