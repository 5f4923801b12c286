import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { createSaveState, hasUnsavedEdits, stepSave, type SaveCommand, type SaveEvent, type SaveState } from './saveMachine.ts';

// The save machine against a fake server and a fake draft store, over random sequences of what a quilter, the
// network and another tab can do. The fake server is the rule the real one keeps (src/server/designs: a PUT whose
// baseVersion is not the current version answers 409 with the current copy); everything else is bookkeeping.

type Doc = string;
type Action =
  | { readonly kind: 'edit' }
  | { readonly kind: 'tick' }
  | { readonly kind: 'answer'; readonly outcome: 'ok' | 'refused' | 'unavailable' | 'lost-answer'; readonly retryAfterMs?: number | undefined }
  | { readonly kind: 'other-tab-saves' }
  | { readonly kind: 'online' }
  | { readonly kind: 'save-now' }
  | { readonly kind: 'resolve'; readonly choice: 'reload' | 'keep-mine' }
  | { readonly kind: 'go-back' }
  | { readonly kind: 'go-back-conflict'; readonly withCopy: boolean };

interface World {
  s: SaveState<Doc>;
  /** Every version the server ever stored. */
  history: Map<number, Doc>;
  version: number;
  draft: { readonly doc: Doc; readonly baseVersion: number } | null;
  pending: { readonly doc: Doc; readonly baseVersion: number } | null;
  timer: boolean;
  /** What the document must be: the last edit, or the copy the quilter chose / went back to. */
  expected: Doc;
  /** The newest server version the machine was told about as its own base (load, its saves, a choice). */
  known: number;
  edits: number;
  now: number;
}

const actionArb: fc.Arbitrary<Action> = fc.oneof(
  { weight: 5, arbitrary: fc.constant({ kind: 'edit' as const }) },
  { weight: 5, arbitrary: fc.constant({ kind: 'tick' as const }) },
  { weight: 5, arbitrary: fc.record({ kind: fc.constant('answer' as const), outcome: fc.constantFrom('ok' as const, 'ok' as const, 'refused' as const, 'unavailable' as const, 'lost-answer' as const), retryAfterMs: fc.option(fc.integer({ min: 0, max: 3_600_000 }), { nil: undefined }) }, { requiredKeys: ['kind', 'outcome'] }) },
  { weight: 1, arbitrary: fc.constant({ kind: 'other-tab-saves' as const }) },
  { weight: 1, arbitrary: fc.constant({ kind: 'online' as const }) },
  { weight: 1, arbitrary: fc.constant({ kind: 'save-now' as const }) },
  { weight: 2, arbitrary: fc.record({ kind: fc.constant('resolve' as const), choice: fc.constantFrom('reload' as const, 'keep-mine' as const) }) },
  { weight: 1, arbitrary: fc.constant({ kind: 'go-back' as const }) },
  { weight: 1, arbitrary: fc.record({ kind: fc.constant('go-back-conflict' as const), withCopy: fc.boolean() }) },
);

const startArb = fc.constantFrom('clean', 'draft-current', 'draft-stale', 'offline-draft');

function deliver(w: World, event: SaveEvent<Doc>): void {
  const before = w.s;
  const step = stepSave(w.s, event);
  w.s = step.state;
  for (const c of step.commands) carryOut(w, before, event, c);
}

function carryOut(w: World, before: SaveState<Doc>, event: SaveEvent<Doc>, c: SaveCommand<Doc>): void {
  switch (c.kind) {
    case 'send':
      expect(w.pending, 'never two saves in flight').toBeNull();
      expect(before.phase === 'conflict' && event.kind !== 'resolveConflict', 'nothing is sent while a conflict is open').toBe(false);
      expect(c.baseVersion, 'a save goes out on the latest base version').toBe(w.known);
      expect(c.doc, 'a save carries the latest edit').toBe(w.expected);
      w.pending = { doc: c.doc, baseVersion: c.baseVersion };
      return;
    case 'writeDraft':
      w.draft = { doc: c.doc, baseVersion: c.baseVersion };
      return;
    case 'clearDraft':
      w.draft = null;
      return;
    case 'schedule':
      expect(c.ms).toBeGreaterThan(0);
      w.timer = true;
      return;
    case 'cancelSchedule':
      w.timer = false;
      return;
  }
}

function serverStore(w: World, doc: Doc): number {
  w.version += 1;
  w.history.set(w.version, doc);
  return w.version;
}

