import { useEffect, useRef, useState } from 'react';
import type { Design } from '@shared/design/design.schema.ts';
import { apiRequest } from '../designs/apiClient.ts';
import { parseCheckAnswer, type RouteCheckView } from './routeCheckView.ts';

/** Wait after the last edit before asking the server for a route check (ms). */
export const CHECK_DEBOUNCE_MS = 400;

export interface RouteCheckState {
  readonly check: RouteCheckView | null;
  readonly state: 'idle' | 'checking' | 'failed';
  readonly message: string | null;
}

/**
 * The server's route check of the design being edited (the unsaved copy is sent along), refreshed
 * CHECK_DEBOUNCE_MS after each edit. A newer edit aborts the request still on its way.
 */
export function useRouteCheck(designId: string, design: Design | null): RouteCheckState {
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
  }, [designId, design]);

  useEffect(() => () => controller.current?.abort(), []);
  return result;
}
