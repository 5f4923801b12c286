import { problemSchema } from '@shared/contract/errors.ts';
import { err, ok, type Result } from '@shared/result.ts';

/** What went wrong with a request, as the UI needs to tell it apart. */
export type ApiFailure =
  | { readonly kind: 'offline'; readonly message: string }
  | {
      readonly kind: 'http';
      readonly status: number;
      readonly code: string;
      readonly message: string;
      readonly body: unknown;
      /** From a Retry-After header in seconds (429, 503), when the server sent one. */
      readonly retryAfterMs?: number;
    };

/**
 * Sends a JSON request to the app's own API and returns the parsed body, or a failure value:
 * `offline` when the network or server did not answer, `http` for any non-2xx answer (with the
 * `{ error: { code, message } }` body the API sends). Never throws for an expected failure.
 */
export async function apiRequest(method: 'GET' | 'POST' | 'PUT' | 'DELETE', path: string, body?: unknown, signal?: AbortSignal): Promise<Result<unknown, ApiFailure>> {
  let res: Response;
  try {
    const init: RequestInit = { method, credentials: 'same-origin', headers: { accept: 'application/json' } };
    if (body !== undefined) {
      init.body = JSON.stringify(body);
      init.headers = { accept: 'application/json', 'content-type': 'application/json' };
    }
    if (signal) init.signal = signal;
    res = await fetch(path, init);
  } catch (error) {
    if (error instanceof DOMException && error.name === 'AbortError') throw error;
    return err({ kind: 'offline', message: 'The server could not be reached.' });
  }
  const text = await res.text();
  let data: unknown = null;
  try {
    data = text ? JSON.parse(text) : null;
  } catch {
    data = null;
  }
  if (res.ok) return ok(data);
  if (res.status >= 502 && res.status <= 504 && data === null) return err({ kind: 'offline', message: `The server is not answering (${res.status}).` });
  const problem = problemSchema.safeParse(data);
  const e = problem.success ? problem.data.error : null;
  const retryAfter = Number(res.headers.get('retry-after') ?? Number.NaN);
  return err({
    kind: 'http',
    status: res.status,
    code: e?.code ?? 'unknown',
    message: e?.message ?? `Request failed (${res.status}).`,
    body: data,
    ...(Number.isFinite(retryAfter) && retryAfter >= 0 ? { retryAfterMs: retryAfter * 1000 } : {}),
  });
}
