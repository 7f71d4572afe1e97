/**
 * Which parameters a data set determines, found before fitting from the sensitivities at the
 * starting point: the Jacobian in ln(parameter), columns scaled to unit length; while the smallest
 * singular value is below 1/CONDITION of the largest, the parameter that loads most on that weakest
 * direction is held at its start. A parameter whose column is under 1 % of the largest (doubling
 * it moves the curves by less than a hundredth of what doubling the most felt one does: a fast
 * equilibrium, a step after the one that limits) is held first. What remains is what the data can
 * pin down together.
 */
import { Matrix, SingularValueDecomposition } from 'ml-matrix';
import { numericJacobian } from './numeric-jacobian.ts';

/** Condition number beyond which the scaled sensitivities count as dependent. */
export const CONDITION = 1e4;
/** Sensitivity, relative to the largest, below which a parameter is held. */
export const INSENSITIVE = 1e-2;

/** The names of the parameters to fit; `model` takes values in `names` order. */
export function determinedParameters(
  names: readonly string[],
  values: readonly number[],
  model: (values: readonly number[]) => readonly number[],
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
  return kept.map((j) => names[j]!);
}
