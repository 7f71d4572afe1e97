/**
 * A budget of symbolic work, counted in term products (one coefficient times one monomial), so
 * that a derivation stops at the same point on every machine and every run: the report must not
 * depend on how busy the computer was. Symbolic routines charge it before each polynomial product
 * or exact division and give up, with a value that says so, once it is spent.
 */
export class WorkBudget {
  private used = 0;

  /** A budget of `limit` term products (Infinity: no limit). */
  constructor(readonly limit: number) {}

  /** No limit: for callers that know their problem is small (tests, single equations). */
  static unlimited(): WorkBudget {
    return new WorkBudget(Number.POSITIVE_INFINITY);
  }

  /** Term products spent so far. */
  get spent(): number {
    return this.used;
  }

  /** True once the work charged exceeds the limit. */
  get exhausted(): boolean {
    return this.used > this.limit;
  }

  /** Charges `units` term products; returns false when that spends the budget. */
  charge(units: number): boolean {
    this.used += units;
    return this.used <= this.limit;
  }
}

/**
 * The budget of one steady-state derivation, in term products. Measured with
 * scripts/bench-symbolic.ts on the project's 2-core machine: about 2–4 million term products a
 * second in the Bareiss elimination, so this stops a derivation after roughly one to two seconds
 * of symbolic work; a 12-step reversible catalytic cycle needs about a twentieth of it.
 */
export const STEADY_STATE_WORK = 4_000_000;
