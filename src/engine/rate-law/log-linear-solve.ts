/**
 * Equilibrium expressions in logarithms: Π[u]^ν = K Π[known]^μ is linear in ln[u]. Solving the
 * system exactly over the rationals gives each unknown as a monomial with rational exponents,
 * so a dissociation (A2 ⇌ 2 A) yields [A] = K^(1/2) [A2]^(1/2).
 */
import { Monomial } from '../exact/index.ts';
import { Rational } from '../exact/rational.ts';

export interface LogLinearRow {
  /** exponent of each unknown on the left */
  exponents: Rational[];
  /** the right-hand side, a monomial in known symbols */
  rhs: Monomial;
}

/** The unknowns the system fixes, each as a monomial in the known symbols. */
export function solveLogLinear(rows: readonly LogLinearRow[], unknowns: number): (Monomial | undefined)[] {
  const work = rows.map((r) => ({ exponents: [...r.exponents], rhs: r.rhs }));
  const pivots: number[] = [];
  let r = 0;
  for (let c = 0; c < unknowns && r < work.length; c++) {
    const p = work.findIndex((row, i) => i >= r && !row.exponents[c]!.isZero());
    if (p < 0) continue;
    [work[r], work[p]] = [work[p]!, work[r]!];
    const pivot = work[r]!;
    const inv = pivot.exponents[c]!.inverse();
    pivot.exponents = pivot.exponents.map((e) => e.mul(inv));
    pivot.rhs = pivot.rhs.pow(inv);
    for (let i = 0; i < work.length; i++) {
      const f = work[i]!.exponents[c]!;
      if (i === r || f.isZero()) continue;
      // row_i − f·row_r in logarithms is rhs_i / rhs_r^f.
      work[i]!.exponents = work[i]!.exponents.map((e, j) => e.sub(f.mul(pivot.exponents[j]!)));
      work[i]!.rhs = work[i]!.rhs.div(pivot.rhs.pow(f));
    }
    pivots.push(c);
    r++;
  }
  const solution: (Monomial | undefined)[] = Array(unknowns).fill(undefined);
  pivots.forEach((c, i) => {
    const row = work[i]!;
    const determined = row.exponents.every((e, j) => j === c || e.isZero());
    if (determined) solution[c] = row.rhs;
  });
  return solution;
}
