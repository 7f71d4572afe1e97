/**
 * The JSON report (DESIGN.md "Contracts"): what `check --format json` prints and the site's API
 * serves. snake_case keys; changed only additively. Plain data: no engine types.
 */
import type { EnergyJson } from './energy-report.ts';
import type { RecordFitsJson } from './fits-report.ts';

export interface DiagnosticJson {
  rule: string;
  severity: string;
  message: string;
  file?: string;
  line?: number;
  column?: number;
  end_line?: number;
  end_column?: number;
  note?: string;
}

export interface RecordReport {
  id: string;
  file: string;
  title?: string;
  system?: string;
  status?: string;
  overall?: {
    reactants: Record<string, number | string>;
    products: Record<string, number | string>;
    catalysts: string[];
    text: string;
  };
  stoichiometric_numbers?: number[];
  stoichiometric_numbers_source?: 'given' | 'derived';
  roles?: Record<string, string>;
  /**
   * the chain the route carries, where one is declared (chain_carrier) or detected: its carriers,
   * and the steps (numbered from 1) that propagate it (the route), start it and end it (off the route)
   */
  chain?: {
    carriers: string[];
    propagation: number[];
    initiation: number[];
    termination: number[];
    source: 'declared' | 'detected';
  };
  buffered?: string[];
  rate_laws?: RateLawJson[];
  observations?: ObservationJson[];
  simulation?: SimulationJson[];
  /** the energy profile and energetic span, where every route step records its energies */
  energy?: EnergyJson;
  /** labels of steps whose rate constants come from their energies (Eyring) */
  constants_from_energies?: string[];
  /** the record's data fitted: orders, each rival fitted to each data set and ranked, activation parameters */
  fits?: RecordFitsJson;
  diagnostics: DiagnosticJson[];
}

export interface SimulationJson {
  observation: string;
  status: string;
  message?: string;
  /** rate of the overall reaction extrapolated to zero conversion (from readings at 1 to 4 %), M s^-1 */
  initial_rate?: number;
  time_s?: number;
  orders: Record<string, number>;
  approximation_error: Record<string, number>;
}

export interface RateLawJson {
  method: string;
  /** plain text and LaTeX of the rate of the overall reaction; absent when solved only numerically */
  text?: string;
  latex?: string;
  grouped?: {
    name: string;
    value_text: string;
    value_latex: string;
    text: string;
    latex: string;
    /** the unit of the grouped constant (M and s: `M^-1 s^-1`), and its value where the constants are given */
    unit?: string;
    unit_latex?: string;
    value?: number;
  };
  /** the law in named apparent constants: each denominator factor from 1, terms collected by concentration */
  normalised?: NormalisedLawJson;
  /**
   * the rate law as data: terms of numerator and denominator, each a coefficient and symbol
   * exponents; a law with radicals adds `roots`, and its numerator and denominator then hold the
   * root symbols too
   */
  structure?: { numerator: TermJson[]; denominator: TermJson[]; roots?: RootJson[] };
  /** limits of the apparent order as [X] → 0 (low) and [X] → ∞ (high) */
  orders: Record<string, { low: number | string; high: number | string }>;
  /** solvents whose constant concentration is absorbed into the constants */
  absorbed?: string[];
  /** the conserved catalysts' forms, for the resting state */
  catalyst_balances?: {
    catalyst: string;
    total: string;
    forms: { species: string; fraction: string; fraction_latex: string }[];
  }[];
  /** the dominant catalyst form at each observation's conditions */
  resting_states?: { observation: string; catalyst: string; species: string; fraction: number }[];
  numeric_only?: boolean;
  derivation: { say: string; text: string; latex: string }[];
}

/** A rate law as numerator / Π (1 + Σ K m)^power, with its named constants (k_obs, K_X …). */
export interface NormalisedLawJson {
  text: string;
  latex: string;
  constants: ApparentConstantJson[];
  /** the law as data: each term ± constant^power × concentrations */
  numerator: NormalisedTermJson[];
  factors: { power: number; terms: NormalisedTermJson[] }[];
  /** the trade's own form where the shape is a standard one (the Michaelis–Menten family) */
  trade?: {
    shape: string;
    substrate: string;
    inhibitors: string[];
    text: string;
    latex: string;
    constants: ApparentConstantJson[];
  };
}

/** One apparent constant: its name, meaning, definition in elementary constants, unit and value. */
export interface ApparentConstantJson {
  name: string;
  latex: string;
  meaning: string;
  definition_text: string;
  definition_latex: string;
  /** the same in the other named constants, where that reads better (K_M^app = K_M(1 + [I]/K_i)) */
  relation_text?: string;
  relation_latex?: string;
  /** in M and s; empty when dimensionless */
  unit: string;
  unit_latex: string;
  /** where every elementary constant of the definition is given */
  value?: number;
}

/** One term of a normalised law; a factor's leading 1 has no constant. */
export interface NormalisedTermJson {
  constant?: string;
  power: number | string;
  sign: 1 | -1;
  factors: Record<string, number | string>;
}

/** A root symbol of a law with radicals: the one positive root of a polynomial in it, and its closed form. */
export interface RootJson {
  /** the symbol as it appears in the structure's terms, e.g. `ρ_1` */
  symbol: string;
  /** the polynomial (in the symbol, constants and concentrations) whose one positive root it is */
  polynomial: TermJson[];
  /** the root written out, plain text and LaTeX */
  closed_form: string;
  closed_form_latex: string;
}

export interface TermJson {
  coefficient: number | string;
  /** symbol → exponent, e.g. {"k_2": 1, "[O3]": 2, "[O2]": "1/2"} */
  factors: Record<string, number | string>;
}

export interface ObservationJson {
  id: string;
  species: string;
  method: string;
  observed: number;
  tolerance: number;
  /** the order at the observation's conditions, or the one the law fixes whatever the constants */
  predicted?: number;
  /** where the order depends on unknown constants: every order the law allows at these conditions */
  range?: [number, number];
  /** the limiting orders as [X] → 0 and [X] → ∞, where they differ (they do not bound the order) */
  limits?: [number, number];
  basis: string;
  /** pass, fail, not_excluded (allowed for some constants, which are unknown) or unknown (no prediction) */
  status: string;
  /** why there is no prediction, or why it stays open */
  reason?: string;
}

/** How many observation checks had each verdict. */
export interface VerdictCounts {
  pass: number;
  fail: number;
  /** allowed for some constants, which are unknown */
  not_excluded: number;
  /** no prediction */
  unknown: number;
}

/** The whole report: the tool, a summary and one entry per record. */
export interface CatalogueReport {
  tool: { name: 'mechatlas'; version: string };
  summary: {
    records: number;
    errors: number;
    warnings: number;
    notes: number;
    /** the checks of each record's primary rate law, counted by verdict */
    observations?: VerdictCounts;
  };
  records: RecordReport[];
}
