import { describe, expect, it } from 'vitest';
import type { Design } from '../design/design.schema.ts';
import { chooseCheckSource, type SaveKind, type SavedCheck } from './checkSource.ts';

const block = (y: number): Design => ({ version: 1, units: 'in', width: 12, height: 12, seams: [], lines: [[[0, y], [12, y]]], edgeTravel: true });

describe('chooseCheckSource: one request per burst of edits', () => {
  const sent = block(3);
  const saved: SavedCheck = { design: sent, check: null, checkError: { code: 'engine_busy', message: 'busy' } };

  it('uses the saved check while the document is the one the save sent, whatever the save state says', () => {
    for (const save of ['saved', 'unsaved', 'saving', 'retrying', 'conflict', 'refused'] as const satisfies readonly SaveKind[]) {
      expect(chooseCheckSource(sent, saved, save)).toEqual({ kind: 'saved', saved });
    }
  });

  it('waits for the save when the document changed and a save is due or on its way', () => {
    const edited = block(4);
    expect(chooseCheckSource(edited, saved, 'unsaved')).toEqual({ kind: 'await-save' });
    expect(chooseCheckSource(edited, saved, 'saving')).toEqual({ kind: 'await-save' });
    expect(chooseCheckSource(edited, null, 'unsaved')).toEqual({ kind: 'await-save' });
  });

  it('asks for a check of its own when no save will bring one', () => {
    // Just opened (nothing saved here yet), or a conflict, refusal or retry holds the save back.
    expect(chooseCheckSource(sent, null, 'saved')).toEqual({ kind: 'fresh' });
    for (const save of ['retrying', 'conflict', 'refused'] as const) expect(chooseCheckSource(block(4), saved, save)).toEqual({ kind: 'fresh' });
  });

  it('treats an equal but different document as changed (identity, not deep equality: undo returns older objects)', () => {
    expect(chooseCheckSource(block(3), saved, 'saved')).toEqual({ kind: 'fresh' });
  });
});
