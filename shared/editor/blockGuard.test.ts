import { describe, expect, it } from 'vitest';
import type { Design } from '../design/design.schema.ts';
import { designInputSchema } from '../design/design.schema.ts';
import { applyCommand } from '../design/commands.ts';
import { guardBlockEdit } from './blockGuard.ts';

const design: Design = { version: 1, units: 'in', width: 12, height: 12, seams: [], edgeTravel: true, lines: [[[1, 1], [5, 1]]] };

describe('editor/blockGuard', () => {
  it('clips a quilting line drawn past the edge and says so; the result passes the server rule', () => {
    const g = guardBlockEdit(design, { kind: 'addLines', target: 'lines', lines: [[[6, 6], [14, 6]]] });
    expect(g.command).toEqual({ kind: 'addLines', target: 'lines', lines: [[[6, 6], [12, 6]]] });
    expect(g.notice).toMatch(/outside the block was left off/);
    expect(designInputSchema.safeParse(applyCommand(design, g.command!).design).success).toBe(true);
    // The same line unclipped is what the server refuses.
    expect(designInputSchema.safeParse({ ...design, lines: [[[6, 6], [14, 6]]] }).success).toBe(false);
  });

  it('does not add a line wholly outside; a line inside passes untouched and silent', () => {
    expect(guardBlockEdit(design, { kind: 'addLines', target: 'lines', lines: [[[13, 1], [15, 2]]] })).toMatchObject({ command: null, notice: expect.stringMatching(/not added/) });
    const inside = { kind: 'addLines', target: 'lines', lines: [[[2, 2], [3, 3]]] } as const;
    expect(guardBlockEdit(design, inside)).toEqual({ command: inside, notice: null });
  });

  it('refuses a move or a smaller block that would take a quilting line outside', () => {
    expect(guardBlockEdit(design, { kind: 'moveLines', target: 'lines', indices: [0], dx: 10, dy: 0 }).command).toBeNull();
    expect(guardBlockEdit(design, { kind: 'setSize', width: 4, height: 4 }).notice).toMatch(/outside the block/);
    expect(guardBlockEdit(design, { kind: 'moveLines', target: 'lines', indices: [0], dx: 1, dy: 1 }).command).not.toBeNull();
  });
});
