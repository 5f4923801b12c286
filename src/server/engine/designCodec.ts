// Turning design JSON text into validated designs and back. A design at the cap (200,000 points, ~3 MB) costs
// hundreds of milliseconds to parse, validate (zod), serialise and thumbnail; on the request thread that stalls
// every other request, so heavy designs go through these functions in a worker (the codec pool, see
// enginePool.ts) and only text crosses back. Light designs use the same functions on the request thread.
import type { z } from 'zod';
import { designSchema, type Design } from '@shared/design/design.schema.ts';
import { buildDesignThumbnailSvg } from '@shared/export/designSvg.ts';
import { createDesignSchema, draftSchema, planRequestSchema, saveRouteSchema, updateDesignSchema } from '../designs/designApi.schema.ts';
import { assertNever } from '@shared/assertNever.ts';
import { plainIssue } from '@shared/forms/plainMessages.ts';
import type { AcceptBodyAnswer, AcceptStoredAnswer, BodyShape, PlainIssue } from './engine.types.ts';

export const BODY_SCHEMAS = {
  create: createDesignSchema,
  update: updateDesignSchema,
  draft: draftSchema,
  plan: planRequestSchema,
  route: saveRouteSchema,
} as const satisfies Record<BodyShape, z.ZodType>;

/** zod issues without their input values, safe and small to post between threads. */
export function plainIssues(error: z.ZodError): PlainIssue[] {
  return error.issues.map((i) => ({
    code: i.code,
    path: i.path.map((p) => (typeof p === 'symbol' ? String(p) : p)),
    message: i.message,
    ...(i.code === 'unrecognized_keys' ? { keys: i.keys } : {}),
  }));
}

/** A body the schema accepted → small fields plus canonical JSON text of its design / route. */
export function acceptParsedBody(shape: BodyShape, body: Record<string, unknown>): Extract<AcceptBodyAnswer, { ok: true }> {
  const { design, route, ...fields } = body as { design?: Design; route?: unknown[] } & Record<string, unknown>;
  switch (shape) {
    case 'create':
    case 'update':
      return {
        ok: true,
        fields,
        designText: design ? JSON.stringify(design) : null,
        thumbnailSvg: design ? buildDesignThumbnailSvg(design) : null,
        routeText: null,
      };
    case 'draft':
    case 'plan':
      return { ok: true, fields, designText: design ? JSON.stringify(design) : null, thumbnailSvg: null, routeText: null };
    case 'route':
      return { ok: true, fields, designText: null, thumbnailSvg: null, routeText: route ? JSON.stringify(route) : null };
    default:
      return assertNever(shape);
  }
}

/** Parses and validates a request body (text) against the endpoint's schema. */
export function acceptBody(text: string, shape: BodyShape): AcceptBodyAnswer {
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch {
    return { ok: false, reason: 'invalid-json' };
  }
  const parsed = BODY_SCHEMAS[shape].safeParse(data, { error: plainIssue });
  if (!parsed.success) return { ok: false, reason: 'invalid', issues: plainIssues(parsed.error) };
  return acceptParsedBody(shape, parsed.data as Record<string, unknown>);
}

/**
 * A design's JSON text as stored (or accepted earlier), parsed and validated. We only ever store validated
 * designs, so text that fails is a broken invariant and throws.
 */
export function parseDesignText(text: string): Design {
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch {
    throw new Error('server/engine/designCodec: stored design is not JSON');
  }
  const parsed = designSchema.safeParse(data);
  if (!parsed.success) throw new Error(`server/engine/designCodec: stored design fails its schema: ${parsed.error.message.slice(0, 500)}`);
  return parsed.data;
}

/** A stored design's text validated and made canonical (defaults applied), with its thumbnail when asked. */
export function acceptStored(text: string, thumbnail: boolean): AcceptStoredAnswer {
  const design = parseDesignText(text);
  return { designText: JSON.stringify(design), thumbnailSvg: thumbnail ? buildDesignThumbnailSvg(design) : null };
}
