import { describe, expect, it } from 'vitest';
import { createSaveState, DRAFT_RESEND_MS, retryDelayMs, SAVE_DEBOUNCE_MS, stepSave, type SaveEvent, type SaveState, type SaveStep } from './saveMachine.ts';

type Doc = string;

function run(events: readonly SaveEvent<Doc>[], from: SaveState<Doc> = createSaveState<Doc>()): SaveStep<Doc> {
  let step: SaveStep<Doc> = { state: from, commands: [] };
  for (const e of events) step = stepSave(step.state, e);
  return step;
}

const open = (doc: Doc = 'v3', version = 3): SaveEvent<Doc> => ({ kind: 'opened', server: { version, doc }, draft: null, hadDraft: false });
const edit = (doc: Doc): SaveEvent<Doc> => ({ kind: 'edit', doc });
const tick: SaveEvent<Doc> = { kind: 'tick' };
const unavailable = (now = 0, retryAfterMs?: number): SaveEvent<Doc> => ({
  kind: 'saveFailed', now, failure: { kind: 'unavailable', reason: 'The server could not be reached.', ...(retryAfterMs === undefined ? {} : { retryAfterMs }) },
});

describe('editor/saveMachine: the everyday path', () => {
  it('keeps each edit in the draft at once and saves once after a pause', () => {
    const edited = run([open(), edit('a')]);
    expect(edited.state.phase).toBe('edited');
    expect(edited.commands).toEqual([{ kind: 'writeDraft', doc: 'a', baseVersion: 3 }, { kind: 'schedule', ms: SAVE_DEBOUNCE_MS }]);
    const again = stepSave(edited.state, edit('ab'));
    expect(again.commands).toContainEqual({ kind: 'schedule', ms: SAVE_DEBOUNCE_MS });
    const sending = stepSave(again.state, tick);
    expect(sending.state.phase).toBe('saving');
    expect(sending.commands).toEqual([{ kind: 'send', doc: 'ab', baseVersion: 3 }]);
    const saved = stepSave(sending.state, { kind: 'saveSucceeded', version: 4 });
    expect(saved.state).toMatchObject({ phase: 'saved', baseVersion: 4 });
    expect(saved.commands).toEqual([{ kind: 'clearDraft' }]);
  });

  it('queues edits made while a save is on its way and sends them on the new version afterwards', () => {
    const sending = run([open(), edit('a'), tick]);
    const meanwhile = stepSave(sending.state, edit('ab'));
    expect(meanwhile.state.phase).toBe('saving');
    expect(stepSave(meanwhile.state, tick).commands).toEqual([]); // never a second save in flight
    const answered = stepSave(meanwhile.state, { kind: 'saveSucceeded', version: 4 });
    expect(answered.state.phase).toBe('edited');
    expect(answered.commands).toEqual([{ kind: 'writeDraft', doc: 'ab', baseVersion: 4 }, { kind: 'schedule', ms: SAVE_DEBOUNCE_MS }]);
    expect(stepSave(answered.state, tick).commands).toEqual([{ kind: 'send', doc: 'ab', baseVersion: 4 }]);
  });

  it('ignores a tick with nothing to save', () => {
    expect(run([open(), tick]).commands).toEqual([]);
  });
});

describe('editor/saveMachine: when the server is away (DEVELOPERS.md, "When the database goes away")', () => {
  it('backs off 1 s, 2 s, 4 s on no answer, keeping the draft, and honours Retry-After within bounds', () => {
    let s = run([open(), edit('a'), tick]).state;
    const delays: number[] = [];
    for (let i = 0; i < 3; i++) {
      const failed = stepSave(s, unavailable(1_000));
      expect(failed.state.phase).toBe('offline');
      expect(failed.commands).not.toContainEqual({ kind: 'clearDraft' });
      delays.push((failed.commands[0] as { ms: number }).ms);
      s = stepSave(failed.state, tick).state;
    }
    expect(delays).toEqual([1_000, 2_000, 4_000]);
    expect(stepSave(s, unavailable(0, 5_000)).commands).toEqual([{ kind: 'schedule', ms: 5_000 }]);
    expect(stepSave(s, unavailable(0, 3_600_000)).commands).toEqual([{ kind: 'schedule', ms: 60_000 }]);
    expect(stepSave(s, unavailable(0, 0)).commands).toEqual([{ kind: 'schedule', ms: 500 }]);
    expect(stepSave(s, unavailable(10_000)).state.retryAt).toBe(10_000 + retryDelayMs(4));
  });

  it('sends again at once when the browser comes back online or the quilter presses Try now', () => {
    const offline = run([open(), edit('a'), tick, unavailable()]).state;
    expect(stepSave(offline, { kind: 'online' }).commands).toEqual([{ kind: 'send', doc: 'a', baseVersion: 3 }]);
    const now = stepSave(offline, { kind: 'saveNow' });
    expect(now.state.attempt).toBe(0);
    expect(now.commands).toEqual([{ kind: 'send', doc: 'a', baseVersion: 3 }]);
    expect(stepSave(run([open()]).state, { kind: 'online' }).commands).toEqual([]);
  });

  it('opens on a draft while the server cannot be reached and sends it after the first backoff', () => {
    const s = run([{ kind: 'openedFromDraft', draft: { baseVersion: 2, doc: 'mine' }, reason: 'down', now: 100 }]);
    expect(s.state).toMatchObject({ phase: 'offline', doc: 'mine', baseVersion: 2, attempt: 1, retryAt: 1_100 });
    expect(s.commands).toEqual([{ kind: 'schedule', ms: 1_000 }]);
    expect(stepSave(s.state, tick).commands).toEqual([{ kind: 'send', doc: 'mine', baseVersion: 2 }]);
  });
});

