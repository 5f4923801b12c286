import { useEffect, useRef, useState } from 'react';
import type { Design } from '@shared/design/design.schema.ts';
import { chooseCheckSource, type SaveKind, type SavedCheck } from '@shared/editor/checkSource.ts';
import { apiRequest } from '../designs/apiClient.ts';
import { parseCheckAnswer, toCheckView, type RouteCheckView } from './routeCheckView.ts';

/** Wait after the last edit before asking the server for a route check of its own (ms). */
export const CHECK_DEBOUNCE_MS = 400;

export interface RouteCheckState {
  readonly check: RouteCheckView | null;
  readonly state: 'idle' | 'checking' | 'failed';
  readonly message: string | null;
}

/**
 * The server's route check of the design being edited. Saves carry the check of what they saved
 * (useDesignDocument sends PUT ?check=1), so after a burst of edits the card waits for the save and shows its
 * check: one request per burst. Only when no save will bring a check (just opened, conflict, refused, retrying)
 * does it ask POST …/check itself, CHECK_DEBOUNCE_MS after the last edit, with the unsaved copy; a newer edit aborts
 * the request still on its way. The choice is chooseCheckSource (shared/editor/checkSource.ts).
 */
export function useRouteCheck(designId: string, design: Design | null, saved: SavedCheck | null, save: SaveKind): RouteCheckState {
  const [result, setResult] = useState<RouteCheckState>({ check: null, state: 'idle', message: null });
  const controller = useRef<AbortController | null>(null);

  useEffect(() => {
    if (!design) return;
    // No quilting lines yet: nothing to check (the engine refuses an empty design), and the card says so.
    if (design.lines.length === 0) {
      controller.current?.abort();
      setResult({ check: null, state: 'idle', message: null });
      return;
    }
    const source = chooseCheckSource(design, saved, save);
    if (source.kind !== 'fresh') {
      controller.current?.abort();
      if (source.kind === 'await-save') setResult((r) => ({ ...r, state: 'checking' }));
      else setResult((r) => fromSavedCheck(source.saved, r));
      return;
    }
    setResult((r) => ({ ...r, state: 'checking' }));
    const timer = setTimeout(async () => {
      controller.current?.abort();
      const ac = new AbortController();
      controller.current = ac;
      try {
        const res = await apiRequest('POST', `/api/designs/${designId}/check`, { design }, ac.signal);
        if (ac.signal.aborted) return;
        if (!res.ok) {
          const message = res.error.kind === 'http' && res.error.status === 400 ? res.error.message : `Route check failed: ${res.error.message}`;
          setResult((r) => ({ check: res.error.kind === 'http' && res.error.status === 400 ? null : r.check, state: 'failed', message }));
          return;
        }
        const check = parseCheckAnswer(res.value);
        setResult(check ? { check, state: 'idle', message: null } : { check: null, state: 'failed', message: 'The route check came back in a shape this page does not read.' });
      } catch (error) {
        if (!(error instanceof DOMException && error.name === 'AbortError')) throw error;
      }
    }, CHECK_DEBOUNCE_MS);
    return () => clearTimeout(timer);
  }, [designId, design, saved, save]);

  useEffect(() => () => controller.current?.abort(), []);
  return result;
}

/** The card from a save's check; a refused drawing clears the figures, a busy engine keeps the last ones. */
function fromSavedCheck(saved: SavedCheck, previous: RouteCheckState): RouteCheckState {
  if (saved.check) return { check: toCheckView(saved.check), state: 'idle', message: null };
  const error = saved.checkError;
  if (error?.code === 'invalid_input') return { check: null, state: 'failed', message: error.message };
  return { check: previous.check, state: 'failed', message: `Route check failed: ${error?.message ?? 'no answer.'}` };
}
