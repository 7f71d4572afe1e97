/**
 * Whether a time-course fit can be read as a fit. A fit that stopped before converging, a
 * constant the data do not bound (it ran to the edge of its search window, or its standard error
 * swamps it), or curves far outside the measured scatter (with per-point uncertainties: χ² of the
 * weighted residuals beyond its 0.1 % tail) each make the fitted constants untrustworthy. The
 * reasons are plain sentences; none means the fit stands.
 */
import { chiSquareTailProbability } from './distributions.ts';
import type { NonlinearFit } from './nonlinear-fit.ts';

/** Tail probability of χ² below which the curves miss the data beyond their stated scatter. */
export const LACK_OF_FIT_P = 1e-3;

/** Why the fit is not to be trusted; empty when it is. `weighted`: the residuals are scaled by measured uncertainties. */
export function unreliableReasons(fit: NonlinearFit, weighted: boolean): string[] {
  const reasons: string[] = [];
  if (!fit.converged) reasons.push(`the fit did not converge in ${fit.iterations} iterations`);
  const weak = fit.parameters.filter((p) => !p.identifiable);
  if (weak.length > 0)
    reasons.push(
      `the data do not determine ${weak.map((p) => p.name).join(', ')} (${weak[0]!.identifiabilityNote ?? 'no bound'})`,
    );
  if (weighted && fit.dof >= 1) {
    const p = chiSquareTailProbability(fit.rss, fit.dof);
    if (p < LACK_OF_FIT_P)
      reasons.push(
        `the curves miss the data far beyond their stated uncertainties (χ² ${fit.rss.toPrecision(3)} for ${fit.dof} degrees of freedom, p ${p.toPrecision(1)})`,
      );
  }
  if (!Number.isFinite(fit.rss)) reasons.push('the model could not be evaluated at the fitted constants');
  return reasons;
}
