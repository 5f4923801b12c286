import { assertNever } from '../assertNever.ts';

/**
 * The workbench's save path as a pure state machine: `(state, event) → { state, commands }`. It never touches
 * the network, storage or timers; the hook (src/components/editor/useDesignDocument.ts) carries the commands out
 * and feeds the answers back as events. `D` is the edited document (design, title, notes), opaque here.
 *
 * Edits are numbered: `revision` counts every edit, `savedRevision` is the newest edit the server holds. Both only
 * grow, so an answer for an older send can never mark newer edits saved. Every edit is written to the local draft
 * at once; the draft is cleared only when the server holds the latest edit (or the quilter chose the server's copy).
 */
export type SavePhase =
  /** Edits the server does not hold yet; a save is scheduled. */
  | 'edited'
  /** One save is on its way (edits made meanwhile wait for its answer). */
  | 'saving'
  /** The server holds the latest edit. */
  | 'saved'
  /** Someone saved in between (409); both copies are kept until the quilter chooses. */
  | 'conflict'
  /** The server refused the design (400/413/404); the edits stay here, the next edit tries again. */
  | 'refused'
  /** No answer, 5xx or 429: the edits stay in the draft and are sent again after a backoff. */
  | 'offline';

/** The server's copy of the document at a version (from a load, a 409 body, or going back). */
export interface ServerCopy<D> {
  readonly version: number;
  readonly doc: D;
}

export interface SaveState<D> {
  readonly phase: SavePhase;
  /** The latest edited document (null only before the first load). */
  readonly doc: D | null;
  readonly revision: number;
  readonly savedRevision: number;
  /** The server version the edits build on: sent as `baseVersion`. */
  readonly baseVersion: number;
  /** The revision of the save on its way, or null: at most one save is ever in flight. */
  readonly inFlight: number | null;
  /** Failed sends in a row (network, 5xx, 429); drives the backoff. */
  readonly attempt: number;
  /** The server's copy while a conflict is open (null when the 409 carried none). */
  readonly server: ServerCopy<D> | null;
  /** Why the last save did not go through (refused or offline), in words for the quilter. */
  readonly message: string;
  /** When the next retry is due (ms, the caller's clock) while offline. */
  readonly retryAt: number;
  /** Bumped whenever the document is replaced wholesale: undo history must restart. */
  readonly generation: number;
}

/** How a save failed, already sorted by the caller (see src/components/editor/saveRetry.ts). */
export type SaveFailure<D> =
  | { readonly kind: 'conflict'; readonly server: ServerCopy<D> | null }
  | { readonly kind: 'refused'; readonly message: string }
  | { readonly kind: 'unavailable'; readonly reason: string; readonly retryAfterMs?: number };

export type SaveEvent<D> =
  /** The design was read: the server's copy, and a local draft from an earlier visit when one differs from it. */
  | { readonly kind: 'opened'; readonly server: ServerCopy<D>; readonly draft: { readonly baseVersion: number; readonly doc: D } | null; readonly hadDraft: boolean }
  /** The server cannot be reached for now but this device holds a draft: keep working on it. */
  | { readonly kind: 'openedFromDraft'; readonly draft: { readonly baseVersion: number; readonly doc: D }; readonly reason: string; readonly now: number }
  | { readonly kind: 'edit'; readonly doc: D }
  | { readonly kind: 'saveSucceeded'; readonly version: number }
  | { readonly kind: 'saveFailed'; readonly failure: SaveFailure<D>; readonly now: number }
  | { readonly kind: 'resolveConflict'; readonly choice: 'reload' | 'keep-mine' }
  /** A 409 from elsewhere (going back to a saved version): the same choice a save's 409 opens. */
  | { readonly kind: 'openConflict'; readonly server: ServerCopy<D> | null }
  /** The document was replaced by the server's answer (going back to a saved version). */
  | { readonly kind: 'replaced'; readonly server: ServerCopy<D> }
  /** The timer the machine asked for went off. */
  | { readonly kind: 'tick' }
  /** The quilter pressed "Try now". */
  | { readonly kind: 'saveNow' }
  /** The browser is back online. */
  | { readonly kind: 'online' };

