import { useCallback, useEffect, useRef, useState } from 'react';
import { acknowledgeProgress, findPending, findQueued, nextMoveInstant, queueProgress } from '@shared/walkthrough/progressQueue.ts';
import { sendJson } from '../ui/submitJson.ts';
import { loadProgressQueue, saveProgressQueue } from './progressStore.ts';

/**
 * What the quilter sees about saving: off (a template walkthrough), saved, saving, kept on this device until the
 * connection is back (offline or the server unreachable), or refused by the server (the lesson is gone).
 */
export type ProgressSaveState = 'off' | 'saved' | 'saving' | 'kept' | 'refused';

/** Where progress goes: the lesson and the signed-in student (the queue on the device is kept per student). */
export interface ProgressTarget {
  readonly url: string;
  readonly lessonId: string;
  readonly studentId: string;
}

export interface ProgressSync {
  readonly state: ProgressSaveState;
  readonly finished: boolean;
  /** Records the step the student is on (0-based) out of `totalSteps`; kept on the device at once, sent after a short pause. */
  report(stepIndex: number, totalSteps: number): void;
  /** Marks the lesson done (or re-opens it) and sends at once. */
  setFinished(finished: boolean, totalSteps: number): void;
}

const DEBOUNCE_MS = 600;
const RETRY_MS = 5000;

/**
 * Saves walkthrough progress through PUT /api/lessons/:id/progress ({ stepIndex, totalSteps, finished, at }). Every
 * move goes into the device's queue first (localStorage, shared/walkthrough/progressQueue.ts) stamped with when it was
 * made, then to the server; it stays pending until the server has taken it (and is kept afterwards as the device's
 * last known place, so an older copy of the page opened offline resumes from it). Without a connection the queue
 * holds the newest place and is sent when the browser is back online (and every 5 s meanwhile). The server ignores
 * a save older than the one it holds, so a re-sent save never moves the student back. `target` null turns saving off.
 */
export function useProgressSync(target: ProgressTarget | null, initialFinished: boolean): ProgressSync {
  const [state, setState] = useState<ProgressSaveState>(target ? 'saved' : 'off');
  const [finished, setFinishedState] = useState(initialFinished);
  const last = useRef({ finished: initialFinished, at: null as string | null });
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const busy = useRef(false);
  const { url, lessonId, studentId } = target ?? { url: null, lessonId: '', studentId: '' };

  const flush = useCallback(async (): Promise<void> => {
    if (!url || busy.current) return;
    const entry = findPending(loadProgressQueue(), lessonId, studentId);
    if (!entry) return;
    busy.current = true;
    setState('saving');
    const res = await sendJson('PUT', url, { stepIndex: entry.stepIndex, totalSteps: entry.totalSteps, finished: entry.finished, at: entry.at });
    busy.current = false;
    if (res.ok || (res.error.status >= 400 && res.error.status < 500 && res.error.status !== 408 && res.error.status !== 429)) {
      // Taken, or refused for good (the lesson is gone, the student left the class): either way it leaves the queue.
      saveProgressQueue(acknowledgeProgress(loadProgressQueue(), entry));
      if (!res.ok) return setState('refused');
      if (findPending(loadProgressQueue(), lessonId, studentId)) return flush();
      return setState('saved');
    }
    setState('kept');
    if (timer.current) clearTimeout(timer.current);
    timer.current = setTimeout(() => void flush(), RETRY_MS);
  }, [url, lessonId, studentId]);

  const schedule = useCallback((delay: number) => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = setTimeout(() => void flush(), delay);
  }, [flush]);

  // Send what an earlier visit left on the device, and send again as soon as the connection is back.
  useEffect(() => {
    if (!url) return;
    const known = findQueued(loadProgressQueue(), lessonId, studentId);
    if (known) last.current.at = known.at;
    if (known?.pending) {
      setState(navigator.onLine ? 'saving' : 'kept');
      schedule(0);
    }
    const onOnline = () => schedule(0);
    const onOffline = () => {
      if (findPending(loadProgressQueue(), lessonId, studentId)) setState('kept');
    };
    window.addEventListener('online', onOnline);
    window.addEventListener('offline', onOffline);
    return () => {
      window.removeEventListener('online', onOnline);
      window.removeEventListener('offline', onOffline);
      if (timer.current) clearTimeout(timer.current);
    };
  }, [url, lessonId, studentId, schedule]);

  const keep = useCallback((stepIndex: number, totalSteps: number, done: boolean): void => {
    const at = nextMoveInstant(last.current.at, Date.now());
    last.current.at = at;
    saveProgressQueue(queueProgress(loadProgressQueue(), { lessonId, studentId, stepIndex, totalSteps, finished: done, at }));
    if (!navigator.onLine) setState('kept');
  }, [lessonId, studentId]);

  const report = useCallback((stepIndex: number, totalSteps: number) => {
    if (!url) return;
    keep(stepIndex, totalSteps, last.current.finished);
    schedule(DEBOUNCE_MS);
  }, [url, keep, schedule]);

  const setFinished = useCallback((done: boolean, totalSteps: number) => {
    last.current.finished = done;
    setFinishedState(done);
    if (!url) return;
    const queued = findQueued(loadProgressQueue(), lessonId, studentId);
    const stepIndex = done ? Math.max(0, totalSteps - 1) : (queued?.stepIndex ?? Math.max(0, totalSteps - 1));
    keep(stepIndex, totalSteps, done);
    schedule(0);
  }, [url, lessonId, studentId, keep, schedule]);

  return { state, finished, report, setFinished };
}
