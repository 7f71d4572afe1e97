/**
 * Which parameters a data set determines, found before fitting from the sensitivities at the
 * starting point: the Jacobian in ln(parameter), columns scaled to unit length; while the smallest
 * singular value is below 1/CONDITION of the largest, the parameter that loads most on that weakest
 * direction is held at its start. A parameter whose column is under 1 % of the largest (doubling
 * it moves the curves by less than a hundredth of what doubling the most felt one does: a fast
 * equilibrium, a step after the one that limits) is held first. What remains is what the data can
 * pin down together. Given the scatter of the data (a residual variance per point, from a cheaper
 * fit of the same data), a parameter whose predicted standard error of ln(value) at the start
 * exceeds MAX_LOG_SE is held too, the worst first: the data would leave it free along a ridge,
 * where it only soaks up noise.
 */
import { Matrix, SingularValueDecomposition } from 'ml-matrix';
import { numericJacobian } from './numeric-jacobian.ts';

/** Condition number beyond which the scaled sensitivities count as dependent. */
export const CONDITION = 1e4;
/** Sensitivity, relative to the largest, below which a parameter is held. */
export const INSENSITIVE = 1e-2;

/** Predicted standard error of ln(value) above which a parameter counts as undetermined (a factor e). */
export const MAX_LOG_SE = 1;

/** The names of the parameters to fit; `model` takes values in `names` order; `variance`: the scatter per point. */
export function determinedParameters(
  names: readonly string[],
  values: readonly number[],
  model: (values: readonly number[]) => readonly number[],
  variance?: number,
): string[] {
  const logModel = (theta: readonly number[]) => model(theta.map(Math.exp));
  const jacobian = numericJacobian(logModel, values.map(Math.log), 1e-4);
  let kept = names.map((_, j) => j);
  const norm = (j: number) => Math.hypot(...jacobian.map((row) => row[j]!));
  const largest = Math.max(...kept.map(norm).filter(Number.isFinite), 0);
  kept = kept.filter((j) => Number.isFinite(norm(j)) && norm(j) > INSENSITIVE * largest && largest > 0);
  while (kept.length > 1) {
    const scaled = new Matrix(jacobian.map((row) => kept.map((j) => row[j]! / norm(j))));
    const svd = new SingularValueDecomposition(scaled, { autoTranspose: true });
    const sigma = svd.diagonal;
    const smallest = sigma.indexOf(Math.min(...sigma));
    if (sigma[smallest]! * CONDITION >= Math.max(...sigma)) break;
    const v = svd.rightSingularVectors;
    const loadings = kept.map((_, k) => Math.abs(v.get(k, smallest)));
    kept.splice(loadings.indexOf(Math.max(...loadings)), 1);
  }
  while (variance !== undefined && variance > 0 && kept.length > 0) {
    const J = new Matrix(jacobian.map((row) => kept.map((j) => row[j]!)));
    const information = J.transpose().mmul(J);
    const inverse = new SingularValueDecomposition(information).inverse();
    const se = kept.map((_, k) => Math.sqrt(Math.max(0, inverse.get(k, k)) * variance));
    const worst = se.indexOf(Math.max(...se));
    if (!(se[worst]! > MAX_LOG_SE)) break;
    kept.splice(worst, 1);
  }
  return kept.map((j) => names[j]!);
}
