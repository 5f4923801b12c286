import { inchesPerUnit, type ThreadSettings, type Units } from '../design/design.schema.ts';

/** A setting's value in use, and where the number comes from (shown in the UI beside the figure). */
export interface BudgetAssumption {
  readonly setting: keyof ThreadSettings | 'model';
  readonly value: number | string;
  /** 'design' when the design set it; otherwise a plain statement of the source (or "from memory"). */
  readonly source: string;
}

/** Thread, bobbins and time for sewing a route. */
export interface ThreadBudget {
  readonly stitchCount: number;
  readonly topThreadYards: number;
  readonly bobbinThreadYards: number;
  readonly topThreadMeters: number;
  readonly bobbinThreadMeters: number;
  /** Bobbins to wind for the bobbin thread at the bobbin capacity (whole bobbins, rounded up). */
  readonly bobbins: number;
  readonly sewingMinutes: number;
  readonly assumptions: readonly BudgetAssumption[];
}

/**
 * Defaults used when a design does not set them. All are from memory (common practice, no source checked) and are
 * labelled so in the returned `assumptions`.
 */
export const THREAD_DEFAULTS = {
  spi: { value: 10, source: 'from memory: 10–12 SPI is usual for machine quilting' },
  sandwichThickness: { value: 0.0625, source: 'from memory: cotton top + low-loft batting + backing, compressed under the foot, about 1/16 in' },
  tieOffTail: { value: 4, source: 'from memory: about 4 in per thread left to tie off and bury by hand' },
  bobbinCapacity: { value: 80, source: 'from memory: a class 15 bobbin holds roughly 60–100 yd of 50 wt cotton' },
  stitchesPerMinute: { value: 600, source: 'from memory: a steady free-motion or walking-foot pace, well under a machine’s top speed' },
} as const;

const INCHES_PER_YARD = 36;
const METERS_PER_INCH = 0.0254;

/**
 * Thread budget of a route: `sewnLength` is everything the needle sews (stitching and travel, design units) and
 * `passes` the number of passes (each ends in a tie-off at both ends).
 *
 * Lockstitch model (stitch class 301, our geometric derivation, no published source): at balanced tension the two
 * threads lock in the middle of the sandwich, so per stitch each thread lies along the stitch length ℓ on its face
 * and runs half the thickness t down and half back up: top ≈ bobbin ≈ ℓ + t per stitch. Total thread per length
 * sewn is then 2(ℓ + t)/ℓ; for a thin seam (t ≈ 0.025 in at 10 SPI) that is 2.5, the consumption ratio thread
 * makers quote for 301 lockstitch (from memory), which the tests check. Each pass adds a tie-off tail at its start
 * and its end, for each thread.
 */
export function computeThreadBudget(sewnLength: number, passes: number, units: Units, settings: ThreadSettings = {}): ThreadBudget {
  const pick = (key: keyof typeof THREAD_DEFAULTS): { value: number; assumption: BudgetAssumption } => {
    const own = settings[key];
    if (own !== undefined) return { value: own, assumption: { setting: key, value: own, source: 'design' } };
    const d = THREAD_DEFAULTS[key];
    return { value: d.value, assumption: { setting: key, value: d.value, source: d.source } };
  };
  const spi = pick('spi');
  const thickness = pick('sandwichThickness');
  const tail = pick('tieOffTail');
  const capacity = pick('bobbinCapacity');
  const speed = pick('stitchesPerMinute');
  const sewnInches = sewnLength * inchesPerUnit(units);
  const stitchCount = Math.round(sewnInches * spi.value);
  const perThreadInches = sewnInches + stitchCount * thickness.value + passes * 2 * tail.value;
  const yards = perThreadInches / INCHES_PER_YARD;
  return {
    stitchCount,
    topThreadYards: yards,
    bobbinThreadYards: yards,
    topThreadMeters: perThreadInches * METERS_PER_INCH,
    bobbinThreadMeters: perThreadInches * METERS_PER_INCH,
    bobbins: yards > 0 ? Math.ceil(yards / capacity.value) : 0,
    sewingMinutes: stitchCount / speed.value,
    assumptions: [
      { setting: 'model', value: 'lockstitch 301: top ≈ bobbin ≈ stitch length + sandwich thickness per stitch', source: 'geometric derivation (ours); matches the 2.5× thread-to-seam ratio quoted for 301 on thin fabric (from memory)' },
      spi.assumption,
      thickness.assumption,
      tail.assumption,
      capacity.assumption,
      speed.assumption,
    ],
  };
}
