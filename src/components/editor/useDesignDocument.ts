import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { assertNever } from '@shared/assertNever.ts';
import { savedWithCheckAnswerSchema, type DesignRecord } from '@shared/contract/designs.ts';
import type { Design } from '@shared/design/design.schema.ts';
import type { SavedCheck } from '@shared/editor/checkSource.ts';
import { createSaveState, hasUnsavedEdits, stepSave, type SaveCommand, type SaveEvent, type SaveState } from '@shared/editor/saveMachine.ts';
import { apiRequest } from '../designs/apiClient.ts';
import { parseDesignRecord } from '../designs/designsApi.ts';
import { clearDraft, loadDraft, saveDraft } from './draftStore.ts';
import { serverCopyOf, type EditedDocument } from './editedDocument.ts';
import { canWorkOnDraftWhileUnavailable, sortSaveFailure } from './saveRetry.ts';
import { saveStatusOf, type SaveStatus } from './saveStatus.ts';

export type DocumentLoad =
  | { readonly state: 'loading' }
  | { readonly state: 'missing'; readonly message: string }
  | { readonly state: 'ready' };

export interface DesignDocument {
  readonly load: DocumentLoad;
  readonly design: Design | null;
  readonly title: string;
  /** The server version the edits build on. */
  readonly version: number;
  readonly status: SaveStatus;
  /** The route check the last save answered with, for the document it sent (saves ask for it: PUT ?check=1). */
  readonly savedCheck: SavedCheck | null;
  /** Bumped whenever the document is replaced wholesale (load, reload): undo history must restart. */
  readonly generation: number;
  /** Sets the document after an edit (the history applies commands and hands the result here). */
  setDesign(design: Design): void;
  setTitle(title: string): void;
  /** Conflict: take the server's copy (drops my edits) or send mine over it. */
  resolveConflict(choice: 'reload' | 'keep-mine'): void;
  saveNow(): void;
  /** Replaces the document with the server's answer (going back to a saved version): undo history restarts. */
  replaceFromServer(record: DesignRecord): void;
  /** A 409 from elsewhere (going back): opens the same conflict choice a save's 409 opens. */
  openConflict(server: DesignRecord | null): void;
}

/**
 * The design as saved on the server and as being edited here. The save path is the pure state machine in
 * shared/editor/saveMachine.ts (debounced autosave, one save in flight, local draft, retry with backoff, the
 * conflict choice); this hook only loads the design and carries the machine's commands out with fetch,
 * localStorage and one timer, feeding the answers back as events.
 */
