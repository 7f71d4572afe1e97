/**
 * The `fits` section of a record in the JSON report (additive): the orders fitted from its
 * initial-rate tables, every data set of its system with each rival fitted and ranked, and the
 * activation parameters of its temperature series. Values in the engine's canonical units (M, s,
 * J/mol) unless a key names another; intervals are 95 % (Student t).
 */

/** A fitted value with its uncertainty. */
export interface FittedValueJson {
  name: string;
  value: number;
  standard_error: number;
  /** the 95 % confidence interval (asymmetric for a constant fitted as its logarithm) */
  interval: [number, number];
  /** false when these data do not determine it */
  identifiable: boolean;
  unit?: string;
  note?: string;
}

/** One rival's law (or simulation) fitted to one data set. */
export interface RivalFitJson {
  record: string;
  /** rds, steady_state, long_chain; simulation or closed_form for a time course */
  method: string;
  law?: string;
  parameters: FittedValueJson[];
  /** elementary constants held at their starting values (time-course simulation) */
  fixed?: Record<string, number>;
  /** weighted residual sum of squares (of ln r for initial rates; of concentrations for a time course) */
  rss?: number;
  points?: number;
  aicc?: number;
  bic?: number;
  converged: boolean;
  /** the Akaike weight of the rival (its best law) across the rivals; absent for its other laws */
  weight?: number;
  delta_aicc?: number;
  /** weight against the best rival below 0.01 */
  rejected?: boolean;
  correlation?: number[][];
  issue?: string;
  /** why the fit is not to be trusted (a time course that did not converge, an unbounded constant, a misfit) */
  unreliable?: string;
}

/** One data set of the system with every rival fitted to it. */
export interface DataSetFitsJson {
  observation: string;
  /** the record that holds the data */
  record: string;
  kind: string;
  points: number;
  rivals: RivalFitJson[];
  /** the rival the data favour, with its Akaike weight */
  favoured?: { record: string; weight: number };
  /** 1-based rows of the table that most separate the favoured rival from the next */
  drivers?: number[];
  f_tests?: { simpler: string; complex: string; f: number; df1: number; df2: number; p_value: number }[];
  /** for the surviving rivals: where one run would best tell them apart */
  next_measurement?: {
    symbol: string;
    concentration_m: number;
    range_m: [number, number];
    rivals: [string, string];
    separation_sigma: number;
    rates_m_per_s: [number, number];
  };
}

/** The activation parameters of one temperature series. */
export interface ActivationFitsJson {
  observation: string;
  constant: string;
  order: number;
  points: number;
  arrhenius: { ea_kj_per_mol: FittedValueJson; ln_a: FittedValueJson; correlation: number };
  eyring: {
    dh_kj_per_mol: FittedValueJson;
    ds_j_per_mol_k: FittedValueJson;
    dg_kj_per_mol: FittedValueJson;
    reference_temperature_k: number;
    standard_concentration_m: number;
    correlation: number;
  };
  recorded?: { quantity: string; value_kj_per_mol: number; source: string; agrees: boolean };
}

/** A record's `fits`. */
export interface RecordFitsJson {
  orders?: (FittedValueJson & { observation: string; species: string })[];
  data_sets?: DataSetFitsJson[];
  activation?: ActivationFitsJson[];
}
