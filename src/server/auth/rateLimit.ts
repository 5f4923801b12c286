// Fixed-window attempt counters in the `rate_limit` table, shared by every server process.
// A key names what is limited and for whom, e.g. "sign-in:127.0.0.1:ann@example.org".
import { sql, type Kysely } from 'kysely';
import { RATE_LIMIT_SCALE } from 'astro:env/server';
import type { Database } from '../../../db/schema.ts';

export interface RateLimitRule {
  /** Attempts allowed per window, before RATE_LIMIT_SCALE is applied. */
  readonly limit: number;
  readonly windowMs: number;
}

/** 10 sign-in failures per 15 minutes and 5 reset requests per hour, per IP address and e-mail. */
export const SIGN_IN_RULE: RateLimitRule = { limit: 10, windowMs: 15 * 60 * 1000 };
export const RESET_RULE: RateLimitRule = { limit: 5, windowMs: 60 * 60 * 1000 };
/**
 * 50 sign-in failures per 15 minutes per e-mail from any address. The client address comes from
 * X-Forwarded-For, which a caller can vary; this wider limit still caps guessing against one account.
 */
export const SIGN_IN_ACCOUNT_RULE: RateLimitRule = { limit: 50, windowMs: 15 * 60 * 1000 };

export type RateLimitCheck = { readonly allowed: true } | { readonly allowed: false; readonly retryAt: Date };

function scaledLimit(rule: RateLimitRule): number {
  return Math.max(1, Math.round(rule.limit * RATE_LIMIT_SCALE));
}

/** Whether another attempt may be made now, without counting one. */
export async function checkRateLimit(db: Kysely<Database>, key: string, rule: RateLimitRule, now = new Date()): Promise<RateLimitCheck> {
  const row = await db.selectFrom('rate_limit').select(['hits', 'window_ends_at']).where('key', '=', key).executeTakeFirst();
  if (!row || row.window_ends_at.getTime() <= now.getTime() || row.hits < scaledLimit(rule)) return { allowed: true };
  return { allowed: false, retryAt: row.window_ends_at };
}

/**
 * Counts one attempt and says whether it was within the limit. One upsert: a window that has
 * ended starts again at 1, so concurrent requests cannot both slip past the count.
 */
export async function consumeRateLimit(db: Kysely<Database>, key: string, rule: RateLimitRule, now = new Date()): Promise<RateLimitCheck> {
  const windowEnds = new Date(now.getTime() + rule.windowMs);
  const row = await db
    .insertInto('rate_limit')
    .values({ key, hits: 1, window_ends_at: windowEnds })
    .onConflict((oc) =>
      oc.column('key').doUpdateSet({
        hits: sql<number>`case when rate_limit.window_ends_at <= ${now} then 1 else rate_limit.hits + 1 end`,
        window_ends_at: sql<Date>`case when rate_limit.window_ends_at <= ${now} then ${windowEnds} else rate_limit.window_ends_at end`,
      }),
    )
    .returning(['hits', 'window_ends_at'])
    .executeTakeFirstOrThrow();
  // Now and then, sweep counters whose window has ended, so the table stays small without a job.
  if (Math.random() < 0.01) await pruneRateLimits(db, now);
  if (row.hits <= scaledLimit(rule)) return { allowed: true };
  return { allowed: false, retryAt: row.window_ends_at };
}

export async function clearRateLimit(db: Kysely<Database>, key: string): Promise<void> {
  await db.deleteFrom('rate_limit').where('key', '=', key).execute();
}

/** Removes counters whose window has ended; called now and then so the table stays small. */
export async function pruneRateLimits(db: Kysely<Database>, now = new Date()): Promise<void> {
  await db.deleteFrom('rate_limit').where('window_ends_at', '<=', now).execute();
}
