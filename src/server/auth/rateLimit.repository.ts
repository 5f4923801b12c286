// Queries on `rate_limit`, the counters behind rateLimit.ts (count, then decide) and attemptGate.ts (reserve before
// the work, and slow down). Each counting query is one statement, so parallel requests cannot both slip past a count.
import { sql, type Kysely, type RawBuilder, type Transaction } from 'kysely';
import type { Database } from '@db/schema.ts';

type Db = Kysely<Database> | Transaction<Database>;

/** Counts one hit in the key's fixed window (an ended window starts again at 1); the count and the window's end. */
export async function countHit(db: Db, key: string, windowEnds: Date, now: Date): Promise<{ hits: number; window_ends_at: Date }> {
  return db
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
}

/** Waits that double after `after` attempts, from `firstMs` up to `maxMs` (counts already scaled). */
export interface GateWaits {
  readonly after: number;
  readonly firstMs: number;
  readonly maxMs: number;
}

/** Seconds to wait after the attempt that brought the count to `hits` (SQL, so it runs inside the UPSERT). */
function waitAfter(hits: RawBuilder<number>, waits: GateWaits | undefined): RawBuilder<number> {
  if (!waits) return sql<number>`0::float8`;
  return sql<number>`case when ${hits} < ${waits.after}::int then 0::float8
    else least(${waits.maxMs / 1000}::float8, ${waits.firstMs / 1000}::float8 * power(2::float8, (${hits} - ${waits.after}::int)::float8)) end`;
}

/**
 * Counts one attempt if the gate is open, in one statement: a window that has ended starts again at 1; a full
 * window (`limit` reached), or a wait that has not passed, leaves the row as it was. True when counted.
 */
export async function reserveGateHit(
  db: Db,
  g: { key: string; limit: number; windowEnds: Date; now: Date; waits: GateWaits | undefined },
): Promise<boolean> {
  const { key, limit, windowEnds, now } = g;
  const ended = sql<boolean>`r.window_ends_at <= ${now}`;
  const newHits = sql<number>`(case when ${ended} then 1 else r.hits + 1 end)`;
  // Null when there is no wait: parallel requests each bring their own `now`, a few ms apart, and must not
  // refuse each other over a "wait" of zero.
  const nextAt = (hits: RawBuilder<number>) => {
    const wait = waitAfter(hits, g.waits);
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
  return reserved.rows.length > 0;
}

export async function findRateLimit(db: Db, key: string): Promise<{ hits: number; window_ends_at: Date; next_at: Date | null } | undefined> {
  return db.selectFrom('rate_limit').select(['hits', 'window_ends_at', 'next_at']).where('key', '=', key).executeTakeFirst();
}

/** Gives back one counted hit (never below zero). */
export async function uncountHit(db: Db, key: string): Promise<void> {
  await db.updateTable('rate_limit').set({ hits: sql<number>`greatest(hits - 1, 0)` }).where('key', '=', key).execute();
}

export async function deleteRateLimit(db: Db, key: string): Promise<void> {
  await db.deleteFrom('rate_limit').where('key', '=', key).execute();
}

/** Removes counters whose window has ended and whose wait is over. */
export async function deleteEndedRateLimits(db: Db, now: Date): Promise<void> {
  await db
    .deleteFrom('rate_limit')
    .where('window_ends_at', '<=', now)
    .where((eb) => eb.or([eb('next_at', 'is', null), eb('next_at', '<=', now)]))
    .execute();
}
