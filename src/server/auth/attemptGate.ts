// Attempt gates: counters in the `rate_limit` table that are reserved BEFORE the expensive or risky work (a
// password hash, an e-mail) in one atomic UPSERT, so parallel requests cannot all pass a check that none of them
// has counted yet. A gate may also slow down: after `after` attempts in its window, each further attempt must
// wait twice as long as the one before (from `firstMs` up to `maxMs`). A success releases or clears the gate.
import type { Kysely } from 'kysely';
import { RATE_LIMIT_SCALE } from 'astro:env/server';
import type { Database } from '@db/schema.ts';
import { deleteEndedRateLimits, deleteRateLimit, findRateLimit, reserveGateHit, uncountHit } from './rateLimit.repository.ts';

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

/**
 * Counts one attempt if the gate is open, in one statement: a window that has ended starts again at 1; a full
 * window, or a wait that has not passed, leaves the row as it was and the attempt is refused.
 */
export async function reserveAttempt(db: Kysely<Database>, gate: Gate, now = new Date()): Promise<GateCheck> {
  const { key, rule } = gate;
  const limit = scaled(rule.limit);
  const windowEnds = new Date(now.getTime() + rule.windowMs);
  const waits = rule.slowDown && { after: scaled(rule.slowDown.after), firstMs: rule.slowDown.firstMs, maxMs: rule.slowDown.maxMs };
  const counted = await reserveGateHit(db, { key, limit, windowEnds, now, waits });
  if (Math.random() < 0.01) await deleteEndedRateLimits(db, now);
  if (counted) return { allowed: true };
  const row = await findRateLimit(db, key);
  const full = row && row.hits >= limit ? row.window_ends_at.getTime() : 0;
  const waiting = row?.next_at ? row.next_at.getTime() : 0;
  return { allowed: false, retryAt: new Date(Math.max(full, waiting, now.getTime() + 1000)), gate };
}

/** Gives back one reserved attempt (the work succeeded and should not count against this gate). */
export async function releaseAttempt(db: Kysely<Database>, key: string): Promise<void> {
  await uncountHit(db, key);
}

/** Forgets every attempt on this gate (a successful sign-in clears its account's failures). */
export async function clearAttempts(db: Kysely<Database>, key: string): Promise<void> {
  await deleteRateLimit(db, key);
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
