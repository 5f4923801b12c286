// Attempt gates: counters in the `rate_limit` table that are reserved BEFORE the expensive or risky work (a
// password hash, an e-mail) in one atomic UPSERT, so parallel requests cannot all pass a check that none of them
// has counted yet. A gate may also slow down: after `after` attempts in its window, each further attempt must
// wait twice as long as the one before (from `firstMs` up to `maxMs`). A success releases or clears the gate.
import { sql, type Kysely, type RawBuilder } from 'kysely';
import { RATE_LIMIT_SCALE } from 'astro:env/server';
import type { Database } from '@db/schema.ts';
import { pruneRateLimits } from './rateLimit.ts';

export interface SlowDown {
  /** Attempts in the window before the waits start (scaled by RATE_LIMIT_SCALE). */
  readonly after: number;
  readonly firstMs: number;
  readonly maxMs: number;
}

export interface GateRule {
  /** Attempts allowed per window, before RATE_LIMIT_SCALE is applied. */
  readonly limit: number;
  readonly windowMs: number;
  readonly slowDown?: SlowDown;
}

export interface Gate {
  /** What is limited and for whom, e.g. "sign-in:ip:203.0.113.9". */
  readonly key: string;
  readonly rule: GateRule;
}

export type GateCheck = { readonly allowed: true } | { readonly allowed: false; readonly retryAt: Date; readonly gate: Gate };

export const scaled = (n: number): number => Math.max(1, Math.round(n * RATE_LIMIT_SCALE));

/** Seconds to wait after the attempt that brought the count to `hits` (SQL, so it runs inside the UPSERT). */
function waitAfter(hits: RawBuilder<number>, slow: SlowDown | undefined): RawBuilder<number> {
  if (!slow) return sql<number>`0::float8`;
  const after = scaled(slow.after);
  return sql<number>`case when ${hits} < ${after}::int then 0::float8
    else least(${slow.maxMs / 1000}::float8, ${slow.firstMs / 1000}::float8 * power(2::float8, (${hits} - ${after}::int)::float8)) end`;
}

/**
 * Counts one attempt if the gate is open, in one statement: a window that has ended starts again at 1; a full
 * window, or a wait that has not passed, leaves the row as it was and the attempt is refused.
 */
export async function reserveAttempt(db: Kysely<Database>, gate: Gate, now = new Date()): Promise<GateCheck> {
  const { key, rule } = gate;
  const limit = scaled(rule.limit);
  const windowEnds = new Date(now.getTime() + rule.windowMs);
  const ended = sql<boolean>`r.window_ends_at <= ${now}`;
  const newHits = sql<number>`(case when ${ended} then 1 else r.hits + 1 end)`;
  // Null when there is no wait: parallel requests each bring their own `now`, a few ms apart, and must not
  // refuse each other over a "wait" of zero.
  const nextAt = (hits: RawBuilder<number>) => {
    const wait = waitAfter(hits, rule.slowDown);
    return sql<Date | null>`case when ${wait} > 0 then ${now}::timestamptz + make_interval(secs => ${wait}) else null end`;
  };
  const reserved = await sql<{ hits: number }>`
    insert into rate_limit as r (key, hits, window_ends_at, next_at)
    values (${key}, 1, ${windowEnds}, ${nextAt(sql<number>`1`)})
    on conflict (key) do update set
      hits = ${newHits},
      window_ends_at = case when ${ended} then ${windowEnds}::timestamptz else r.window_ends_at end,
      next_at = ${nextAt(newHits)}
    where ${ended} or (r.hits < ${limit}::int and (r.next_at is null or r.next_at <= ${now}))
    returning r.hits`.execute(db);
  if (Math.random() < 0.01) await pruneRateLimits(db, now);
  if (reserved.rows.length > 0) return { allowed: true };
  const row = await db.selectFrom('rate_limit').select(['hits', 'window_ends_at', 'next_at']).where('key', '=', key).executeTakeFirst();
  const full = row && row.hits >= limit ? row.window_ends_at.getTime() : 0;
  const waiting = row?.next_at ? row.next_at.getTime() : 0;
  return { allowed: false, retryAt: new Date(Math.max(full, waiting, now.getTime() + 1000)), gate };
}

/** Gives back one reserved attempt (the work succeeded and should not count against this gate). */
export async function releaseAttempt(db: Kysely<Database>, key: string): Promise<void> {
  await db.updateTable('rate_limit').set({ hits: sql<number>`greatest(hits - 1, 0)` }).where('key', '=', key).execute();
}

/** Forgets every attempt on this gate (a successful sign-in clears its account's failures). */
export async function clearAttempts(db: Kysely<Database>, key: string): Promise<void> {
  await db.deleteFrom('rate_limit').where('key', '=', key).execute();
}

/**
 * Reserves an attempt on every gate, or on none: when one refuses, those already reserved are given back, so a
 * refused request costs nothing anywhere. Gates that slow down go last (giving back does not undo a wait).
 */
export async function reserveAll(db: Kysely<Database>, gates: readonly Gate[], now = new Date()): Promise<GateCheck> {
  const ordered = [...gates.filter((g) => !g.rule.slowDown), ...gates.filter((g) => g.rule.slowDown)];
  const taken: Gate[] = [];
  for (const gate of ordered) {
    const check = await reserveAttempt(db, gate, now);
    if (!check.allowed) {
      for (const g of taken) await releaseAttempt(db, g.key);
      return check;
    }
    taken.push(gate);
  }
  return { allowed: true };
}
