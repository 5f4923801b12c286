import type { Units } from '@shared/design/design.schema.ts';

/** One ruler mark: its position in design units and its rank (0 = whole unit, larger = finer). */
export interface Tick {
  readonly at: number;
  readonly rank: number;
  /** Whole-unit marks carry their number. */
  readonly label?: string;
}

/**
 * Subdivisions a ruler shows, coarse to fine, as fractions of one unit. Inch rulers halve down to
 * 1/8 in (the marks quilting rulers print); cm rulers show half centimetres and millimetres.
 */
export const RULER_STEPS: Readonly<Record<Units, readonly number[]>> = {
  in: [1, 1 / 2, 1 / 4, 1 / 8],
  cm: [1, 1 / 2, 1 / 10],
};

/** Marks closer than this on screen (CSS px) are left out, finest first. */
export const MIN_TICK_GAP_PX = 5;

/** Numbers closer than this (CSS px; room for "-30" in the 10 px ruler font) would run into each other. */
export const MIN_LABEL_GAP_PX = 22;

/**
 * The ruler marks between `from` and `to` (design units) at `scale` px per unit. Each position gets the
 * coarsest rank that contains it; ranks whose spacing would be under MIN_TICK_GAP_PX are dropped.
 * Positions are computed as integer multiples of the finest step, so they are exact (powers of two for inches).
 * When even whole units are too dense, every k-th whole unit is shown (k a power of 2 or 5·10ⁿ).
 */
export function buildRulerTicks(from: number, to: number, scale: number, units: Units): Tick[] {
  if (!(scale > 0) || !(to >= from)) return [];
  const steps = RULER_STEPS[units].filter((s) => s * scale >= MIN_TICK_GAP_PX);
  const wholeEvery = steps.length > 0 ? 1 : coarseWholeStep(scale);
  const finest = steps.length > 0 ? steps[steps.length - 1]! : wholeEvery;
  // Numbers only every k-th whole unit when whole units are closer than a number is wide (a phone-sized canvas).
  const labelEvery = [1, 2, 5, 10, 20, 50, 100].find((k) => k * scale >= MIN_LABEL_GAP_PX && k % wholeEvery === 0) ?? 100;
  const first = Math.ceil(from / finest - 1e-9);
  const last = Math.floor(to / finest + 1e-9);
  const ticks: Tick[] = [];
  const cap = 20_000;
  for (let i = first; i <= last && ticks.length < cap; i++) {
    const at = i * finest + 0; // + 0 turns -0 into 0
    const rank = steps.length > 0 ? rankOf(at, steps) : 0;
    const labelled = rank === 0 && isMultiple(at, labelEvery);
    ticks.push(labelled ? { at, rank, label: formatWhole(at) } : { at, rank });
  }
  return ticks;
}

function isMultiple(at: number, k: number): boolean {
  const q = at / k;
  return Math.abs(q - Math.round(q)) < 1e-9;
}

function rankOf(at: number, steps: readonly number[]): number {
  for (let r = 0; r < steps.length; r++) {
    const q = at / steps[r]!;
    if (Math.abs(q - Math.round(q)) < 1e-9) return r;
  }
  return steps.length - 1;
}

function coarseWholeStep(scale: number): number {
  for (const k of [2, 5, 10, 20, 50, 100]) if (k * scale >= MIN_TICK_GAP_PX) return k;
  return 100;
}

function formatWhole(at: number): string {
  return String(Math.round(at));
}