export type SaveCommand<D> =
  | { readonly kind: 'send'; readonly doc: D; readonly baseVersion: number }
  | { readonly kind: 'writeDraft'; readonly doc: D; readonly baseVersion: number }
  | { readonly kind: 'clearDraft' }
  /** Replace any pending timer: `tick` after `ms`. */
  | { readonly kind: 'schedule'; readonly ms: number }
  | { readonly kind: 'cancelSchedule' };

export interface SaveStep<D> {
  readonly state: SaveState<D>;
  readonly commands: readonly SaveCommand<D>[];
}

/** Wait after the last edit before saving (ms): one save per burst of edits. */
export const SAVE_DEBOUNCE_MS = 800;
/** Wait before sending a draft found on load whose base is still the server's version (ms). */
export const DRAFT_RESEND_MS = 300;
/** Longest wait we accept from a Retry-After (ms): a save should not sit for minutes on a bad header. */
export const MAX_RETRY_AFTER_MS = 60_000;

/** First retry after 1 s, doubling up to 30 s (common practice for backoff, no source). */
export function retryDelayMs(attempt: number): number {
  return Math.min(30_000, 1000 * 2 ** Math.max(0, attempt - 1));
}

export function createSaveState<D>(): SaveState<D> {
  return { phase: 'saved', doc: null, revision: 0, savedRevision: 0, baseVersion: 0, inFlight: null, attempt: 0, server: null, message: '', retryAt: 0, generation: 0 };
}

/** True while edits exist that the server does not hold (leaving the page would need the draft). */
export function hasUnsavedEdits(state: SaveState<unknown>): boolean {
  return state.revision !== state.savedRevision;
}

/** One step of the save path. Commands are carried out in order. */
export function stepSave<D>(state: SaveState<D>, event: SaveEvent<D>): SaveStep<D> {
  switch (event.kind) {
    case 'opened':
      return opened(state, event.server, event.draft, event.hadDraft);
    case 'openedFromDraft': {
      const delay = retryDelayMs(1);
      const next: SaveState<D> = { ...state, phase: 'offline', doc: event.draft.doc, baseVersion: event.draft.baseVersion, revision: state.revision + 1, attempt: 1, message: event.reason, retryAt: event.now + delay, server: null, generation: state.generation + 1 };
      return { state: next, commands: [{ kind: 'schedule', ms: delay }] };
    }
    case 'edit': {
      const edited = { ...state, doc: event.doc, revision: state.revision + 1 };
      const draft: SaveCommand<D> = { kind: 'writeDraft', doc: event.doc, baseVersion: state.baseVersion };
      if (state.phase === 'conflict') return { state: edited, commands: [draft] };
      const phase = state.inFlight === null ? 'edited' : 'saving';
      return { state: { ...edited, phase }, commands: [draft, { kind: 'schedule', ms: SAVE_DEBOUNCE_MS }] };
    }
    case 'saveSucceeded':
      return succeeded(state, event.version);
    case 'saveFailed':
      return failed(state, event.failure, event.now);
    case 'resolveConflict':
      return resolve(state, event.choice);
    case 'openConflict':
      return { state: { ...state, phase: 'conflict', server: event.server }, commands: [{ kind: 'cancelSchedule' }] };
    case 'replaced': {
      const { version, doc } = event.server;
      const next: SaveState<D> = { ...state, phase: state.inFlight === null ? 'saved' : 'saving', doc, baseVersion: version, savedRevision: state.revision, attempt: 0, server: null, message: '', generation: state.generation + 1 };
      return { state: next, commands: [{ kind: 'cancelSchedule' }, { kind: 'clearDraft' }] };
    }
    case 'tick':
      return trySend(state);
    case 'saveNow':
      return trySend({ ...state, attempt: 0 });
    case 'online':
      return state.attempt > 0 ? trySend(state) : { state, commands: [] };
    default:
      return assertNever(event);
  }
}

function opened<D>(state: SaveState<D>, server: ServerCopy<D>, draft: { readonly baseVersion: number; readonly doc: D } | null, hadDraft: boolean): SaveStep<D> {
  const base: SaveState<D> = { ...state, phase: 'saved', doc: server.doc, baseVersion: server.version, savedRevision: state.revision, attempt: 0, server: null, message: '', generation: state.generation + 1 };
  if (!draft) return { state: base, commands: hadDraft ? [{ kind: 'clearDraft' }] : [] };
  const withDraft = { ...base, doc: draft.doc, revision: state.revision + 1 };
  // The draft was made on the version the server still has: send it. Otherwise someone saved since: ask.
  if (draft.baseVersion === server.version) return { state: { ...withDraft, phase: 'edited' }, commands: [{ kind: 'schedule', ms: DRAFT_RESEND_MS }] };
  return { state: { ...withDraft, phase: 'conflict', baseVersion: draft.baseVersion, server }, commands: [] };
}

