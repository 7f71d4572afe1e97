/**
 * The Jacobian of a model vector by central differences, for models without an analytic one.
 * Each step is scaled to its parameter (∛ε relative, the step that balances truncation against
 * rounding for a central difference), so a rate constant of 1e-4 and one of 1e4 are both
 * differentiated accurately.
 */

/** ∂fᵢ/∂θⱼ as rows (points) of columns (parameters); non-finite entries where the model failed. */
export function numericJacobian(
  model: (theta: readonly number[]) => readonly number[],
  theta: readonly number[],
  step = Math.cbrt(Number.EPSILON),
): number[][] {
  const columns = theta.map((value, j) => {
    const h = step * (value !== 0 ? Math.abs(value) : 1);
    const up = theta.slice();
    const down = theta.slice();
    up[j] = value + h;
    down[j] = value - h;
    // The actual difference of the two arguments, which may differ from 2h by rounding.
    const width = up[j]! - down[j]!;
    const plus = model(up);
    const minus = model(down);
    return plus.map((f, i) => (f - minus[i]!) / width);
  });
  const n = columns[0]?.length ?? 0;
  return Array.from({ length: n }, (_, i) => columns.map((column) => column[i]!));
}
