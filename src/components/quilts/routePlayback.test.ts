import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { buildChainOverview } from '@shared/quilt/chainOverview.ts';
import { quiltSchema } from '@shared/quilt/quilt.schema.ts';
import { BLOCK_SECONDS, controlThroughCentre, frameAt, LINK_SECONDS, playbackSeconds, quadPoint } from './routePlayback.ts';

// Three 10 in blocks in a row, 2 in sashing: block 1 x 0–10, block 2 x 12–22, block 3 x 24–34.
const quilt = quiltSchema.parse({
  version: 1, units: 'in', rows: 1, columns: 3, block: { width: 10, height: 10 }, sashing: 2,
  placements: [[{ designId: 'a' }, { designId: 'b' }, { designId: 'c' }]],
});
const legs = buildChainOverview(quilt, [
  { cell: { row: 0, column: 0 }, entry: 0, exit: 1 },
  { cell: { row: 0, column: 1 }, entry: 0, exit: 2 },
  { cell: { row: 0, column: 2 }, entry: 3, exit: 2 },
], 'straight');

describe('replaying the chained route on the map', () => {
  it('the curve through a block passes its centre half-way (a quadratic Bézier at u = 1/2 is (a + 2c + b) / 4)', () => {
    const leg = legs[1]!;
    expect(quadPoint(leg.entry, controlThroughCentre(leg), leg.exit, 0.5)).toEqual(leg.centre);
    expect(quadPoint(leg.entry, controlThroughCentre(leg), leg.exit, 0)).toEqual(leg.entry);
    expect(quadPoint(leg.entry, controlThroughCentre(leg), leg.exit, 1)).toEqual(leg.exit);
  });

  it('starts at the first entry, runs each link, and ends at the last exit', () => {
    // Block 1 then a 2 in link, block 2 then a link of √(2² + 10²), block 3.
    expect(playbackSeconds(legs)).toBeCloseTo(3 * BLOCK_SECONDS + 2 * LINK_SECONDS, 12);
    expect(frameAt(legs, 0, false)).toEqual({ leg: 0, phase: 'block', needle: [0, 0] });
    // Half-way along the first link: from block 1's top right (10, 0) to block 2's top left (12, 0).
    const mid = frameAt(legs, BLOCK_SECONDS + LINK_SECONDS / 2, false)!;
    expect(mid.leg).toBe(1);
    expect(mid.phase).toBe('link');
    expect(mid.needle[0]).toBeCloseTo(11, 12);
    expect(mid.needle[1]).toBeCloseTo(0, 12);
    expect(frameAt(legs, 1e6, false)).toEqual({ leg: 2, phase: 'block', needle: [34, 10] });
    expect(frameAt([], 1, false)).toBeNull();
  });

  it('with reduced motion the needle only ever stands on a corner; the block number never goes back as time runs', () => {
    const corners = legs.flatMap((l) => [l.entry, l.exit]).map((p) => p.join(','));
    fc.assert(
      fc.property(fc.array(fc.double({ min: 0, max: 10, noNaN: true }), { minLength: 2, maxLength: 20 }), (times) => {
        const sorted = [...times].sort((a, b) => a - b);
        let last = 0;
        for (const t of sorted) {
          const f = frameAt(legs, t, true)!;
          expect(corners).toContain(f.needle.join(','));
          expect(f.leg).toBeGreaterThanOrEqual(last);
          last = f.leg;
        }
      }),
    );
  });
});