export function useDesignDocument(designId: string): DesignDocument {
  const [load, setLoad] = useState<DocumentLoad>({ state: 'loading' });
  const [machine, setMachine] = useState<SaveState<EditedDocument>>(createSaveState);
  // The machine's state for event handlers and async answers (React state lags a render behind).
  const current = useRef(machine);
  const timer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  const [savedCheck, setSavedCheck] = useState<SavedCheck | null>(null);

  const dispatch = useMemo(() => {
    const run = (event: SaveEvent<EditedDocument>): void => {
      const step = stepSave(current.current, event);
      current.current = step.state;
      setMachine(step.state);
      for (const command of step.commands) carryOut(command);
    };
    const send = async (doc: EditedDocument, baseVersion: number): Promise<void> => {
      // ?check=1: the answer carries the route check of the saved drawing, so the card needs no request of its own.
      const res = await apiRequest('PUT', `/api/designs/${designId}?check=1`, { baseVersion, title: doc.title, notes: doc.notes, design: doc.design });
      if (!res.ok) return run({ kind: 'saveFailed', failure: sortSaveFailure(res.error), now: Date.now() });
      const answer = savedWithCheckAnswerSchema.safeParse(res.value);
      const record = answer.success ? answer.data.design : parseDesignRecord(res.value);
      if (answer.success) setSavedCheck({ design: doc.design, check: answer.data.check, checkError: answer.data.checkError });
      run({ kind: 'saveSucceeded', version: record?.version ?? baseVersion + 1 });
    };
    const carryOut = (c: SaveCommand<EditedDocument>): void => {
      switch (c.kind) {
        case 'send':
          void send(c.doc, c.baseVersion);
          return;
        case 'writeDraft':
          saveDraft(window.localStorage, designId, { baseVersion: c.baseVersion, title: c.doc.title, design: c.doc.design, writtenAt: Date.now() });
          return;
        case 'clearDraft':
          clearDraft(window.localStorage, designId);
          return;
        case 'schedule':
          clearTimeout(timer.current);
          timer.current = setTimeout(() => run({ kind: 'tick' }), c.ms);
          return;
        case 'cancelSchedule':
          clearTimeout(timer.current);
          return;
        default:
          assertNever(c);
      }
    };
    return run;
  }, [designId]);

  useEffect(() => {
    let cancelled = false;
    void (async () => {
      const res = await apiRequest('GET', `/api/designs/${designId}`);
      if (cancelled) return;
      const record = res.ok ? parseDesignRecord(res.value) : null;
      const draft = loadDraft(window.localStorage, designId);
      if (!record) {
        if (!res.ok && canWorkOnDraftWhileUnavailable(res.error) && draft) {
          // Offline or server down for now (e.g. 503 while the database restarts) with local edits: keep working
          // on them; they are sent once the server answers.
          const doc = { design: draft.design, title: draft.title, notes: '' };
          dispatch({ kind: 'openedFromDraft', draft: { baseVersion: draft.baseVersion, doc }, reason: res.error.message, now: Date.now() });
          setLoad({ state: 'ready' });
          return;
        }
        setLoad({ state: 'missing', message: res.ok ? 'The design could not be read.' : res.error.message });
        return;
      }
      const differs = draft !== null && JSON.stringify(draft.design) !== JSON.stringify(record.design);
      const kept = differs ? { baseVersion: draft.baseVersion, doc: { design: draft.design, title: draft.title, notes: record.notes } } : null;
      dispatch({ kind: 'opened', server: serverCopyOf(record), draft: kept, hadDraft: draft !== null });
      setLoad({ state: 'ready' });
    })();
    return () => {
      cancelled = true;
    };
  }, [designId, dispatch]);

  useEffect(() => {
    const online = () => dispatch({ kind: 'online' });
    const warn = (e: BeforeUnloadEvent) => {
      if (hasUnsavedEdits(current.current)) e.preventDefault();
    };
    window.addEventListener('online', online);
    window.addEventListener('beforeunload', warn);
    return () => {
      window.removeEventListener('online', online);
      window.removeEventListener('beforeunload', warn);
      clearTimeout(timer.current);
    };
  }, [dispatch]);

  const edit = useCallback((change: Partial<EditedDocument>) => {
    const doc = current.current.doc;
    if (doc) dispatch({ kind: 'edit', doc: { ...doc, ...change } });
  }, [dispatch]);
  const setDesign = useCallback((design: Design) => edit({ design }), [edit]);
  const setTitle = useCallback((title: string) => edit({ title }), [edit]);
  const resolveConflict = useCallback((choice: 'reload' | 'keep-mine') => dispatch({ kind: 'resolveConflict', choice }), [dispatch]);
  const saveNow = useCallback(() => dispatch({ kind: 'saveNow' }), [dispatch]);
  const replaceFromServer = useCallback((record: DesignRecord) => dispatch({ kind: 'replaced', server: serverCopyOf(record) }), [dispatch]);
  const openConflict = useCallback((server: DesignRecord | null) => dispatch({ kind: 'openConflict', server: server ? serverCopyOf(server) : null }), [dispatch]);

  const status = useMemo(() => saveStatusOf(machine), [machine]);
  return {
    load,
    design: machine.doc?.design ?? null,
    title: machine.doc?.title ?? '',
    version: machine.baseVersion,
    status,
    savedCheck,
    generation: machine.generation,
    setDesign,
    setTitle,
    resolveConflict,
    saveNow,
    replaceFromServer,
    openConflict,
  };
}
