// Browser side of the API's one error shape. Islands call sendJson() and get either the parsed body or
// { message, fields } to show beside the form and its inputs. Error bodies are read with the contract's problemSchema.
import '../zodJitless.ts'; // first: before the contract's schemas are built (see the file)
import { problemSchema } from '@shared/contract/errors.ts';
export interface ApiFailure {
  status: number;
  code: string;
  message: string;
  fields: Record<string, string>;
}

export type ApiOutcome<T> = { ok: true; status: number; data: T } | { ok: false; error: ApiFailure };

export async function sendJson<T = unknown>(method: 'POST' | 'PUT' | 'PATCH' | 'DELETE' | 'GET', url: string, body?: unknown): Promise<ApiOutcome<T>> {
  let res: Response;
  try {
    res = await fetch(url, {
      method,
      headers: body === undefined ? {} : { 'content-type': 'application/json' },
      body: body === undefined ? null : JSON.stringify(body),
      credentials: 'same-origin',
    });
  } catch {
    return { ok: false, error: { status: 0, code: 'network', message: 'Could not reach Threadway. Check your connection and try again.', fields: {} } };
  }
  const data: unknown = res.status === 204 ? null : await res.json().catch(() => null);
  if (res.ok) return { ok: true, status: res.status, data: data as T };
  const problem = problemSchema.safeParse(data);
  const e = problem.success ? problem.data.error : undefined;
  return {
    ok: false,
    error: { status: res.status, code: e?.code ?? 'unknown', message: e?.message ?? `The request failed (${res.status}).`, fields: e?.fields ?? {} },
  };
}
