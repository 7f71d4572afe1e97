/**
 * Information criteria for models fitted by least squares to the same data, and the Akaike
 * weights that turn them into a plain statement ("the data favour model 2: weight 0.87").
 *
 * For least squares with independent normal errors of one unknown variance, the maximised
 * log-likelihood is ln L = −n/2 (ln 2π + ln(RSS/n) + 1), and the variance is itself a fitted
 * parameter, so K = (fitted parameters) + 1 (Burnham and Anderson, Model Selection and
 * Multimodel Inference, 2nd ed. 2002, section 2.2 — from memory). AIC = −2 ln L + 2K;
 * AICc = AIC + 2K(K + 1)/(n − K − 1) (Hurvich and Tsai 1989); BIC = −2 ln L + K ln n (Schwarz
 * 1978). Only differences between models fitted to the same points with the same weights mean
 * anything.
 */

/** The criteria of one fitted model. */
export interface InformationCriteria {
  logLikelihood: number;
  /** K: the parameters the criteria count (for least squares, the fitted ones plus the variance) */
  k: number;
  n: number;
  aic: number;
  /** Infinity when n ≤ K + 1: too few points for the small-sample correction */
  aicc: number;
  bic: number;
}

/** ln L at the least-squares minimum, with the variance estimated as RSS/n. */
export function leastSquaresLogLikelihood(rss: number, n: number): number {
  return (-n / 2) * (Math.log(2 * Math.PI) + Math.log(rss / n) + 1);
}

/** AIC, AICc and BIC from a maximised log-likelihood, K counted parameters and n points. */
export function informationCriteria(logLikelihood: number, k: number, n: number): InformationCriteria {
  const aic = -2 * logLikelihood + 2 * k;
  const aicc = n - k - 1 > 0 ? aic + (2 * k * (k + 1)) / (n - k - 1) : Infinity;
  const bic = -2 * logLikelihood + k * Math.log(n);
  return { logLikelihood, k, n, aic, aicc, bic };
}

/** The criteria of a least-squares fit with `parameters` fitted parameters (the variance is added to K). */
export function leastSquaresCriteria(rss: number, n: number, parameters: number): InformationCriteria {
  return informationCriteria(leastSquaresLogLikelihood(rss, n), parameters + 1, n);
}

/** Differences from the best (smallest) criterion and the Akaike weights exp(−Δ/2)/Σ exp(−Δ/2). */
export function akaikeWeights(criteria: readonly number[]): { deltas: number[]; weights: number[] } {
  const finite = criteria.filter(Number.isFinite);
  const best = finite.length > 0 ? Math.min(...finite) : NaN;
  const deltas = criteria.map((c) => (Number.isFinite(c) ? c - best : Infinity));
  const relative = deltas.map((d) => (Number.isFinite(d) ? Math.exp(-d / 2) : 0));
  const total = relative.reduce((a, b) => a + b, 0);
  return { deltas, weights: relative.map((r) => (total > 0 ? r / total : NaN)) };
}
