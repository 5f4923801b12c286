import { describe, expect, it } from 'vitest';
import type { Design } from '@shared/design/design.schema.ts';
import { findLinePieces } from './linePieces.ts';

const base: Design = { version: 1, units: 'in', width: 12, height: 12, seams: [], lines: [], edgeTravel: true };

describe('line pieces for colouring', () => {
  it('two crossing lines form one piece; a separate line is another (connected components)', () => {
    const design: Design = { ...base, lines: [[[1, 1], [5, 5]], [[1, 5], [5, 1]], [[8, 8], [10, 10]]] };
    const pieces = findLinePieces(design)!;
    expect(pieces[0]).toBe(pieces[1]);
    expect(pieces[2]).not.toBe(pieces[0]);
    expect(new Set(pieces).size).toBe(2);
  });

  it('gives nothing for an empty design', () => {
    expect(findLinePieces(base)).toBeNull();
  });
});
