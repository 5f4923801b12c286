import { useCallback, useEffect, useRef, useState } from 'react';
import { sendJson } from '../ui/submitJson.ts';

/** What the quilter sees about saving: off (a template walkthrough), saved, saving, or waiting to retry. */
export type ProgressSaveState = 'off' | 'saved' | 'saving' | 'retrying';

export interface ProgressSync {
  readonly state: ProgressSaveState;
  readonly finished: boolean;
  /** Records the step the student is on (0-based) out of `totalSteps`; saved after a short pause. */
  report(stepIndex: number, totalSteps: number): void;
  /** Marks the lesson done (or re-opens it) and saves at once. */
  setFinished(finished: boolean, totalSteps: number): void;
}

const DEBOUNCE_MS = 600;
const RETRY_MS = 5000;

/**
 * Saves walkthrough progress through T1's PUT /api/lessons/:id/progress ({ stepIndex, totalSteps, finished }).
 * The newest place wins: a report made while a save is under way is sent after it; a failed save is retried
 * every 5 s until it goes through, so a dropped connection at the machine loses nothing. `url` null turns saving off.
 */
export function useProgressSync(url: string | null, initialFinished: boolean): ProgressSync {
  const [state, setState] = useState<ProgressSaveState>(url ? 'saved' : 'off');
  const [finished, setFinishedState] = useState(initialFinished);
  const pending = useRef<{ stepIndex: number; totalSteps: number; finished: boolean } | null>(null);
  const last = useRef({ finished: initialFinished });
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const busy = useRef(false);

  const flush = useCallback(async (): Promise<void> => {
    if (!url || busy.current || !pending.current) return;
    const body = pending.current;
    pending.current = null;
    busy.current = true;
    setState('saving');
    const res = await sendJson('PUT', url, body);
    busy.current = false;
    if (!res.ok) {
      pending.current ??= body;
      setState('retrying');
      timer.current = setTimeout(() => void flush(), RETRY_MS);
      return;
    }
    if (pending.current) return flush();
    setState('saved');
  }, [url]);

  const schedule = useCallback((delay: number) => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = setTimeout(() => void flush(), delay);
  }, [flush]);

  useEffect(() => () => {
    if (timer.current) clearTimeout(timer.current);
  }, []);

  const report = useCallback((stepIndex: number, totalSteps: number) => {
    if (!url) return;
    pending.current = { stepIndex, totalSteps, finished: last.current.finished };
    schedule(DEBOUNCE_MS);
  }, [url, schedule]);

  const setFinished = useCallback((done: boolean, totalSteps: number) => {
    last.current.finished = done;
    setFinishedState(done);
    if (!url) return;
    const stepIndex = pending.current?.stepIndex ?? Math.max(0, totalSteps - 1);
    pending.current = { stepIndex: done ? Math.max(0, totalSteps - 1) : stepIndex, totalSteps, finished: done };
    schedule(0);
  }, [url, schedule]);

  return { state, finished, report, setFinished };
}
