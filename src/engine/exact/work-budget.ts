import type { Polynomial } from './polynomial.ts';

/**
 * A budget of symbolic work, counted in units of one term product (one coefficient times one
 * monomial) weighted by the length of the monomials, which is what a product costs; so that a
 * derivation stops at the same point on every machine and every run: the report must not depend
 * on how busy the computer was. Symbolic routines charge it before each polynomial product or
 * exact division and give up, with a value that says so, once it is spent.
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

  /** Charges `units`; returns false when that spends the budget. */
  charge(units: number): boolean {
    this.used += units;
    return this.used <= this.limit;
  }

  /** Charges the work of p·q (or of dividing one by the other): |p|·|q| term products, each as long as its monomials. */
  chargeProduct(p: Polynomial, q: Polynomial): boolean {
    const width = (x: Polynomial) => x.terms[0]?.monomial.factors.length ?? 0;
    return this.charge(p.terms.length * q.terms.length * (1 + (width(p) + width(q)) / 4));
  }
}

/**
 * The budget of one steady-state derivation, in weighted term products. Measured with
 * scripts/bench-symbolic.ts and profiles of generated records on the project's 2-core machine,
 * where a unit costs 3–4 µs: a 12-step reversible catalytic cycle needs about 32 thousand, a
 * 40-step reversible chain about 250 thousand (a 60-step one 860 thousand, and falls back to
 * numbers); a generated system whose elimination by resultants swells needed 10 million, 41 s
 * and most of the heap before this budget stopped it within about two seconds.
 */
export const STEADY_STATE_WORK = 600_000;
