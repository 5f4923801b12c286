// Pieces every /api/designs/… endpoint shares: the owner guard (401 anonymous; 404 for a design that is not
// yours, is deleted, or whose id is not even a uuid), the 409 body, and how engine outcomes become responses.
import type { CheckResult } from '@shared/contract/check.ts';
import type { ProblemDetail } from '@shared/contract/errors.ts';
import type { DesignProblem } from '@shared/graph/designProblem.ts';
import { err, ok, type Result } from '@shared/result.ts';
import { assertNever } from '@shared/assertNever.ts';
import { requireUser, type SignedIn } from '../auth/guards.ts';
import { db } from '../db.ts';
import { problem } from '../http.ts';
import type { PoolFailure } from '../engine/workerPool.ts';
import { ENGINE_QUEUE_WAIT_MS } from '../engine/enginePool.ts';
import { findOwnedDesign, type DesignRecordRow } from './design.repository.ts';
import { idParamSchema } from './designApi.schema.ts';
import { designJsonText, savedWithCheckJsonText } from './designRecord.ts';
import type { EngineFailure } from './designRoute.service.ts';
import { acceptStoredDesign, jsonText } from './designPayload.ts';

export const notFound = (): Response => problem(404, 'not_found', 'Not found.');

/** The signed-in user and their design's id (not loaded). */
export function requireDesignId(locals: App.Locals, params: Record<string, string | undefined>): Result<SignedIn & { id: string }, Response> {
  const signedIn = requireUser(locals);
  if (!signedIn.ok) return signedIn;
  const id = idParamSchema.safeParse(params['id']);
  if (!id.success) return err(notFound());
  return ok({ ...signedIn.value, id: id.data });
}

/** The signed-in user's live design, or the response to send (401 or 404). */
export async function requireOwnedDesign(locals: App.Locals, params: Record<string, string | undefined>): Promise<Result<SignedIn & { row: DesignRecordRow }, Response>> {
  const who = requireDesignId(locals, params);
  if (!who.ok) return who;
  const row = await findOwnedDesign(db, who.value.user.id, who.value.id);
  if (!row) return err(notFound());
  return ok({ ...who.value, row });
}

/**
 * `{ design }` for a row: its drawing validated (in the codec worker when heavy) and spliced in as text.
 * `acceptedText`: the drawing this request just validated and saved, so it is not checked twice.
 */
export async function designResponse(row: DesignRecordRow, account: string, status = 200, acceptedText?: string): Promise<Response> {
  const text = await designTextOf(row, account, acceptedText);
  return text.ok ? jsonText(`{"design":${designJsonText(row, text.value)}}`, status) : text.error;
}

/**
 * `{ design, check, checkError }` for a save with ?check=1 (savedWithCheckAnswerSchema): the saved version with its
 * drawing spliced in as text, and its route check or why there is none (the save stands either way).
 */
export async function savedWithCheckResponse(row: DesignRecordRow, account: string, acceptedText: string | undefined, check: Result<CheckResult, EngineFailure>): Promise<Response> {
  const text = await designTextOf(row, account, acceptedText);
  if (!text.ok) return text.error;
  const checkError = check.ok ? null : check.error.kind === 'problem' ? designProblemDetail(check.error.problem) : engineFailureProblem(check.error.failure).detail;
  return jsonText(savedWithCheckJsonText(row, text.value, check.ok ? check.value : null, checkError), 200);
}

/** 409: the design moved on since `baseVersion`; `design` carries the current one so the client can merge or reload. */
export async function conflict(current: DesignRecordRow, account: string): Promise<Response> {
  const text = await designTextOf(current, account);
  if (!text.ok) return text.error;
  const error = { code: 'conflict', message: `This design was saved elsewhere (now version ${current.version}). Reload it or merge your changes.` };
  return jsonText(`{"error":${JSON.stringify(error)},"design":${designJsonText(current, text.value)}}`, 409);
}

async function designTextOf(row: DesignRecordRow, account: string, acceptedText?: string): Promise<Result<string, Response>> {
  if (acceptedText !== undefined) return ok(acceptedText);
  const r = await acceptStoredDesign(row.data_json, account);
  return r.ok ? ok(r.value.designText) : err(engineFailureResponse(r.error));
}

/** A design the engine refuses (e.g. no quilting lines, too many crossings), naming the line it is about. */
export function designProblemDetail(p: DesignProblem): ProblemDetail {
  const at = 'group' in p ? `design.${p.group}.${p.index}` : p.kind === 'empty-design' ? 'design.lines' : 'design';
  return { code: 'invalid_input', message: `The design cannot be checked: ${p.message}.`, fields: { [at]: `${p.message} (${p.kind})` } };
}

/** 400 with designProblemDetail. */
export function designProblemResponse(p: DesignProblem): Response {
  const d = designProblemDetail(p);
  return problem(400, d.code, d.message, d.fields);
}

/** An engine outcome that is not an answer, as a status, problem detail and headers (engineFailureResponse). */
export interface EngineFailureProblem {
  readonly status: number;
  readonly detail: ProblemDetail;
  readonly headers?: Readonly<Record<string, string>>;
}

/**
 * Engine outcomes: `engine_timeout` (422: the design is too dense to finish within the cap; retrying will not
 * help), `rate_limited` (429 + Retry-After: this account already has its share of jobs waiting), `engine_busy`
 * (503 + Retry-After: every worker busy and the queue full, or the job waited too long; retry soon).
 */
export function engineFailureResponse(f: PoolFailure): Response {
  const p = engineFailureProblem(f);
  return problem(p.status, p.detail.code, p.detail.message, undefined, p.headers);
}

export function engineFailureProblem(f: PoolFailure): EngineFailureProblem {
  switch (f.kind) {
    case 'timeout':
      return {
        status: 422,
        detail: {
          code: 'engine_timeout',
          message: `The route engine stopped after ${f.ms / 1000} s: this design is too dense to check or plan on the server. Split it into smaller blocks or simplify its curves.`,
        },
      };
    case 'account-busy':
      return {
        status: 429,
        detail: { code: 'rate_limited', message: `You already have ${f.queued} route checks or plans waiting for the route engine. Wait for them to finish, then try again.` },
        headers: { 'retry-after': '2' },
      };
    case 'queue-timeout':
      return {
        status: 503,
        detail: { code: 'engine_busy', message: `The route engine is busy with other designs and could not start yours within ${ENGINE_QUEUE_WAIT_MS / 1000} s. Try again in a moment.` },
        headers: { 'retry-after': '5' },
      };
    case 'busy':
    case 'closed':
    case 'cancelled': // nobody is listening any more; the answer only has to be well-formed
      return { status: 503, detail: { code: 'engine_busy', message: 'The route engine is busy with other designs. Try again in a moment.' }, headers: { 'retry-after': '2' } };
    case 'failed':
      console.error('[engine] task failed:', f.message);
      return { status: 500, detail: { code: 'internal', message: 'Something went wrong on our side. Please try again.' } };
    default:
      return assertNever(f);
  }
}
