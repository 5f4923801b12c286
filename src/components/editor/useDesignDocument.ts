import { useCallback, useEffect, useRef, useState } from 'react';
import type { Design } from '@shared/design/design.schema.ts';
import { apiRequest } from '../designs/apiClient.ts';
import { savedWithCheckAnswerSchema, type DesignRecord } from '@shared/contract/designs.ts';
import type { SavedCheck } from '@shared/editor/checkSource.ts';
import { parseDesignRecord } from '../designs/designsApi.ts';
import { clearDraft, loadDraft, saveDraft } from './draftStore.ts';
import { canWorkOnDraftWhileUnavailable, saveFailureAction } from './saveRetry.ts';
import { retryDelayMs, type SaveStatus } from './saveStatus.ts';

/** Wait after the last edit before saving (ms): one save per burst of edits. */
const SAVE_DEBOUNCE_MS = 800;

export type DocumentLoad =
  | { readonly state: 'loading' }
  | { readonly state: 'missing'; readonly message: string }
  | { readonly state: 'ready' };

export interface DesignDocument {
  readonly load: DocumentLoad;
  readonly design: Design | null;
  readonly title: string;
  readonly version: number;
  readonly status: SaveStatus;
  /** The server's copy while a conflict is open. */
  readonly serverCopy: DesignRecord | null;
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
 * The design as saved on the server and as being edited here: loads it (preferring unsaved local edits
 * from an earlier visit), keeps every edit in localStorage at once, autosaves after a pause, retries with
 * backoff when the network or server fails, and on 409 keeps both copies until the quilter chooses.
 */
export function useDesignDocument(designId: string): DesignDocument {
  const [load, setLoad] = useState<DocumentLoad>({ state: 'loading' });
  const [design, setDesignState] = useState<Design | null>(null);
  const [title, setTitleState] = useState('');
  const [status, setStatus] = useState<SaveStatus>({ kind: 'saved' });
  const [serverCopy, setServerCopy] = useState<DesignRecord | null>(null);
  const [savedCheck, setSavedCheck] = useState<SavedCheck | null>(null);
  const [generation, setGeneration] = useState(0);
  const s = useRef({ version: 0, notes: '', revision: 0, savedRevision: 0, inFlight: false, attempt: 0, timer: 0 as number | ReturnType<typeof setTimeout>, design: null as Design | null, title: '', conflict: false, refused: false });
  const [version, setVersion] = useState(0);

  const schedule = useCallback((ms: number, fn: () => void) => {
    clearTimeout(s.current.timer);
    s.current.timer = setTimeout(fn, ms);
  }, []);

  const writeDraft = useCallback(() => {
    const st = s.current;
    if (st.design) saveDraft(window.localStorage, designId, { baseVersion: st.version, title: st.title, design: st.design, writtenAt: Date.now() });
  }, [designId]);

  const save = useCallback(async (): Promise<void> => {
    const st = s.current;
    if (st.inFlight || st.conflict || !st.design || st.revision === st.savedRevision) return;
    st.inFlight = true;
    const sending = st.revision;
    const sentDesign = st.design;
    setStatus({ kind: 'saving' });
    // ?check=1: the answer carries the route check of the saved drawing, so the card needs no request of its own.
    const res = await apiRequest('PUT', `/api/designs/${designId}?check=1`, { baseVersion: st.version, title: st.title, notes: st.notes, design: sentDesign });
    st.inFlight = false;
    if (res.ok) {
      const answer = savedWithCheckAnswerSchema.safeParse(res.value);
      const record = answer.success ? answer.data.design : parseDesignRecord(res.value);
      if (answer.success) setSavedCheck({ design: sentDesign, check: answer.data.check, checkError: answer.data.checkError });
      st.version = record?.version ?? st.version + 1;
      setVersion(st.version);
      st.savedRevision = sending;
      st.attempt = 0;
      st.refused = false;
      if (st.revision === sending) {
        clearDraft(window.localStorage, designId);
        setStatus({ kind: 'saved' });
      } else {
        writeDraft();
        setStatus({ kind: 'unsaved' });
        schedule(SAVE_DEBOUNCE_MS, () => void save());
      }
      return;
    }
    const f = res.error;
    const action = saveFailureAction(f, st.attempt + 1);
    if (action.kind === 'conflict') {
      const copy = parseDesignRecord(f.kind === 'http' ? f.body : null);
      st.conflict = true;
      setServerCopy(copy);
      setStatus({ kind: 'conflict', serverVersion: copy?.version ?? st.version });
      return;
    }
    if (action.kind === 'refused') {
      st.refused = true;
      setStatus({ kind: 'refused', message: action.message });
      return;
    }
    // Offline, 503 (database restarting), 429…: the edits stay in localStorage and go out again.
    st.attempt += 1;
    setStatus({ kind: 'retrying', attempt: st.attempt, retryAt: Date.now() + action.delayMs, reason: action.reason });
    schedule(action.delayMs, () => void save());
  }, [designId, schedule, writeDraft]);

  const markEdited = useCallback(() => {
    const st = s.current;
    st.revision += 1;
    writeDraft();
    if (st.conflict) return;
    setStatus({ kind: 'unsaved' });
    schedule(SAVE_DEBOUNCE_MS, () => void save());
  }, [save, schedule, writeDraft]);

  useEffect(() => {
    let cancelled = false;
    void (async () => {
      const res = await apiRequest('GET', `/api/designs/${designId}`);
      if (cancelled) return;
      const record = res.ok ? parseDesignRecord(res.value) : null;
      if (!record) {
        const draft = loadDraft(window.localStorage, designId);
        if (!res.ok && canWorkOnDraftWhileUnavailable(res.error) && draft) {
          // Offline or server down for now (e.g. 503 while the database restarts) with local edits: keep working
          // on them; they are sent once the server answers.
          Object.assign(s.current, { version: draft.baseVersion, design: draft.design, title: draft.title, revision: 1, savedRevision: 0 });
          setDesignState(draft.design);
          setTitleState(draft.title);
          setVersion(draft.baseVersion);
          setLoad({ state: 'ready' });
          setStatus({ kind: 'retrying', attempt: 1, retryAt: Date.now() + retryDelayMs(1), reason: res.error.message });
          schedule(retryDelayMs(1), () => void save());
          return;
        }
        setLoad({ state: 'missing', message: res.ok ? 'The design could not be read.' : res.error.message });
        return;
      }
      const draft = loadDraft(window.localStorage, designId);
      const st = s.current;
      Object.assign(st, { version: record.version, notes: record.notes, design: record.design, title: record.title, revision: 0, savedRevision: 0 });
      let shown = record.design;
      let shownTitle = record.title;
      if (draft && JSON.stringify(draft.design) !== JSON.stringify(record.design)) {
        shown = draft.design;
        shownTitle = draft.title;
        Object.assign(st, { design: draft.design, title: draft.title, revision: 1 });
        if (draft.baseVersion === record.version) {
          setStatus({ kind: 'unsaved' });
          schedule(300, () => void save());
        } else {
          st.conflict = true;
          setServerCopy(record);
          setStatus({ kind: 'conflict', serverVersion: record.version });
        }
      } else if (draft) {
        clearDraft(window.localStorage, designId);
      }
      setDesignState(shown);
      setTitleState(shownTitle);
      setVersion(record.version);
      setGeneration((g) => g + 1);
      setLoad({ state: 'ready' });
    })();
    return () => {
      cancelled = true;
    };
  }, [designId, save, schedule]);

  useEffect(() => {
    const st = s.current;
    const retry = () => {
      if (s.current.attempt > 0) void save();
    };
    const warn = (e: BeforeUnloadEvent) => {
      if (s.current.revision !== s.current.savedRevision) e.preventDefault();
    };
    window.addEventListener('online', retry);
    window.addEventListener('beforeunload', warn);
    return () => {
      window.removeEventListener('online', retry);
      window.removeEventListener('beforeunload', warn);
      clearTimeout(st.timer);
    };
  }, [save]);

  const setDesign = useCallback((next: Design) => {
    s.current.design = next;
    setDesignState(next);
    markEdited();
  }, [markEdited]);

  const setTitle = useCallback((next: string) => {
    s.current.title = next;
    setTitleState(next);
    markEdited();
  }, [markEdited]);

  const resolveConflict = useCallback((choice: 'reload' | 'keep-mine') => {
    const st = s.current;
    const copy = serverCopy;
    st.conflict = false;
    setServerCopy(null);
    if (!copy) {
      setStatus({ kind: 'unsaved' });
      void save();
      return;
    }
    st.version = copy.version;
    setVersion(copy.version);
    if (choice === 'reload') {
      Object.assign(st, { design: copy.design, title: copy.title, notes: copy.notes, revision: 0, savedRevision: 0 });
      clearDraft(window.localStorage, designId);
      setDesignState(copy.design);
      setTitleState(copy.title);
      setGeneration((g) => g + 1);
      setStatus({ kind: 'saved' });
    } else {
      writeDraft();
      setStatus({ kind: 'unsaved' });
      void save();
    }
  }, [designId, save, serverCopy, writeDraft]);

  const saveNow = useCallback(() => {
    s.current.attempt = 0;
    void save();
  }, [save]);

  const replaceFromServer = useCallback((record: DesignRecord) => {
    const st = s.current;
    clearTimeout(st.timer);
    Object.assign(st, { version: record.version, design: record.design, title: record.title, notes: record.notes, revision: 0, savedRevision: 0, conflict: false, attempt: 0, refused: false });
    clearDraft(window.localStorage, designId);
    setServerCopy(null);
    setVersion(record.version);
    setDesignState(record.design);
    setTitleState(record.title);
    setGeneration((g) => g + 1);
    setStatus({ kind: 'saved' });
  }, [designId]);

  const openConflict = useCallback((server: DesignRecord | null) => {
    s.current.conflict = true;
    setServerCopy(server);
    setStatus({ kind: 'conflict', serverVersion: server?.version ?? s.current.version });
  }, []);

  return { load, design, title, version, status, serverCopy, savedCheck, generation, setDesign, setTitle, resolveConflict, saveNow, replaceFromServer, openConflict };
}
