/**
 * Fitting kinetic data: weighted linear least squares, Levenberg–Marquardt nonlinear least
 * squares, orders from initial-rate tables, Arrhenius and Eyring activation parameters, and the
 * criteria that compare models fitted to the same data. Pure: numbers in, numbers out.
 */
export { CONFIDENCE_LEVEL, fTailProbability, intervalMultiplier, studentTQuantile } from './distributions.ts';
export { correlationMatrix, type FitIssue, type FittedParameter } from './fitted-parameter.ts';
export { linearLeastSquares, type LinearFit, type LinearProblem, type Weighting } from './linear-least-squares.ts';
export { fitNonlinear, type NonlinearOptions } from './nonlinear-least-squares.ts';
export type { NonlinearFit, NonlinearParameter, NonlinearParameterFit, NonlinearProblem } from './nonlinear-fit.ts';
export { POORLY_DETERMINED, SINGULAR_CONDITION } from './nonlinear-statistics.ts';
export { relativeOffset } from './relative-offset.ts';
export {
  akaikeWeights,
  informationCriteria,
  leastSquaresCriteria,
  leastSquaresLogLikelihood,
  type InformationCriteria,
} from './information-criteria.ts';
export { nestedFTest, type FTestResult, type NestedModel } from './nested-f-test.ts';
export { fitInitialRateOrders, type InitialRateTable, type OrderFit } from './initial-rate-orders.ts';
export {
  REFERENCE_TEMPERATURE,
  fitArrhenius,
  fitEyring,
  type ArrheniusFit,
  type EyringFit,
  type TemperatureSeries,
} from './activation-parameters.ts';
export { readKineticData } from './read-kinetic-data.ts';
export type { InitialRateData, KineticData, TemperatureSeriesData, TimeCourseData } from './kinetic-data.ts';
