import { describe, expect, it } from 'vitest';
import { designSchema } from '@shared/design/design.schema.ts';
import { buildWalkthrough } from '@shared/walkthrough/buildWalkthrough.ts';
import type { RouteStrokeInput } from '@shared/walkthrough/walkthrough.types.ts';
import { buildPlayback } from '../route/routePlayback.ts';
import { buildStepSpans, findStepAt } from './stepTimeline.ts';

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
    expect(spans).toEqual([
      { start: 0, end: 0 }, { start: 0, end: 5 }, { start: 5, end: 9 }, { start: 9, end: 9 },
      { start: 9, end: 9 }, { start: 9, end: 19 }, { start: 19, end: 19 },
    ]);
  });

  it('finds the step under a scrubbed needle', () => {
    expect(findStepAt(w.steps, spans, 0, playback.total)).toBe(0);
    expect(findStepAt(w.steps, spans, 2.5, playback.total)).toBe(1);
    expect(findStepAt(w.steps, spans, 5, playback.total)).toBe(2);
    expect(findStepAt(w.steps, spans, 9, playback.total)).toBe(5);
    expect(findStepAt(w.steps, spans, 19, playback.total)).toBe(6);
  });
});
