/**
 * Two or more rival laws fitted to the same initial rates on the log scale, with AICc and Akaike
 * weights: what the demo data script prints and the demo data test checks. The laws are written by
 * hand here; fitting each rival's derived law is the job of the fitting stage to come.
 */
import { akaikeWeights, fitNonlinear, leastSquaresCriteria, type NonlinearFit } from '../../src/engine/index.ts';

/** One rival's law: positive parameters with starting values, and the rate at given concentrations. */
export interface RivalLaw {
  initial: number[];
  law: (p: readonly number[], c: readonly number[]) => number;
}

/** Each rival's fit, AICc, ΔAICc and Akaike weight, in the order given. */
export function compareRivals(
  runs: readonly { c: readonly number[]; rate: number }[],
  laws: Record<string, RivalLaw>,
): { name: string; fit: NonlinearFit; aicc: number; delta: number; weight: number }[] {
  const y = runs.map((r) => Math.log(r.rate));
  const fits = Object.entries(laws).map(([name, { initial, law }]) => {
    const fit = fitNonlinear({
      parameters: initial.map((v, j) => ({ name: `p${j + 1}`, initial: v, positive: true })),
      y,
      model: (p) => runs.map((r) => Math.log(law(p, r.c))),
    });
    return { name, fit, aicc: leastSquaresCriteria(fit.rss, runs.length, initial.length).aicc };
  });
  const { deltas, weights } = akaikeWeights(fits.map((f) => f.aicc));
  return fits.map((f, i) => ({ ...f, delta: deltas[i]!, weight: weights[i]! }));
}
