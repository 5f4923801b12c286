import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { measureLabel, overlaps, placeLabels, type LabelRequest } from './labelPlacement.ts';

const AREA = { minX: 0, minY: 0, maxX: 800, maxY: 600 };

describe('label placement', () => {
  it('puts "Start here" and the first pass label, both at the block corner, side by side without touching', () => {
    // The walkthrough's first step: pass 1 starts where "Start here" points (the top-left corner, inset 24 px).
    const { placed, hidden } = placeLabels(
      [{ key: 'mark', text: 'Start here', anchor: [24, 24] }, { key: 'pass-1', text: 'Pass 1', anchor: [24, 24] }],
      AREA,
      [[24, 24]],
    );
    expect(hidden).toEqual([]);
    expect(placed.map((p) => p.key)).toEqual(['mark', 'pass-1']);
    expect(overlaps(placed[0]!.box, placed[1]!.box)).toBe(false);
    // Neither covers the marker ring at the corner.
    for (const p of placed) expect(overlaps(p.box, { minX: 15, minY: 15, maxX: 33, maxY: 33 })).toBe(false);
  });

  it('hides a label that has no free spot, keeping the earlier ones', () => {
    const crowd: LabelRequest[] = Array.from({ length: 12 }, (_, i) => ({ key: `pass-${i + 1}`, text: `Pass ${i + 1}`, anchor: [400, 300] }));
    const { placed, hidden } = placeLabels(crowd, AREA);
    // Right, left, above and below fit; the diagonal spots overlap the labels above and below a short anchor.
    expect(placed.map((p) => p.key)).toEqual(['pass-1', 'pass-2', 'pass-3', 'pass-4']);
    expect(hidden).toHaveLength(8);
  });

  it('sizes a box from its text', () => {
    expect(measureLabel('Pass 12').width).toBeGreaterThan(measureLabel('Pass 1').width);
  });

  it('never overlaps two placed labels and keeps every one inside the canvas (random anchors)', () => {
    const anchor = fc.tuple(fc.integer({ min: 0, max: 800 }), fc.integer({ min: 0, max: 600 }));
    fc.assert(
      fc.property(fc.array(anchor, { maxLength: 40 }), fc.array(anchor, { maxLength: 5 }), (anchors, clear) => {
        const requests = anchors.map(([x, y], i): LabelRequest => ({ key: `pass-${i + 1}`, text: `Pass ${i + 1}`, anchor: [x, y] }));
        const { placed, hidden } = placeLabels(requests, AREA, clear);
        expect(placed.length + hidden.length).toBe(requests.length);
        for (let i = 0; i < placed.length; i++) {
          const b = placed[i]!.box;
          expect(b.minX >= 0 && b.minY >= 0 && b.maxX <= 800 && b.maxY <= 600).toBe(true);
          for (let j = i + 1; j < placed.length; j++) expect(overlaps(b, placed[j]!.box)).toBe(false);
        }
      }),
      { numRuns: 300 },
    );
  });
});
