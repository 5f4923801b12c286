// Pieces every /api/quilts/… endpoint shares: the body cap, the id guard, and how a failed save becomes a response
// (404 for a quilt that is not yours, 409 with the current quilt, 400 naming the placement).
import type { BodyLimit } from '../http.ts';
import { json, problem } from '../http.ts';
import { assertNever } from '@shared/assertNever.ts';
import { QUILT_LIMITS } from '@shared/quilt/quilt.schema.ts';
import { toQuiltRecord, type QuiltSaveFailure } from './quilt.service.ts';

/** A full 20 × 20 map with long design ids is about 40 KB of JSON; 256 KiB leaves room and refuses the absurd. */
export const QUILT_BODY_LIMIT: BodyLimit = {
  bytes: 256 * 1024,
  hint: `A quilt may have at most ${QUILT_LIMITS.maxRows} rows and ${QUILT_LIMITS.maxColumns} columns of blocks.`,
};

export const quiltNotFound = (): Response => problem(404, 'not_found', 'Not found.');

export function quiltFailureResponse(f: QuiltSaveFailure): Response {
  switch (f.kind) {
    case 'not-found':
      return quiltNotFound();
    case 'conflict':
      return json(
        {
          error: { code: 'conflict', message: `This quilt was saved elsewhere (now version ${f.current.version}). Reload it to see that copy.` },
          quilt: toQuiltRecord(f.current),
        },
        409,
      );
    case 'bad-placements':
      return problem(400, 'invalid_input', 'Some blocks name a design you do not have.', f.fields);
    default:
      return assertNever(f);
  }
}
