/**
 * Weighted linear least squares: minimise Σ wᵢ (yᵢ − xᵢ·β)² for the coefficients β, with their
 * covariance, standard errors and 95 % intervals. Solved by a singular value decomposition of
 * the weighted design matrix with its columns scaled to unit length (never the normal equations,
 * which square the condition number), then one step of iterative refinement, which is what lets
 * the ill-conditioned NIST Longley problem come out to its certified digits.
 */
import { Matrix, SingularValueDecomposition } from 'ml-matrix';
import {
  correlationMatrix,
  fittedParameter,
  type FittedParameter,
  type LeastSquaresSummary,
} from './fitted-parameter.ts';

/** How weights are read: as relative (scaled by the residual variance) or as 1/σ² of known σ. */
export type Weighting = 'relative' | 'absolute';

/** The problem: one row of the design matrix per point. */
export interface LinearProblem {
  design: readonly (readonly number[])[];
  y: readonly number[];
  /** one weight per point (1/σ² when the uncertainties are known); all 1 when absent */
  weights?: readonly number[];
  /** parameter names, one per column (b0, b1, … when absent) */
  names?: readonly string[];
  /** 'relative' (default): covariance scaled by the residual variance s²; 'absolute': weights are 1/σ² and are trusted */
  weighting?: Weighting;
}

/** A linear least-squares fit. */
export interface LinearFit extends LeastSquaresSummary {
  parameters: FittedParameter[];
  /** 1 − rss/tss, with tss about the weighted mean when a column is constant (an intercept), otherwise about zero */
  rSquared: number;
  /** numerical rank of the design; below the number of columns the problem is not identifiable */
  rank: number;
  /** ratio of the largest to the smallest singular value of the column-scaled weighted design */
  conditionNumber: number;
}

// Singular values below this fraction of the largest are treated as zero (rank deficiency).
const RANK_TOLERANCE = 1e-12;

/** Fits β by weighted least squares; never throws on bad numbers (rank deficiency is reported). */
export function linearLeastSquares(problem: LinearProblem): LinearFit {
  const { design, y } = problem;
  const n = y.length;
  const p = design[0]?.length ?? 0;
  const weights = problem.weights ?? y.map(() => 1);
  const root = weights.map((w) => Math.sqrt(w));
  const scale = columnScales(design, root, p);
  const z = new Matrix(design.map((row, i) => row.map((x, j) => (root[i]! * x) / scale[j]!)));
  const svd = new SingularValueDecomposition(z, { autoTranspose: true });
  const sigma = svd.diagonal;
  const largest = Math.max(...sigma, 0);
  const kept = sigma.map((s) => s > largest * RANK_TOLERANCE && s > 0);
  const rank = kept.filter(Boolean).length;
  const solve = (rhs: readonly number[]): number[] => pseudoSolve(svd, kept, rhs);
  // Solve, then refine once on the residual: the correction recovers digits the first solve lost.
  const target = y.map((v, i) => root[i]! * v);
  const first = solve(target);
  const correction = solve(target.map((t, i) => t - dot(z.getRow(i), first)));
  const scaled = first.map((b, j) => b + correction[j]!);
  const beta = scaled.map((b, j) => b / scale[j]!);
  const fitted = design.map((row) => dot(row, beta));
  const residuals = y.map((v, i) => v - fitted[i]!);
  const rss = residuals.reduce((sum, r, i) => sum + weights[i]! * r * r, 0);
  const dof = n - rank;
  const variance = problem.weighting === 'absolute' ? 1 : dof > 0 ? rss / dof : NaN;
  const covariance = scaledCovariance(svd, kept, scale, variance, p);
  const names = problem.names ?? beta.map((_, j) => `b${j}`);
  const parameters = beta.map((b, j) => {
    const unidentified = rank < p && loadsOnNullSpace(svd, kept, j);
    const note = unidentified ? 'the data cannot separate this parameter from the others' : undefined;
    return fittedParameter(names[j] ?? `b${j}`, b, Math.sqrt(covariance[j]![j]!), dof, note);
  });
  const smallest = Math.min(...sigma);
  return {
    parameters,
    covariance,
    correlation: correlationMatrix(covariance),
    rss,
    n,
    dof,
    residualStandardDeviation: Math.sqrt(rss / dof),
    rSquared: 1 - rss / totalSumOfSquares(design, y, weights),
    fitted,
    residuals,
    rank,
    conditionNumber: smallest > 0 ? largest / smallest : Infinity,
  };
}

function columnScales(design: LinearProblem['design'], root: readonly number[], p: number): number[] {
  return Array.from({ length: p }, (_, j) => {
    const norm = Math.hypot(...design.map((row, i) => root[i]! * row[j]!));
    return norm > 0 && Number.isFinite(norm) ? norm : 1;
  });
}

function pseudoSolve(svd: SingularValueDecomposition, kept: readonly boolean[], rhs: readonly number[]): number[] {
  const u = svd.leftSingularVectors;
  const v = svd.rightSingularVectors;
  const out = new Array<number>(v.rows).fill(0);
  kept.forEach((keep, k) => {
    if (!keep) return;
    let c = 0;
    for (let i = 0; i < rhs.length; i++) c += u.get(i, k) * rhs[i]!;
    c /= svd.diagonal[k]!;
    for (let j = 0; j < v.rows; j++) out[j]! += v.get(j, k) * c;
  });
  return out;
}

function scaledCovariance(
  svd: SingularValueDecomposition,
  kept: readonly boolean[],
  scale: readonly number[],
  variance: number,
  p: number,
): number[][] {
  const v = svd.rightSingularVectors;
  return Array.from({ length: p }, (_, a) =>
    Array.from({ length: p }, (_, b) => {
      let c = 0;
      kept.forEach((keep, k) => {
        if (keep) c += (v.get(a, k) * v.get(b, k)) / svd.diagonal[k]! ** 2;
        // A direction the data do not determine has unbounded variance.
        else if (Math.abs(v.get(a, k)) > 1e-8 && Math.abs(v.get(b, k)) > 1e-8) c = Infinity;
      });
      return (variance * c) / (scale[a]! * scale[b]!);
    }),
  );
}

function loadsOnNullSpace(svd: SingularValueDecomposition, kept: readonly boolean[], j: number): boolean {
  return kept.some((keep, k) => !keep && Math.abs(svd.rightSingularVectors.get(j, k)) > 1e-8);
}

function totalSumOfSquares(design: LinearProblem['design'], y: readonly number[], weights: readonly number[]): number {
  const p = design[0]?.length ?? 0;
  const hasIntercept = Array.from({ length: p }, (_, j) => j).some((j) =>
    design.every((row) => row[j] === design[0]![j] && row[j] !== 0),
  );
  const totalWeight = weights.reduce((a, b) => a + b, 0);
  const mean = hasIntercept ? y.reduce((s, v, i) => s + weights[i]! * v, 0) / totalWeight : 0;
  return y.reduce((s, v, i) => s + weights[i]! * (v - mean) ** 2, 0);
}

function dot(a: readonly number[], b: readonly number[]): number {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i]! * b[i]!;
  return s;
}
