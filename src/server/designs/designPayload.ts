// Design JSON between the database, the workers and the response, as text. A light design is validated on the
// request thread (a few milliseconds at most); a heavy one (more than HEAVY_DESIGN_CHARS of JSON, up to the
// 200,000-point cap) goes to the codec worker, so the request thread only moves strings.
import { err, ok, type Result } from '@shared/result.ts';
import { acceptStored } from '../engine/designCodec.ts';
import { runCodec } from '../engine/enginePool.ts';
import type { AcceptStoredAnswer } from '../engine/engine.types.ts';
import type { PoolFailure } from '../engine/workerPool.ts';

/**
 * Above this much JSON (characters ≈ bytes) a design is parsed and validated in the codec worker. At ~16 bytes
 * a point that is ~4,000 points: about 10 ms of parsing, validation and thumbnail on the request thread
 * (measured, see README "Reliability"); a design at the cap is ~3 MB and takes ~1 s.
 */
export const HEAVY_DESIGN_CHARS = 64 * 1024;

export const isHeavyDesignText = (text: string): boolean => text.length > HEAVY_DESIGN_CHARS;

/** A stored design's JSON text, validated and canonical; with its list thumbnail when asked. */
export async function acceptStoredDesign(text: string, account: string, thumbnail = false): Promise<Result<AcceptStoredAnswer, PoolFailure>> {
  if (!isHeavyDesignText(text)) return ok(acceptStored(text, thumbnail));
  const r = await runCodec({ op: 'acceptStored', text, thumbnail }, account);
  return r.ok ? ok(r.value) : err(r.error);
}

/** A JSON response from text already serialised (same headers as http.ts json()). */
export function jsonText(text: string, status = 200): Response {
  return new Response(text, { status, headers: { 'content-type': 'application/json; charset=utf-8', 'cache-control': 'no-store' } });
}
