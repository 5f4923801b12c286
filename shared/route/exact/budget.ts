/**
 * The planner's time budget for the exact search (ms). The core reads no clock of its own: with a clock passed in
 * (the engine worker passes `performance.now`) the budget counts wall time; without one it counts the solver's own
 * measured time, which is the bulk of the search.
 */
export class Budget {
  private readonly started: number;
  private solverMs = 0;

  constructor(
    readonly totalMs: number,
    private readonly clock: (() => number) | null,
  ) {
    this.started = clock?.() ?? 0;
  }

  /** Records time the solver reported for one call. */
  charge(seconds: number): void {
    this.solverMs += seconds * 1000;
  }

  spentMs(): number {
    return this.clock ? this.clock() - this.started : this.solverMs;
  }

  remainingMs(): number {
    return Math.max(0, this.totalMs - this.spentMs());
  }
}