function act(w: World, a: Action): void {
  switch (a.kind) {
    case 'edit':
      w.edits += 1;
      w.expected = `edit${w.edits}`;
      return deliver(w, { kind: 'edit', doc: w.expected });
    case 'tick':
      if (!w.timer) return;
      w.timer = false;
      return deliver(w, { kind: 'tick' });
    case 'answer': {
      const sent = w.pending;
      if (!sent) return;
      w.pending = null;
      w.now += 1_000;
      if (a.outcome === 'unavailable') return deliver(w, { kind: 'saveFailed', now: w.now, failure: { kind: 'unavailable', reason: 'down', ...(a.retryAfterMs === undefined ? {} : { retryAfterMs: a.retryAfterMs }) } });
      if (sent.baseVersion !== w.version) {
        return deliver(w, { kind: 'saveFailed', now: w.now, failure: { kind: 'conflict', server: { version: w.version, doc: w.history.get(w.version)! } } });
      }
      if (a.outcome === 'refused') return deliver(w, { kind: 'saveFailed', now: w.now, failure: { kind: 'refused', message: 'no' } });
      const version = serverStore(w, sent.doc);
      // The write committed but the answer never arrived: the machine must treat it as not saved.
      if (a.outcome === 'lost-answer') return deliver(w, { kind: 'saveFailed', now: w.now, failure: { kind: 'unavailable', reason: 'no answer' } });
      w.known = Math.max(w.known, version);
      return deliver(w, { kind: 'saveSucceeded', version });
    }
    case 'other-tab-saves':
      serverStore(w, `other${w.version + 1}`);
      return;
    case 'online':
      return deliver(w, { kind: 'online' });
    case 'save-now':
      return deliver(w, { kind: 'saveNow' });
    case 'resolve': {
      const copy = w.s.phase === 'conflict' ? w.s.server : null;
      if (copy) {
        w.known = copy.version;
        if (a.choice === 'reload') w.expected = copy.doc;
      }
      return deliver(w, { kind: 'resolveConflict', choice: a.choice });
    }
    case 'go-back':
    case 'go-back-conflict': {
      // The versions panel offers going back only when everything is saved (canGoBack).
      if (w.s.phase !== 'saved' || w.pending) return;
      if (a.kind === 'go-back-conflict' || w.version !== w.s.baseVersion) {
        const withCopy = a.kind === 'go-back' || a.withCopy;
        return deliver(w, { kind: 'openConflict', server: withCopy ? { version: w.version, doc: w.history.get(w.version)! } : null });
      }
      const version = serverStore(w, 'restored');
      w.known = version;
      w.expected = 'restored';
      return deliver(w, { kind: 'replaced', server: { version, doc: 'restored' } });
    }
  }
}

function checkInvariants(w: World): void {
  const s = w.s;
  expect(s.doc, 'the document is the last edit (or the copy the quilter chose)').toBe(w.expected);
  expect(s.inFlight !== null, 'the machine knows when a save is on its way').toBe(w.pending !== null);
  if (hasUnsavedEdits(s)) {
    expect(w.draft?.doc, 'unsaved edits are always in the draft').toBe(s.doc);
    // A draft on an older base would read as a conflict on the next visit although nobody else saved.
    expect(w.draft?.baseVersion, 'the draft names the base the edits build on').toBe(s.baseVersion);
  }
  else expect(w.history.get(s.baseVersion), 'when nothing is unsaved the server holds the document at its base').toBe(s.doc);
  if ((s.phase === 'edited' || s.phase === 'offline') && s.inFlight === null) expect(w.timer, 'unsaved work always has a save coming').toBe(true);
}

function open(start: string): World {
  const w: World = { s: createSaveState<Doc>(), history: new Map([[1, 'base']]), version: 1, draft: null, pending: null, timer: false, expected: 'base', known: 1, edits: 0, now: 0 };
  if (start === 'offline-draft') {
    w.draft = { doc: 'old-draft', baseVersion: 1 };
    w.expected = 'old-draft';
    deliver(w, { kind: 'openedFromDraft', draft: w.draft, reason: 'down', now: 0 });
    return w;
  }
  if (start === 'draft-stale') serverStore(w, 'other2');
  const draft = start === 'clean' ? null : { doc: 'old-draft', baseVersion: 1 };
  w.draft = draft;
  w.expected = draft ? draft.doc : 'base';
  w.known = w.version;
  deliver(w, { kind: 'opened', server: { version: w.version, doc: w.history.get(w.version)! }, draft, hadDraft: draft !== null });
  return w;
}

/**
 * After the storm: one more edit, then the network holds and the quilter keeps their copy of any conflict;
 * that edit must reach the server as its newest version and the draft must go.
 */
function drain(w: World): void {
  act(w, { kind: 'edit' });
  for (let i = 0; i < 20 && !(w.s.phase === 'saved' && !w.pending); i++) {
    if (w.s.phase === 'conflict') act(w, { kind: 'resolve', choice: 'keep-mine' });
    else if (w.pending) act(w, { kind: 'answer', outcome: 'ok' });
    else act(w, { kind: 'tick' });
    checkInvariants(w);
  }
  expect(w.s.phase).toBe('saved');
  expect(w.history.get(w.version), 'the last edit reached the server').toBe(w.expected);
  expect(w.draft).toBeNull();
}

describe('editor/saveMachine: random sequences of edits, answers, outages and other tabs', () => {
  it('never loses an edit, never has two saves in flight, sends only on the latest base, never overwrites silently', () => {
    let runs = 0;
    fc.assert(
      fc.property(startArb, fc.array(actionArb, { minLength: 1, maxLength: 60 }), (start, actions) => {
        runs += 1;
        const w = open(start);
        checkInvariants(w);
        for (const a of actions) {
          act(w, a);
          checkInvariants(w);
        }
        drain(w);
      }),
      { numRuns: 2_000, seed: 20261205 },
    );
    expect(runs).toBeGreaterThanOrEqual(2_000);
  });
});
