// The legend lists what the canvas shows and nothing else (our rule, stated in legendEntries.ts; no outside source).
import { describe, expect, it } from 'vitest';
import { legendEntries, type CanvasContents } from './legendEntries.ts';

const empty: CanvasContents = { seams: false, lines: false, lineGroups: 0, looseEnds: false, start: false, finish: false, widestGap: false, routeKinds: [], needle: false };

describe('legendEntries', () => {
  it('shows seams and quilting lines drawn alike when there is one line group', () => {
    expect(legendEntries({ ...empty, seams: true, lines: true, lineGroups: 1 })).toEqual([
      { kind: 'line', style: 'seam' },
      { kind: 'line', style: 'quiltingLine' },
    ]);
  });

  it('shows one swatch per line group (cycled palette, at most its size) and the loose ends while checking', () => {
    const entries = legendEntries({ ...empty, lines: true, lineGroups: 3, looseEnds: true });
    expect(entries[0]).toMatchObject({ kind: 'groups' });
    expect(entries[0]!.kind === 'groups' && entries[0]!.colours.length).toBe(3);
    expect(entries[1]).toEqual({ kind: 'mark', mark: 'looseEnd' });
    const many = legendEntries({ ...empty, lines: true, lineGroups: 40 });
    expect(many[0]!.kind === 'groups' && many[0]!.colours.length).toBe(7);
  });

  it('with a route: the kinds it uses in the contract order, the lines plain, no loose ends, the needle when playing', () => {
    const entries = legendEntries({ ...empty, seams: true, lines: true, lineGroups: 4, looseEnds: true, routeKinds: ['edge', 'stitch'], needle: true, start: true });
    expect(entries).toEqual([
      { kind: 'line', style: 'seam' },
      { kind: 'line', style: 'quiltingLine' },
      { kind: 'line', style: 'stitch' },
      { kind: 'line', style: 'edge' },
      { kind: 'mark', mark: 'start' },
      { kind: 'mark', mark: 'needle' },
    ]);
  });
});
