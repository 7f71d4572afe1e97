/**
 * src/engine: the derivation engine, pure chemistry (no file system, no console, no Astro). This
 * is its public API: everything outside the engine imports from here. Inside, each concept has its
 * folder — exact/ (rationals, polynomials, Bareiss), numeric/ (the stiff integrator), notation/
 * (formulas, equations), units/, mechanism/, route/, rate-law/, observations/, energy/,
 * simulation/ — and derive.ts runs them in order.
 */
export { deriveMechanism, judgeObservations, simulationBasis, type Derivation, type DeriveOptions } from './derive.ts';
export { DERIVATION_CLASSES } from './derivation-classes.ts';
export { fitDerivation } from './fit-record.ts';
export { fitSystem, type SystemDataSet, type SystemFits, type SystemRival } from './fit-system.ts';
export type { DataSetFits, LawFitResult, RecordFits } from './fitting/record-fits.ts';
export type { LawFit } from './fitting/law-fit.ts';
export type { TimeCourseFit, TimeCourseModelFit } from './fitting/time-course-fit.ts';
export type { Ranking, RivalRank } from './fitting/rank-rivals.ts';
export type { NextMeasurement } from './fitting/next-measurement.ts';
export type { FitPlotSeries } from './fitting/plot-series.ts';
export type { ActivationComparison } from './fitting/activation-check.ts';

// Exact values the derivation returns.
export { Rational } from './exact/rational.ts';
export { Polynomial, RationalFunction, formatText, formatLatex, type Term as PolynomialTerm } from './exact/index.ts';

// The mechanism, its route and its notation.
export type { Mechanism, Species, Step } from './mechanism/mechanism.ts';
export { molecularity } from './mechanism/molecularity.ts';
export type { StepBalance } from './mechanism/balance.ts';
export type { OverallEquation } from './route/overall-equation.ts';
export type { Route } from './route/route.ts';
export { parseEquation, type Term } from './notation/equation.ts';
export { speciesLatex } from './notation/species-latex.ts';

// Quantities and units.
export { parseQuantity, toCanonical, type Quantity } from './units/quantity.ts';
export { CONCENTRATION, sameDimension, type Dimension } from './units/dimension.ts';

// Rate laws and their symbols.
export type { DerivedRateLaw } from './rate-law/derive-rate-laws.ts';
export type { RateLawMethod, OrderRange } from './rate-law/rate-law.ts';
export type { NormalisedLaw, NormalisedTerm, TradeForm } from './rate-law/normalised-law.ts';
export type { ApparentConstant } from './rate-law/apparent-constant.ts';
export {
  concentration,
  equilibriumConstant,
  forwardConstant,
  reverseConstant,
  symbolLatex,
} from './rate-law/symbols.ts';

// Observations judged against the laws.
export type { ObservationCheck } from './observations/judge-order.ts';
export { decimalPlaces, measurementDecimals } from './observations/measurement-precision.ts';

// Energies.
export type { EnergyBasis, EnergyProfile, EnergyResult, ProfileState } from './energy/index.ts';

// Simulations.
export { DEFAULT_APPROXIMATION_THRESHOLD, type SimulationCheck } from './simulation/approximation-validity.ts';
export { CONVERSION_FOR_INITIAL_RATE } from './simulation/initial-rate.ts';
export {
  concentrationSeries,
  firstObservationSeries,
  type ConcentrationSeries,
  type SeriesOptions,
} from './simulation/concentration-series.ts';
export type { SimulationBasis } from './simulation/simulation-setup.ts';

// Fitting kinetic data: least squares, orders, activation parameters, model comparison.
export {
  CONFIDENCE_LEVEL,
  REFERENCE_TEMPERATURE,
  akaikeWeights,
  fitArrhenius,
  fitEyring,
  fitInitialRateOrders,
  fitNonlinear,
  informationCriteria,
  leastSquaresCriteria,
  leastSquaresLogLikelihood,
  linearLeastSquares,
  nestedFTest,
  readKineticData,
  studentTQuantile,
  type ArrheniusFit,
  type EyringFit,
  type FitIssue,
  type FittedParameter,
  type FTestResult,
  type InformationCriteria,
  type InitialRateData,
  type InitialRateTable,
  type KineticData,
  type LinearFit,
  type LinearProblem,
  type NestedModel,
  type NonlinearFit,
  type NonlinearOptions,
  type NonlinearParameter,
  type NonlinearParameterFit,
  type NonlinearProblem,
  type OrderFit,
  type TemperatureSeries,
  type TemperatureSeriesData,
  type TimeCourseData,
  type Weighting,
} from './fitting/index.ts';
