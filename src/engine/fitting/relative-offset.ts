/**
 * The relative offset convergence criterion of Bates and Watts (Technometrics 1981, 23, 179 —
 * from memory): at a least-squares minimum the residual vector is orthogonal to the tangent plane
 * of the model, so the part of it that lies in that plane, relative to the part that does not,
 * measures how far the iteration still is from the minimum in units of the statistical
 * uncertainty. It does not depend on the scale of the data or of the parameters, unlike a test on
 * the change of the residual sum of squares.
 */
import { Matrix, SingularValueDecomposition } from 'ml-matrix';

/**
 * √(‖Q₁ᵀr‖²/p) / √(‖r − Q₁Q₁ᵀr‖²/(n − p)), with Q₁ an orthonormal basis of the Jacobian's columns.
 * 0 for an exact fit; NaN when n ≤ p or the Jacobian is zero or not finite.
 */
export function relativeOffset(jacobian: readonly (readonly number[])[], residuals: readonly number[]): number {
  const n = residuals.length;
  const p = jacobian[0]?.length ?? 0;
  if (n <= p || p === 0 || !jacobian.every((row) => row.every(Number.isFinite))) return NaN;
  const svd = new SingularValueDecomposition(new Matrix(jacobian.map((row) => [...row])), { autoTranspose: true });
  const largest = Math.max(...svd.diagonal);
  // A model that no parameter moves (all derivatives zero) is nowhere near a minimum worth the name.
  if (!(largest > 0)) return NaN;
  const u = svd.leftSingularVectors;
  let inPlane = 0;
  svd.diagonal.forEach((s, k) => {
    if (!(s > largest * 1e-14)) return;
    let c = 0;
    for (let i = 0; i < n; i++) c += u.get(i, k) * residuals[i]!;
    inPlane += c * c;
  });
  const total = residuals.reduce((sum, r) => sum + r * r, 0);
  const outOfPlane = Math.max(total - inPlane, 0);
  if (total === 0) return 0;
  return Math.sqrt(inPlane / p) / Math.sqrt(outOfPlane / (n - p));
}
