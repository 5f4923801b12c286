// The API's one response shape: JSON bodies, and errors as { error: { code, message, fields? } }.
// `code` comes from a closed union so clients (and tests) can branch on it; `fields` maps an input
// path ("email", "items.0.name") to a message a person can act on.
import { fieldWords, plainIssue } from '@shared/forms/plainMessages.ts';
import type { z } from 'zod';
import type { ErrorCode, ProblemBody } from '@shared/contract/errors.ts';
import { err, ok, type Result } from '@shared/result.ts';
import { readBytesCapped } from './readBody.ts';
import { findUnstorableText, UNSTORABLE_MESSAGE } from './storableText.ts';

export type FieldErrors = Readonly<Record<string, string>>;

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

/** A body cap with words for the 413: what the cap protects, e.g. the design limits (a number alone is bytes). */
export interface BodyLimit {
  readonly bytes: number;
  /** A sentence after "The request body is larger than N MB…", e.g. the design limits in points and lines. */
  readonly hint: string;
}

/**
 * Reads a JSON body and checks it against `schema`. Every failure is already the Response to send:
 * 415 when the body is not declared as JSON, 413 when it is larger than `limit` bytes, 400 for
 * unreadable JSON or bytes that are not UTF-8 (`invalid_json`), text PostgreSQL cannot store (NUL, a lone
 * surrogate) or a body the schema refuses (`invalid_input`, with `fields`).
 */
export async function readJson<S extends z.ZodType>(
  request: Request,
  schema: S,
  limit: number | BodyLimit = DEFAULT_BODY_LIMIT,
): Promise<Result<z.output<S>, Response>> {
  const type = request.headers.get('content-type') ?? '';
  if (!/^application\/(?:[\w.+-]+\+)?json\b/i.test(type.trim())) {
    return err(problem(415, 'unsupported_media_type', 'Send the request body as JSON (Content-Type: application/json).'));
  }
  const cap = typeof limit === 'number' ? { bytes: limit, hint: '' } : limit;
  const bytes = await readBytesCapped(request, cap.bytes);
  if (bytes === null) return err(tooLarge(cap));
  let text: string;
  try {
    // fatal: bytes that are not UTF-8 are refused, never stored as U+FFFD.
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    return err(problem(400, 'invalid_json', 'The request body is not valid UTF-8 text.', { body: 'Send the JSON encoded as UTF-8.' }));
  }
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch {
    return err(problem(400, 'invalid_json', 'The request body is not valid JSON.', { body: 'Not valid JSON.' }));
  }
  const unstorable = findUnstorableText(data);
  if (unstorable !== null) return err(problem(400, 'invalid_input', 'Some text cannot be stored.', { [unstorable]: UNSTORABLE_MESSAGE }));
  const parsed = schema.safeParse(data, { error: plainIssue });
  if (!parsed.success) return err(invalidInput(parsed.error));
  return ok(parsed.data);
}

/**
 * 400 for a zod failure: one message per field path (the first issue wins), worded by shared/forms/plainMessages.ts.
 * Without a message of the caller's, the answer's message is the first field's, so a client that shows only the
 * message (a save) still names the field.
 */
export function invalidInput(error: z.ZodError, message?: string): Response {
  // No prototype: a field named "__proto__" by the client must become a key, not the object's prototype.
  const fields: Record<string, string> = Object.create(null);
  for (const issue of error.issues) {
    const at = issue.path.map(String);
    if (issue.code === 'unrecognized_keys') {
      for (const k of issue.keys) fields[[...at, k].join('.')] ??= `${fieldWords([k])}: not accepted here.`;
      continue;
    }
    fields[at.length ? at.join('.') : 'body'] ??= issue.message;
  }
  const messages = Object.values(fields);
  const others = messages.length - 1;
  const summary = others <= 0 ? (messages[0] ?? 'Some fields need attention.') : `${messages[0]} ${others === 1 ? 'One other field needs' : `${others} other fields need`} attention too.`;
  return problem(400, 'invalid_input', message ?? summary, fields);
}

/** "64 KB", "5 MB": binary units (1 MB = 1024 × 1024 bytes), as a person reads them. */
export function sizeInWords(bytes: number): string {
  if (bytes >= 1024 * 1024) return `${+(bytes / (1024 * 1024)).toFixed(1)} MB`;
  if (bytes >= 1024) return `${+(bytes / 1024).toFixed(1)} KB`;
  return `${bytes} bytes`;
}

/** 413 that says the cap in words (and what it protects). */
export function tooLarge(cap: { bytes: number; hint: string }): Response {
  const message = `The request body is larger than ${sizeInWords(cap.bytes)}, the most this request may carry.${cap.hint ? ` ${cap.hint}` : ''}`;
  return problem(413, 'payload_too_large', message, { body: `At most ${sizeInWords(cap.bytes)}.` });
}

