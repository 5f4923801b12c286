import { describe, expect, it } from 'vitest';
import { createSaveState, stepSave, type SaveState } from '@shared/editor/saveMachine.ts';
import { describeSaveStatus, saveStatusOf } from './saveStatus.ts';

describe('save status', () => {
  it('counts down the retry and says the edits are kept', () => {
    const text = describeSaveStatus({ kind: 'retrying', attempt: 2, retryAt: 5_000, reason: 'The server could not be reached.' }, 1_500);
    expect(text).toContain('trying again in 4 s');
    expect(text).toContain('Kept on this device');
  });

  it('reads the save machine: a save on its way with newer edits behind it shows as unsaved', () => {
    let s: SaveState<string> = stepSave(createSaveState<string>(), { kind: 'opened', server: { version: 1, doc: 'a' }, draft: null, hadDraft: false }).state;
    expect(saveStatusOf(s)).toEqual({ kind: 'saved' });
    s = stepSave(s, { kind: 'edit', doc: 'b' }).state;
    expect(saveStatusOf(s)).toEqual({ kind: 'unsaved' });
    s = stepSave(s, { kind: 'tick' }).state;
    expect(saveStatusOf(s)).toEqual({ kind: 'saving' });
    expect(saveStatusOf(stepSave(s, { kind: 'edit', doc: 'c' }).state)).toEqual({ kind: 'unsaved' });
    const offline = stepSave(s, { kind: 'saveFailed', now: 1_000, failure: { kind: 'unavailable', reason: 'down' } }).state;
    expect(saveStatusOf(offline)).toEqual({ kind: 'retrying', attempt: 1, retryAt: 2_000, reason: 'down' });
    const conflict = stepSave(s, { kind: 'saveFailed', now: 0, failure: { kind: 'conflict', server: { version: 4, doc: 'x' } } }).state;
    expect(saveStatusOf(conflict)).toEqual({ kind: 'conflict', serverVersion: 4 });
  });
});
