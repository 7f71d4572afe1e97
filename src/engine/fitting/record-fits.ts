/**
 * What the fits of one record's data sets hold: per data set, the orders fitted from an
 * initial-rate table, each of the record's rate laws fitted to it, the activation parameters of a
 * temperature series, and the time-course fits. Types only, shared by the record's fitting stage,
 * the ranking of rivals and the writers.
 */
import type { ArrheniusFit, EyringFit } from './activation-parameters.ts';
import type { ActivationComparison } from './activation-check.ts';
import type { FitIssue } from './fitted-parameter.ts';
import type { KineticData } from './kinetic-data.ts';
import type { LawFit } from './law-fit.ts';
import type { OrderFit } from './initial-rate-orders.ts';
import type { TimeCourseFit } from './time-course-fit.ts';

/** One rate law of a record fitted to one data set (or why it could not be). */
export interface LawFitResult {
  /** rds, steady_state or long_chain: which of the record's laws */
  method: string;
  /** the normalised law as text, e.g. k_obs*[A]/(1 + K_A*[A]) */
  law: string;
  /** the apparent constants fitted, with their units */
  constants: { name: string; unit: string; latex: string }[];
  fit?: LawFit;
  /** the law's terms (n: numerator, f<power>: a factor's, each by its concentrations), for nesting */
  signature?: string[];
  /** why there is no fit */
  issue?: FitIssue;
}

/** The fits of one data set of a record. */
export interface DataSetFits {
  observation: string;
  observationIndex: number;
  data: KineticData;
  /** initial rates: the power-law orders of every varied species */
  orders?: OrderFit;
  /** initial rates: each of the record's rate laws fitted */
  laws: LawFitResult[];
  /** temperature series */
  arrhenius?: ArrheniusFit;
  eyring?: EyringFit;
  activation?: ActivationComparison;
  /** time course: the closed-form law integrated and the full mass-action simulation fitted */
  timeCourse?: TimeCourseFit;
}

/** Every fit of one record. */
export interface RecordFits {
  dataSets: DataSetFits[];
}
