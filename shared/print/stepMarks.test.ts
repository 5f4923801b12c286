import { describe, expect, it } from 'vitest';
import { designSchema } from '../design/design.schema.ts';
import { buildWalkthrough } from '../walkthrough/buildWalkthrough.ts';
import type { RouteStrokeInput } from '../walkthrough/walkthrough.types.ts';
import { findStepMarks, halfway, placeStepNumbers } from './stepMarks.ts';

describe('halfway', () => {
  it('finds the point at half the length and the direction there (worked example)', () => {
    // An L of 4 + 2: half of 6 is 3, on the first leg, heading +x.
    expect(halfway([[0, 0], [4, 0], [4, 2]])).toEqual({ at: [3, 0], angle: 0 });
    // 1 + 3: half of 4 is 2, one unit down the second leg, heading +y (toward the quilter): angle π/2.
    expect(halfway([[0, 0], [1, 0], [1, 3]])).toEqual({ at: [1, 1], angle: Math.PI / 2 });
    expect(halfway([[2, 2], [2, 2]])).toBeNull();
  });
});

describe('findStepMarks', () => {
  it('numbers each stitch and travel step as the list does, and marks each pass start', () => {
    const design = designSchema.parse({ version: 1, units: 'in', width: 6, height: 6, seams: [], lines: [[[1, 1], [5, 1]], [[5, 1], [5, 5]]] });
    const route: RouteStrokeInput[] = [
      { pass: 1, kind: 'stitch', points: [[1, 1], [5, 1]] },
      { pass: 1, kind: 'retrace', points: [[5, 1], [3, 1]] },
      { pass: 1, kind: 'retrace', points: [[3, 1], [5, 1]] },
      { pass: 1, kind: 'stitch', points: [[5, 1], [5, 5]] },
    ];
    const w = buildWalkthrough(design, route);
    const marks = findStepMarks(w, route);
    expect(marks[0]).toEqual({ kind: 'start', number: 1, at: [1, 1], angle: 0 });
    for (const m of marks.slice(1)) {
      const step = w.steps[m.number - 1]!;
      expect(step.kind).toBe(m.kind);
    }
    // Every step with length has its mark; the last stitch runs down the right side, toward the quilter.
    expect(marks.filter((m) => m.kind !== 'start')).toHaveLength(w.steps.filter((s) => s.length > 0).length);
    const last = marks[marks.length - 1]!;
    expect(last.at).toEqual([5, 3]);
    expect(last.angle).toBeCloseTo(Math.PI / 2, 12);
  });
});

describe('placeStepNumbers', () => {
  it('puts a lone number 9 pt to the left of the way of sewing', () => {
    // Sewing toward +x (angle 0, y down): left is −y.
    const [p] = placeStepNumbers([{ at: [100, 100], angle: 0 }], 5.5);
    expect(p![0]).toBeCloseTo(100, 12);
    expect(p![1]).toBeCloseTo(91, 12);
  });
  it('keeps the discs of marks that meet at one point apart (the centre of a pinwheel)', () => {
    const marks = [0, 1, 2, 3, 4, 5].map((k) => ({ at: [50, 50] as const, angle: (k * Math.PI) / 3 }));
    const discs = placeStepNumbers(marks, 5.5);
    for (let i = 0; i < discs.length; i++) for (let j = i + 1; j < discs.length; j++) expect(Math.hypot(discs[i]![0] - discs[j]![0], discs[i]![1] - discs[j]![1])).toBeGreaterThanOrEqual(11 - 1e-9);
  });
});
