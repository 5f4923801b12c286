// Fixed-window counters in the `rate_limit` table, shared by every server process. A key names what is limited
// and for whom, e.g. "reset:ip:203.0.113.9". Gates that must hold under parallel requests reserve an attempt
// before the work: see attemptGate.ts (which also slows down); the rules for account endpoints are in authLimits.ts.
import type { Kysely } from 'kysely';
import { RATE_LIMIT_SCALE } from 'astro:env/server';
import type { Database } from '@db/schema.ts';
import { countHit, deleteEndedRateLimits } from './rateLimit.repository.ts';

export interface RateLimitRule {
  /** Attempts allowed per window, before RATE_LIMIT_SCALE is applied. */
  readonly limit: number;
  readonly windowMs: number;
}

export type RateLimitCheck = { readonly allowed: true } | { readonly allowed: false; readonly retryAt: Date };

function scaledLimit(rule: RateLimitRule): number {
  return Math.max(1, Math.round(rule.limit * RATE_LIMIT_SCALE));
}

/**
 * Counts one attempt and says whether it was within the limit. One upsert: a window that has
 * ended starts again at 1, so concurrent requests cannot both slip past the count.
 */
export async function consumeRateLimit(db: Kysely<Database>, key: string, rule: RateLimitRule, now = new Date()): Promise<RateLimitCheck> {
  const row = await countHit(db, key, new Date(now.getTime() + rule.windowMs), now);
  // Now and then, sweep counters whose window has ended, so the table stays small without a job.
  if (Math.random() < 0.01) await deleteEndedRateLimits(db, now);
  if (row.hits <= scaledLimit(rule)) return { allowed: true };
  return { allowed: false, retryAt: row.window_ends_at };
}
