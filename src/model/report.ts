/**
 * The JSON report (DESIGN.md "Contracts"): what `check --format json` prints and the site's API
 * serves. snake_case keys; changed only additively. Plain data: no engine types.
 */
import type { EnergyJson } from './energy-report.ts';

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
  buffered?: string[];
  rate_laws?: RateLawJson[];
  observations?: ObservationJson[];
  simulation?: SimulationJson[];
  /** the energy profile and energetic span, where every route step records its energies */
  energy?: EnergyJson;
  /** labels of steps whose rate constants come from their energies (Eyring) */
  constants_from_energies?: string[];
  diagnostics: DiagnosticJson[];
}

export interface SimulationJson {
  observation: string;
  status: string;
  message?: string;
  /** rate of the overall reaction at 1 % conversion, M s^-1 */
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
  grouped?: { name: string; value_text: string; value_latex: string; text: string; latex: string };
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
  predicted?: number;
  range?: [number, number];
  basis: string;
  status: string;
}

/** The whole report: the tool, a summary and one entry per record. */
export interface CatalogueReport {
  tool: { name: 'mechatlas'; version: string };
  summary: { records: number; errors: number; warnings: number; notes: number };
  records: RecordReport[];
}
