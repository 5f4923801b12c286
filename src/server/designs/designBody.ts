// Request bodies of the design endpoints. A light body goes through readJson like every other endpoint; a heavy
// one (a design near the 200,000-point cap is ~3 MB) is read as bytes here and parsed and validated by the same
// schemas in the codec worker, so the request thread never parses it (see designPayload.ts).
import { z } from 'zod';
import { err, ok, type Result } from '@shared/result.ts';
import { invalidInput, problem, readJson, tooLarge } from '../http.ts';
import { readBytesCapped } from '../readBody.ts';
import { acceptParsedBody, BODY_SCHEMAS } from '../engine/designCodec.ts';
import { runCodec } from '../engine/enginePool.ts';
import type { AcceptBodyAnswer, BodyShape } from '../engine/engine.types.ts';
import type { PlanSettings } from '@shared/route/planSettings.ts';
import { DESIGN_BODY_LIMIT } from './designApi.schema.ts';
import { engineFailureResponse } from './designHttp.ts';
import { HEAVY_DESIGN_CHARS } from './designPayload.ts';

/** A design that a body carried, validated: canonical JSON text, and its list thumbnail for create/update. */
export interface AcceptedDesign {
  readonly text: string;
  readonly thumbnailSvg: string | null;
}

/** The small fields of each body, as its schema in designApi.schema.ts gives them. */
export interface BodyFields {
  create: { readonly title: string; readonly notes: string };
  update: { readonly baseVersion: number; readonly title?: string; readonly notes?: string };
  draft: Record<string, never>;
  plan: { readonly settings?: PlanSettings };
  route: { readonly kind: 'planned' | 'own'; readonly designVersion: number };
}

export interface AcceptedBody<S extends BodyShape> {
  readonly fields: BodyFields[S];
  readonly design: AcceptedDesign | null;
  /** The quilter's own route (route bodies of kind 'own') as JSON text; checked against the design by the engine. */
  readonly routeText: string | null;
}

function accepted<S extends BodyShape>(a: Extract<AcceptBodyAnswer, { ok: true }>): AcceptedBody<S> {
  return {
    fields: a.fields as BodyFields[S],
    design: a.designText === null ? null : { text: a.designText, thumbnailSvg: a.thumbnailSvg },
    routeText: a.routeText,
  };
}

/**
 * Reads and validates a design endpoint's body. Every failure is the Response to send: 415 not JSON, 413 past
 * DESIGN_BODY_LIMIT, 400 invalid_json / invalid_input (fields named as readJson names them), or the codec
 * pool's 429/503 when it is full.
 */
export async function readDesignBody<S extends BodyShape>(request: Request, shape: S, account: string): Promise<Result<AcceptedBody<S>, Response>> {
  const declared = Number(request.headers.get('content-length') ?? Number.NaN);
  if (Number.isFinite(declared) && declared <= HEAVY_DESIGN_CHARS) {
    const body = await readJson(request, BODY_SCHEMAS[shape] as z.ZodType, DESIGN_BODY_LIMIT);
    if (!body.ok) return body;
    return ok(accepted<S>(acceptParsedBody(shape, body.value as Record<string, unknown>)));
  }
  const type = request.headers.get('content-type') ?? '';
  if (!/^application\/(?:[\w.+-]+\+)?json\b/i.test(type.trim())) {
    return err(problem(415, 'unsupported_media_type', 'Send the request body as JSON (Content-Type: application/json).'));
  }
  const bytes = await readBytesCapped(request, DESIGN_BODY_LIMIT.bytes);
  if (bytes === null) return err(tooLarge(DESIGN_BODY_LIMIT));
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    return err(problem(400, 'invalid_json', 'The request body is not valid UTF-8 text.', { body: 'Send the JSON encoded as UTF-8.' }));
  }
  const r = await runCodec({ op: 'acceptBody', text, shape }, account);
  if (!r.ok) return err(engineFailureResponse(r.error));
  const a = r.value;
  if (a.ok) return ok(accepted<S>(a));
  if (a.reason === 'invalid-json') return err(problem(400, 'invalid_json', 'The request body is not valid JSON.'));
  return err(invalidInput(new z.ZodError(a.issues.map((i) => ({ ...i, path: [...i.path] })) as z.core.$ZodIssue[])));
}
