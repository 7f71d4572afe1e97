/**
 * Activation parameters from rate constants measured at several temperatures, by weighted linear
 * least squares on the linearised equations:
 *   Arrhenius  ln k = ln A − Ea/(RT)
 *   Eyring     ln(k/T) = ln(k_B/h) + (1 − n) ln c° + ΔS‡/R − ΔH‡/(RT)
 * Without uncertainties every ln k counts alike, which is the same as assuming a constant relative
 * error in k (Lente, Fábián and Poë, New J. Chem. 2005, 29, 759, show that this linear fit equals
 * the direct fit of the exponential with proportional weighting). ΔS‡ refers to the standard
 * concentration c° (1 M unless given) of each of the n particles that meet; ΔG‡ is reported at
 * 298.15 K with its standard error from the covariance of ΔH‡ and ΔS‡, which are strongly
 * correlated because ΔS‡ comes from an extrapolation to 1/T = 0.
 */
import { BOLTZMANN, GAS_CONSTANT, PLANCK } from '../units/physical-constants.ts';
import { fittedParameter, type FittedParameter } from './fitted-parameter.ts';
import { linearLeastSquares, type LinearFit } from './linear-least-squares.ts';

/** Rate constants at several temperatures. */
export interface TemperatureSeries {
  /** temperatures / K */
  T: readonly number[];
  /** rate constants in M^(1−n) s^-1 */
  k: readonly number[];
  /** standard uncertainty of each k, in the same unit */
  kUncertainties?: readonly number[];
}

/** The Arrhenius parameters. */
export interface ArrheniusFit {
  /** Ea / J mol^-1 */
  activationEnergy: FittedParameter;
  /** ln(A / (M^(1−n) s^-1)) */
  lnPreExponential: FittedParameter;
  /** correlation of Ea and ln A */
  correlation: number;
  fit: LinearFit;
}

/** The Eyring activation parameters. */
export interface EyringFit {
  /** ΔH‡ / J mol^-1 */
  enthalpy: FittedParameter;
  /** ΔS‡ / J mol^-1 K^-1, for the standard concentration below */
  entropy: FittedParameter;
  /** ΔG‡ / J mol^-1 at `referenceTemperature` */
  gibbs: FittedParameter;
  /** correlation of ΔH‡ and ΔS‡ */
  correlation: number;
  referenceTemperature: number;
  /** c° / M that ΔS‡ and ΔG‡ refer to */
  standardConcentration: number;
  /** the order n of the rate constant (its unit is M^(1−n) s^-1) */
  order: number;
  fit: LinearFit;
}

/** ΔG‡ is quoted at 298.15 K, the conventional reference temperature. */
export const REFERENCE_TEMPERATURE = 298.15;

function weightsOf(series: TemperatureSeries): { weights?: number[] } {
  const u = series.kUncertainties;
  return u ? { weights: series.k.map((k, i) => (k / u[i]!) ** 2) } : {};
}

/** Ea and ln A from ln k against 1/T. */
export function fitArrhenius(series: TemperatureSeries): ArrheniusFit {
  const design = series.T.map((T) => [1, -1 / (GAS_CONSTANT * T)]);
  const y = series.k.map((k) => Math.log(k));
  const fit = linearLeastSquares({ design, y, names: ['ln A', 'Ea'], ...weightsOf(series) });
  const [lnA, Ea] = fit.parameters as [FittedParameter, FittedParameter];
  return { activationEnergy: Ea, lnPreExponential: lnA, correlation: fit.correlation[0]![1]!, fit };
}

/** ΔH‡, ΔS‡ and ΔG‡(298.15 K) from ln(k/T) against 1/T, for a rate constant of order `order`. */
export function fitEyring(series: TemperatureSeries, order = 1, standardConcentration = 1): EyringFit {
  const offset = Math.log(BOLTZMANN / PLANCK) + (1 - order) * Math.log(standardConcentration);
  const design = series.T.map((T) => [1 / GAS_CONSTANT, -1 / (GAS_CONSTANT * T)]);
  const y = series.k.map((k, i) => Math.log(k / series.T[i]!) - offset);
  const fit = linearLeastSquares({ design, y, names: ['ΔS‡', 'ΔH‡'], ...weightsOf(series) });
  const [entropy, enthalpy] = fit.parameters as [FittedParameter, FittedParameter];
  const T = REFERENCE_TEMPERATURE;
  const covariance = fit.covariance;
  const variance = covariance[1]![1]! + T * T * covariance[0]![0]! - 2 * T * covariance[0]![1]!;
  const gibbs = fittedParameter('ΔG‡', enthalpy.value - T * entropy.value, Math.sqrt(variance), fit.dof);
  return {
    enthalpy,
    entropy,
    gibbs,
    correlation: fit.correlation[0]![1]!,
    referenceTemperature: T,
    standardConcentration,
    order,
    fit,
  };
}
