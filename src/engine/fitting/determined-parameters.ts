/**
 * Which parameters a data set determines, found before fitting from the sensitivities at the
 * starting point: the Jacobian in ln(parameter), columns scaled to unit length; while the smallest
 * singular value is below 1/CONDITION of the largest, the parameter that loads most on that weakest
 * direction is held at its start. A parameter whose column is zero (the data do not feel it at all)
 * is held first. What remains is what the data can pin down together.
 */
import { Matrix, SingularValueDecomposition } from 'ml-matrix';
import { numericJacobian } from './numeric-jacobian.ts';

/** Condition number beyond which the scaled sensitivities count as dependent. */
export const CONDITION = 1e3;

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
  kept = kept.filter((j) => Number.isFinite(norm(j)) && norm(j) > 1e-8 * largest && largest > 0);
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
