// The API's one response shape: JSON bodies, and errors as { error: { code, message, fields? } }.
// `code` comes from a closed union so clients (and tests) can branch on it; `fields` maps an input
// path ("email", "items.0.name") to a message a person can act on.
import type { z } from 'zod';
import { err, ok, type Result } from '../../shared/result.ts';
import { readBytesCapped } from './readBody.ts';

export type ErrorCode =
  | 'invalid_input'
  | 'invalid_json'
  | 'unsupported_media_type'
  | 'payload_too_large'
  | 'unauthenticated'
  | 'not_found'
  | 'forbidden_origin'
  | 'method_not_allowed'
  | 'conflict'
  | 'invalid_credentials'
  | 'invalid_token'
  | 'rate_limited'
  | 'last_admin'
  | 'engine_timeout'
  | 'engine_busy'
  | 'database_unavailable'
  | 'internal';

export type FieldErrors = Readonly<Record<string, string>>;

export interface ProblemBody {
  readonly error: { readonly code: ErrorCode; readonly message: string; readonly fields?: FieldErrors };
}

export function json(data: unknown, status = 200, headers?: HeadersInit): Response {
  const h = new Headers(headers);
  h.set('content-type', 'application/json; charset=utf-8');
  h.set('cache-control', 'no-store');
  return new Response(JSON.stringify(data), { status, headers: h });
}

export function problem(status: number, code: ErrorCode, message: string, fields?: FieldErrors, headers?: HeadersInit): Response {
  const body: ProblemBody = { error: fields ? { code, message, fields } : { code, message } };
  return json(body, status, headers);
}

/** Largest JSON body the API reads (bytes). Account forms are tiny; design endpoints pass their own cap. */
export const DEFAULT_BODY_LIMIT = 64 * 1024;

/**
 * Reads a JSON body and checks it against `schema`. Every failure is already the Response to send:
 * 415 when the body is not declared as JSON, 413 when it is larger than `limit` bytes, 400 for
 * unreadable JSON (`invalid_json`) or a body the schema refuses (`invalid_input`, with `fields`).
 */
export async function readJson<S extends z.ZodType>(
  request: Request,
  schema: S,
  limit = DEFAULT_BODY_LIMIT,
): Promise<Result<z.output<S>, Response>> {
  const type = request.headers.get('content-type') ?? '';
  if (!/^application\/(?:[\w.+-]+\+)?json\b/i.test(type.trim())) {
    return err(problem(415, 'unsupported_media_type', 'Send the request body as JSON (Content-Type: application/json).'));
  }
  const bytes = await readBytesCapped(request, limit);
  if (bytes === null) return err(tooLarge(limit));
  let data: unknown;
  try {
    data = JSON.parse(new TextDecoder('utf-8', { fatal: false }).decode(bytes));
  } catch {
    return err(problem(400, 'invalid_json', 'The request body is not valid JSON.'));
  }
  const parsed = schema.safeParse(data);
  if (!parsed.success) return err(invalidInput(parsed.error));
  return ok(parsed.data);
}

/** 400 for a zod failure: one message per field path (the first issue wins). */
export function invalidInput(error: z.ZodError, message = 'Some fields need attention.'): Response {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const at = issue.path.map(String);
    if (issue.code === 'unrecognized_keys') {
      for (const k of issue.keys) fields[[...at, k].join('.')] ??= 'This field is not accepted here.';
      continue;
    }
    fields[at.length ? at.join('.') : 'body'] ??= issue.message;
  }
  return problem(400, 'invalid_input', message, fields);
}

function tooLarge(limit: number): Response {
  return problem(413, 'payload_too_large', `The request body is larger than ${Math.round(limit / 1024)} KiB.`);
}

