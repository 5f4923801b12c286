import { describe, expect, it } from 'vitest';
import { designSchema } from '@shared/design/design.schema.ts';
import { buildWalkthrough } from '@shared/walkthrough/buildWalkthrough.ts';
import type { RouteStrokeInput } from '@shared/walkthrough/walkthrough.types.ts';
import { buildPlayback } from '../route/routePlayback.ts';
import { findStepAt } from '@shared/walkthrough/stepPlayback.ts';
import { buildStepSpans } from './stepTimeline.ts';

const design = designSchema.parse({ version: 1, units: 'in', width: 12, height: 12, seams: [], lines: [[[0, 0], [3, 4]]] });
// Lengths chosen from Pythagorean triples (3-4-5, 6-8-10) so every span end is an exact number.
const route: RouteStrokeInput[] = [
  { pass: 1, kind: 'stitch', points: [[0, 0], [3, 4]] }, // 5
  { pass: 1, kind: 'edge', points: [[3, 4], [3, 0]] }, // 4
  { pass: 2, kind: 'stitch', points: [[6, 0], [12, 8]] }, // 10
];

describe('step spans on the playback', () => {
  const w = buildWalkthrough(design, route);
  const playback = buildPlayback(route);
  const spans = buildStepSpans(w.steps, playback);

  it('lays the steps end to end along the route', () => {
    expect(w.steps.map((s) => s.kind)).toEqual(['start', 'stitch', 'travel', 'tie-off', 'start', 'stitch', 'tie-off']);
    expect(spans.map(({ start, end }) => [start, end])).toEqual([[0, 0], [0, 5], [5, 9], [9, 9], [9, 9], [9, 19], [19, 19]]);
    expect(spans.map((s) => s.moving)).toEqual([false, true, true, false, false, true, false]);
  });

  it('finds the step under a scrubbed needle', () => {
    expect(findStepAt(spans, 0)).toBe(0);
    expect(findStepAt(spans, 2.5)).toBe(1);
    expect(findStepAt(spans, 5)).toBe(2);
    expect(findStepAt(spans, 9)).toBe(5);
    expect(findStepAt(spans, 19)).toBe(6);
  });
});
