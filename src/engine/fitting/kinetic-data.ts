/**
 * Kinetic data in canonical units, ready to fit: concentrations in M (mol dm^-3), rates in
 * M s^-1, times in s, temperatures in K, rate constants in M^(1−n) s^-1. Built from a record's
 * data table by `readKineticData`.
 */

/** Initial rates at varied concentrations, one point per row. */
export interface InitialRateData {
  kind: 'initial_rates';
  observation: string;
  /** species symbols, one per concentration column */
  species: string[];
  /** per point, one concentration per species / M */
  concentrations: number[][];
  /** per point / M s^-1 */
  rates: number[];
  rateUncertainties?: number[];
  /** replicate labels, when the table has them */
  replicates?: string[];
}

/** Concentrations against time, from the observation's starting concentrations. */
export interface TimeCourseData {
  kind: 'time_course';
  observation: string;
  /** per point / s */
  times: number[];
  species: string[];
  /** per point, per species / M; undefined where not measured */
  concentrations: (number | undefined)[][];
  /** per point, per species / M, when the table has them */
  uncertainties?: (number | undefined)[][];
  replicates?: string[];
}

/** A rate constant at several temperatures. */
export interface TemperatureSeriesData {
  kind: 'temperature_series';
  observation: string;
  /** per point / K */
  T: number[];
  /** per point / M^(1−order) s^-1 */
  k: number[];
  kUncertainties?: number[];
  /** the order n of the constant, read from its unit (M^(1−n) s^-1) */
  order: number;
  /** which constant: k_obs or a step's k_label / k_-label */
  constant: string;
  replicates?: string[];
}

/** Any of the three kinds. */
export type KineticData = InitialRateData | TimeCourseData | TemperatureSeriesData;