describe('editor/saveMachine: opening with a draft from an earlier visit', () => {
  it('sends a draft made on the current version soon after opening', () => {
    const s = run([{ kind: 'opened', server: { version: 3, doc: 'v3' }, draft: { baseVersion: 3, doc: 'mine' }, hadDraft: true }]);
    expect(s.state).toMatchObject({ phase: 'edited', doc: 'mine' });
    expect(s.commands).toEqual([{ kind: 'schedule', ms: DRAFT_RESEND_MS }]);
  });

  it('asks which copy to keep when someone saved since the draft was made', () => {
    const s = run([{ kind: 'opened', server: { version: 5, doc: 'v5' }, draft: { baseVersion: 3, doc: 'mine' }, hadDraft: true }]);
    expect(s.state).toMatchObject({ phase: 'conflict', doc: 'mine', server: { version: 5, doc: 'v5' } });
    expect(s.commands).toEqual([]);
  });

  it('removes a draft equal to the saved copy', () => {
    expect(run([{ kind: 'opened', server: { version: 3, doc: 'v3' }, draft: null, hadDraft: true }]).commands).toEqual([{ kind: 'clearDraft' }]);
  });
});

describe('editor/saveMachine: conflict and refusal', () => {
  const conflict: SaveEvent<Doc> = { kind: 'saveFailed', now: 0, failure: { kind: 'conflict', server: { version: 7, doc: 'theirs' } } };

  it('on 409 keeps both copies, sends nothing until the quilter chooses, and keeps later edits in the draft', () => {
    const s = run([open(), edit('mine'), tick, conflict]);
    expect(s.state).toMatchObject({ phase: 'conflict', doc: 'mine', server: { version: 7 } });
    expect(stepSave(s.state, tick).commands).toEqual([]);
    expect(stepSave(s.state, { kind: 'saveNow' }).commands).toEqual([]);
    expect(stepSave(s.state, edit('mine2')).commands).toEqual([{ kind: 'writeDraft', doc: 'mine2', baseVersion: 3 }]);
  });

  it('keep mine sends my copy on the server\'s version; reload takes theirs and drops the draft', () => {
    const s = run([open(), edit('mine'), tick, conflict]).state;
    const mine = stepSave(s, { kind: 'resolveConflict', choice: 'keep-mine' });
    expect(mine.commands).toEqual([{ kind: 'writeDraft', doc: 'mine', baseVersion: 7 }, { kind: 'send', doc: 'mine', baseVersion: 7 }]);
    const theirs = stepSave(s, { kind: 'resolveConflict', choice: 'reload' });
    expect(theirs.state).toMatchObject({ phase: 'saved', doc: 'theirs', baseVersion: 7, generation: s.generation + 1 });
    expect(theirs.commands).toEqual([{ kind: 'clearDraft' }]);
  });

  it('a refused design keeps the edits, stops retrying, and the next edit tries again', () => {
    const s = run([open(), edit('huge'), tick, { kind: 'saveFailed', now: 0, failure: { kind: 'refused', message: 'Too many points.' } }]);
    expect(s.state).toMatchObject({ phase: 'refused', message: 'Too many points.', doc: 'huge' });
    expect(s.commands).toEqual([{ kind: 'cancelSchedule' }]);
    expect(stepSave(s.state, tick).commands).toEqual([]);
    expect(stepSave(s.state, edit('smaller')).state.phase).toBe('edited');
  });

  it('going back to a saved version replaces the document and restarts history', () => {
    const s = run([open(), { kind: 'replaced', server: { version: 9, doc: 'old' } }]);
    expect(s.state).toMatchObject({ phase: 'saved', doc: 'old', baseVersion: 9, generation: 2 });
    expect(s.commands).toEqual([{ kind: 'cancelSchedule' }, { kind: 'clearDraft' }]);
  });
});

describe('editor/saveMachine: backoff', () => {
  it('waits 1, 2, 4, 8, 16 s, then stays at 30 s', () => {
    expect([1, 2, 3, 4, 5, 6, 12].map(retryDelayMs)).toEqual([1000, 2000, 4000, 8000, 16000, 30000, 30000]);
  });
});

describe('editor/saveMachine: pinned from the property test', () => {
  it('a conflict without the server\'s copy, with nothing unsaved, closes as saved instead of waiting forever', () => {
    // Counterexample: ["clean", [go-back-conflict without a copy, resolve reload]] left the phase "edited" with no timer.
    const s = run([open(), { kind: 'openConflict', server: null }, { kind: 'resolveConflict', choice: 'reload' }]);
    expect(s.state.phase).toBe('saved');
    expect(s.commands).toEqual([]);
    const edited = run([open(), edit('mine'), { kind: 'openConflict', server: null }, { kind: 'resolveConflict', choice: 'keep-mine' }]);
    expect(edited.commands).toEqual([{ kind: 'send', doc: 'mine', baseVersion: 3 }]);
  });

  it('a save that lands while a conflict is open keeps the conflict and the draft', () => {
    const sending = run([open(), edit('mine'), tick, { kind: 'openConflict', server: { version: 5, doc: 'theirs' } }]);
    const landed = stepSave(sending.state, { kind: 'saveSucceeded', version: 4 });
    expect(landed.state).toMatchObject({ phase: 'conflict', inFlight: null, baseVersion: 4 });
    expect(landed.commands).toEqual([]);
  });
});