/** Sends the latest edit when there is one, nothing is in flight, no conflict is open and the last send was not refused (a new edit tries again). */
function trySend<D>(state: SaveState<D>): SaveStep<D> {
  const blocked = state.phase === 'conflict' || state.phase === 'refused' || state.inFlight !== null || state.doc === null || !hasUnsavedEdits(state);
  if (blocked) return { state, commands: [] };
  return {
    state: { ...state, phase: 'saving', inFlight: state.revision },
    commands: [{ kind: 'send', doc: state.doc, baseVersion: state.baseVersion }],
  };
}

function succeeded<D>(state: SaveState<D>, version: number): SaveStep<D> {
  if (state.inFlight === null) return { state, commands: [] };
  const savedRevision = Math.max(state.savedRevision, state.inFlight);
  const next: SaveState<D> = { ...state, inFlight: null, savedRevision, baseVersion: Math.max(state.baseVersion, version), attempt: 0, message: '' };
  if (state.phase === 'conflict') return { state: next, commands: [] };
  if (next.revision === savedRevision) return { state: { ...next, phase: 'saved' }, commands: [{ kind: 'clearDraft' }] };
  // Edits arrived while the save was on its way: keep them under the new base and save again after a pause.
  return {
    state: { ...next, phase: 'edited' },
    commands: [{ kind: 'writeDraft', doc: next.doc as D, baseVersion: next.baseVersion }, { kind: 'schedule', ms: SAVE_DEBOUNCE_MS }],
  };
}

function failed<D>(state: SaveState<D>, failure: SaveFailure<D>, now: number): SaveStep<D> {
  if (state.inFlight === null) return { state, commands: [] };
  const landed = { ...state, inFlight: null };
  if (state.phase === 'conflict') return { state: landed, commands: [] };
  switch (failure.kind) {
    case 'conflict':
      return { state: { ...landed, phase: 'conflict', server: failure.server }, commands: [{ kind: 'cancelSchedule' }] };
    case 'refused':
      return { state: { ...landed, phase: 'refused', message: failure.message }, commands: [{ kind: 'cancelSchedule' }] };
    case 'unavailable': {
      const attempt = state.attempt + 1;
      const asked = failure.retryAfterMs;
      const ms = asked === undefined ? retryDelayMs(attempt) : Math.min(MAX_RETRY_AFTER_MS, Math.max(asked, 500));
      return { state: { ...landed, phase: 'offline', attempt, message: failure.reason, retryAt: now + ms }, commands: [{ kind: 'schedule', ms }] };
    }
    default:
      return assertNever(failure);
  }
}

function resolve<D>(state: SaveState<D>, choice: 'reload' | 'keep-mine'): SaveStep<D> {
  if (state.phase !== 'conflict') return { state, commands: [] };
  const copy = state.server;
  if (!copy) {
    // The 409 carried no copy: there is nothing to reload, so either choice sends mine again (if anything is unsaved).
    const phase = hasUnsavedEdits(state) ? 'edited' : state.inFlight === null ? 'saved' : 'saving';
    const next = trySend({ ...state, phase, server: null });
    return phase === 'edited' && next.commands.length === 0 ? { state: next.state, commands: [{ kind: 'schedule', ms: SAVE_DEBOUNCE_MS }] } : next;
  }
  if (choice === 'reload') {
    const next: SaveState<D> = { ...state, phase: state.inFlight === null ? 'saved' : 'saving', doc: copy.doc, baseVersion: copy.version, savedRevision: state.revision, attempt: 0, server: null, generation: state.generation + 1 };
    return { state: next, commands: [{ kind: 'clearDraft' }] };
  }
  // Keep mine: the quilter chose to send this copy over the server's, so it now builds on the server's version.
  const mine: SaveState<D> = { ...state, phase: 'edited', baseVersion: copy.version, server: null, revision: state.revision + 1 };
  const sent = trySend(mine);
  return { state: sent.state, commands: [{ kind: 'writeDraft', doc: state.doc as D, baseVersion: copy.version }, ...sent.commands] };
}
