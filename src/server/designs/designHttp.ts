// Pieces every /api/designs/… endpoint shares: the owner guard (401 anonymous; 404 for a design that is not
// yours, is deleted, or whose id is not even a uuid), the 409 body, and how engine outcomes become responses.
import type { DesignRow } from '../../../db/schema.ts';
import type { Design } from '../../../shared/design/design.schema.ts';
import type { DesignProblem } from '../../../shared/graph/designProblem.ts';
import { err, ok, type Result } from '../../../shared/result.ts';
import { assertNever } from '../../../shared/assertNever.ts';
import { requireUser, type SignedIn } from '../auth/guards.ts';
import { db } from '../db.ts';
import { json, problem } from '../http.ts';
import type { DesignSummary } from '../engine/engine.types.ts';
import { runEngine } from '../engine/enginePool.ts';
import type { PoolFailure } from '../engine/workerPool.ts';
import { findOwnedDesign } from './design.repository.ts';
import { idParamSchema } from './designApi.schema.ts';
import { toDesignJson } from './designRecord.ts';

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
export async function requireOwnedDesign(locals: App.Locals, params: Record<string, string | undefined>): Promise<Result<SignedIn & { row: DesignRow }, Response>> {
  const who = requireDesignId(locals, params);
  if (!who.ok) return who;
  const row = await findOwnedDesign(db, who.value.user.id, who.value.id);
  if (!row) return err(notFound());
  return ok({ ...who.value, row });
}

/** 409: the design moved on since `baseVersion`; `design` carries the current one so the client can merge or reload. */
export function conflict(current: DesignRow): Response {
  return json(
    {
      error: { code: 'conflict', message: `This design was saved elsewhere (now version ${current.version}). Reload it or merge your changes.` },
      design: toDesignJson(current),
    },
    409,
  );
}

/** A design the engine refuses (e.g. no quilting lines, too many crossings): 400 naming the line it is about. */
export function designProblemResponse(p: DesignProblem): Response {
  const at = 'group' in p ? `design.${p.group}.${p.index}` : p.kind === 'empty-design' ? 'design.lines' : 'design';
  return problem(400, 'invalid_input', `The design cannot be checked: ${p.message}.`, { [at]: `${p.message} (${p.kind})` });
}

/**
 * Engine outcomes: `engine_timeout` (422: the design is too dense to finish within the cap; retrying will not
 * help), `engine_busy` (503 + Retry-After: every worker busy and the queue full; retry soon).
 */
export function engineFailureResponse(f: PoolFailure): Response {
  switch (f.kind) {
    case 'timeout':
      return problem(
        422,
        'engine_timeout',
        `The route engine stopped after ${f.ms / 1000} s: this design is too dense to check or plan on the server. Split it into smaller blocks or simplify its curves.`,
      );
    case 'busy':
    case 'closed':
      return problem(503, 'engine_busy', 'The route engine is busy with other designs. Try again in a moment.', undefined, { 'retry-after': '2' });
    case 'failed':
      console.error('[engine] task failed:', f.message);
      return problem(500, 'internal', 'Something went wrong on our side. Please try again.');
    default:
      return assertNever(f);
  }
}

/** Table figures through the engine pool; null when the engine refuses the design or does not finish. */
export async function summarizeWithEngine(design: Design): Promise<DesignSummary | null> {
  const r = await runEngine({ op: 'summary', design });
  if (!r.ok) {
    if (r.error.kind === 'failed') console.error('[engine] summary failed:', r.error.message);
    return null;
  }
  return r.value.ok ? r.value.value : null;
}
