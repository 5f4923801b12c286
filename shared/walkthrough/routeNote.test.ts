import { describe, expect, it } from 'vitest';
import { designSchema } from '../design/design.schema.ts';
import { routeNote } from './routeNote.ts';

// Hand-made routes on a plain 12 in block: the note must name the route's real start and end and its real travel.
const block = designSchema.parse({ version: 1, units: 'in', width: 12, height: 12, seams: [], lines: [[[0, 0], [12, 12]], [[12, 0], [0, 12]]] });

describe('routeNote', () => {
  it('names where the route starts and ends and that it needs no travel', () => {
    const note = routeNote(block, [
      { pass: 1, kind: 'stitch', points: [[0, 0], [12, 12]] },
      { pass: 2, kind: 'stitch', points: [[12, 0], [0, 12]] },
    ]);
    expect(note).toBe('Start at the top-left corner of the block and follow the route in 2 passes (1 tie-off on the way); every line is sewn once, with no travel. You finish at the bottom-left corner of the block.');
  });

  it('counts edge travel (12 in along the right edge: the length of the side)', () => {
    const note = routeNote(block, [
      { pass: 1, kind: 'stitch', points: [[0, 0], [12, 12]] },
      { pass: 1, kind: 'edge', points: [[12, 12], [12, 0]] },
      { pass: 1, kind: 'stitch', points: [[12, 0], [0, 12]] },
    ]);
    expect(note).toContain('in one pass; the route uses 12 in along the edge, under the binding.');
  });
});
