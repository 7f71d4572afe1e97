/**
 * A measured work budget for the route search: each set of steps visited and each exact kernel
 * solved costs one unit, so a mechanism too tangled to search stops with a diagnostic in
 * seconds instead of running for minutes. The unit count, not the clock, decides, so the same
 * record always gets the same answer on any machine.
 */

/** Units the route search may spend: about two seconds on a slow shared core (scripts/bench-route-search.ts). */
export const ROUTE_SEARCH_BUDGET = 30_000;

/** Counts the work of one search and says when it is spent. */
export class SearchBudget {
  private spent = 0;

  constructor(readonly limit: number = ROUTE_SEARCH_BUDGET) {}

  /** Takes `units` of work; false once the budget is exhausted (the caller stops). */
  take(units = 1): boolean {
    this.spent += units;
    return this.spent <= this.limit;
  }

  /** True once more work was asked for than the budget allows. */
  get exhausted(): boolean {
    return this.spent > this.limit;
  }

  /** The units still available. */
  get remaining(): number {
    return Math.max(0, this.limit - this.spent);
  }

  /** The units used so far. */
  get used(): number {
    return this.spent;
  }
}
