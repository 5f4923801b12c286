import { describe, expect, it } from 'vitest';
import type { DesignCommand } from '@shared/design/commands.ts';
import type { Design } from '@shared/design/design.schema.ts';
import type { Guide } from '@shared/editor/guides.ts';
import type { Selection } from '@shared/editor/selectTool.ts';
import { selectionEdits } from './selectionEdits.ts';

const design: Design = {
  version: 1, units: 'in', width: 12, height: 12, seams: [], edgeTravel: true,
  lines: [[[0, 2], [4, 2]], [[4, 2], [8, 2]], [[0, 6], [12, 6]]],
};

function edits(selection: Selection | null) {
  const log = { commands: [] as DesignCommand[], picks: [] as (Selection | null)[], guides: [] as Guide[], said: [] as string[] };
  const e = selectionEdits({
    design, selection,
    setSelection: (s) => log.picks.push(s),
    dispatch: (c) => log.commands.push(c),
    addGuideLine: (g) => log.guides.push(g),
    announce: (m) => log.said.push(m),
  });
  return { e, log };
}

describe('edits of the pick', () => {
  it('removes the pick as one command and drops it', () => {
    const { e, log } = edits({ target: 'lines', indices: [0, 2] });
    e.remove();
    expect(log.commands).toEqual([{ kind: 'deleteLines', target: 'lines', indices: [0, 2] }]);
    expect(log.picks).toEqual([null]);
  });

  it('joins two lines that share an end, and says why not otherwise', () => {
    const ok = edits({ target: 'lines', indices: [0, 1] });
    ok.e.join();
    expect(ok.log.commands).toEqual([{ kind: 'joinLines', target: 'lines', first: 0, second: 1, reverseFirst: false, reverseSecond: false }]);
    const apart = edits({ target: 'lines', indices: [0, 2] });
    apart.e.join();
    expect(apart.log.commands).toEqual([]);
    expect(apart.log.said).toEqual(['These two lines do not share an end.']);
    const one = edits({ target: 'lines', indices: [0] });
    one.e.join();
    expect(one.log.said).toEqual(['Pick two lines that share an end to join them.']);
  });

  it('splits one line at half its length', () => {
    const { e, log } = edits({ target: 'lines', indices: [2] });
    e.split();
    expect(log.commands).toEqual([{ kind: 'splitLine', target: 'lines', index: 2, segment: 0, point: [6, 6] }]);
  });

  it('a guide halfway between two picked lines (y = 2 and y = 6 give y = 4), or along one line across the block', () => {
    const two = edits({ target: 'lines', indices: [0, 2] });
    two.e.addGuide();
    expect(two.log.guides).toHaveLength(1);
    expect(two.log.guides[0]!.every((p) => Math.abs(p[1] - 4) < 1e-9)).toBe(true);
    const one = edits({ target: 'lines', indices: [0] });
    one.e.addGuide();
    expect(one.log.guides[0]!.map((p) => p[0]).sort((a, b) => a - b)).toEqual([0, 12]);
  });
});
