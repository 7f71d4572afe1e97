/**
 * The JSON report of one record (DESIGN.md "Contracts"): snake_case keys, additive only.
 * Pure: built from a loaded record and its derivation; the CLI and the site both use it.
 */
import type { Diagnostic } from '../../model/diagnostic.ts';
import type { Derivation } from '../../engine/derive.ts';
import { formatText, type Polynomial } from '../../engine/exact/index.ts';
import type { ObservationCheck } from '../../engine/observations/judge-order.ts';
import type { DerivedRateLaw } from '../../engine/rate-law/derive-rate-laws.ts';
import type { Rational } from '../../engine/exact/rational.ts';
import type { SimulationCheck } from '../../engine/simulation/approximation-validity.ts';
import type { EnergyResult } from '../../engine/energy/index.ts';

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
  overall?: { reactants: Record<string, number | string>; products: Record<string, number | string>; catalysts: string[]; text: string };
  stoichiometric_numbers?: number[];
  stoichiometric_numbers_source?: 'given' | 'derived';
  roles?: Record<string, string>;
  buffered?: string[];
  rate_laws?: RateLawJson[];
  observations?: ObservationJson[];
  simulation?: SimulationJson[];
  /** the energy profile and energetic span, where every route step records its energies */
  energy?: EnergyResult;
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
  /** the rate law as data: terms of numerator and denominator, each a coefficient and symbol exponents */
  structure?: { numerator: TermJson[]; denominator: TermJson[] };
  /** limits of the apparent order as [X] → 0 (low) and [X] → ∞ (high) */
  orders: Record<string, { low: number | string; high: number | string }>;
  /** solvents whose constant concentration is absorbed into the constants */
  absorbed?: string[];
  /** the conserved catalysts' forms, for the resting state */
  catalyst_balances?: { catalyst: string; total: string; forms: { species: string; fraction: string; fraction_latex: string }[] }[];
  /** the dominant catalyst form at each observation's conditions */
  resting_states?: { observation: string; catalyst: string; species: string; fraction: number }[];
  numeric_only?: boolean;
  derivation: { say: string; text: string; latex: string }[];
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

export interface RecordInput {
  id: string;
  file: string;
  record?: { title: string; system: string; status: string };
  derivation?: Derivation;
  /** every diagnostic of the record, placed (file, line, column) */
  diagnostics: readonly Diagnostic[];
}

/** Builds the report object of one record. */
export function recordReport(input: RecordInput): RecordReport {
  const { record, derivation } = input;
  const out: RecordReport = { id: input.id, file: input.file, diagnostics: input.diagnostics.map(diagnosticJson) };
  if (record) Object.assign(out, { title: record.title, system: record.system, status: record.status });
  if (derivation?.overall) {
    const { overall } = derivation;
    out.overall = { reactants: coefficients(overall.reactants), products: coefficients(overall.products), catalysts: overall.catalysts, text: overall.text };
  }
  if (derivation?.stoichiometricNumbers) {
    out.stoichiometric_numbers = derivation.stoichiometricNumbers;
    if (derivation.routeSource) out.stoichiometric_numbers_source = derivation.routeSource;
  }
  if (derivation?.roles) out.roles = Object.fromEntries(derivation.roles);
  if (derivation && derivation.buffered.length > 0) out.buffered = derivation.buffered;
  if (derivation?.rateLaws) out.rate_laws = derivation.rateLaws.map(rateLawJson);
  if (derivation?.observations) out.observations = derivation.observations.map(observationJson);
  if (derivation?.simulation) out.simulation = derivation.simulation.map(simulationJson);
  if (derivation?.energy && !derivation.energy.schematic) out.energy = derivation.energy;
  if (derivation?.constantsFromEnergies?.length) out.constants_from_energies = derivation.constantsFromEnergies;
  // Keep the documented key order: diagnostics last.
  const { diagnostics, ...rest } = out;
  return { ...rest, diagnostics };
}

/** A diagnostic in the report's snake_case shape. */
export function diagnosticJson(d: Diagnostic): DiagnosticJson {
  const out: DiagnosticJson = { rule: d.rule, severity: d.severity, message: d.message };
  if (d.file !== undefined) out.file = d.file;
  if (d.line !== undefined) out.line = d.line;
  if (d.column !== undefined) out.column = d.column;
  if (d.endLine !== undefined) out.end_line = d.endLine;
  if (d.endColumn !== undefined) out.end_column = d.endColumn;
  if (d.note !== undefined) out.note = d.note;
  return out;
}

/** A derived rate law in the report's shape. */
export function rateLawJson(derived: DerivedRateLaw): RateLawJson {
  const { law, presented } = derived;
  const out: RateLawJson = {
    method: law.method,
    orders: Object.fromEntries([...derived.orders].map(([sp, o]) => [sp, { low: o.low.toJSON(), high: o.high.toJSON() }])),
    derivation: [...law.trace, ...(presented?.trace ?? [])],
  };
  if (presented) {
    Object.assign(out, { text: presented.text, latex: presented.latex });
    out.structure = { numerator: termsJson(presented.expression.numerator), denominator: termsJson(presented.expression.denominator) };
  }
  if (presented?.grouped) {
    const g = presented.grouped;
    out.grouped = { name: g.name, value_text: g.valueText, value_latex: g.valueLatex, text: g.text, latex: g.latex };
  }
  if (law.absorbed.length > 0) out.absorbed = law.absorbed;
  if (law.catalystBalances.length > 0) {
    out.catalyst_balances = law.catalystBalances.map((b) => ({ catalyst: b.catalyst, total: b.total, forms: b.forms.map((f) => ({ species: f.species, fraction: f.text, fraction_latex: f.latex })) }));
  }
  if (derived.restingStates.length > 0) out.resting_states = derived.restingStates;
  if (!law.expression) out.numeric_only = true;
  return out;
}

function termsJson(p: Polynomial): TermJson[] {
  return p.terms.map((t) => ({ coefficient: t.coefficient.toJSON(), factors: Object.fromEntries(t.monomial.factors.map(([symbol, e]) => [symbol, e.toJSON()])) }));
}

function observationJson(check: ObservationCheck): ObservationJson {
  const out: ObservationJson = { id: check.observation, species: check.species, method: check.method, observed: check.observed, tolerance: check.tolerance, basis: check.basis, status: check.status };
  if (check.predicted !== undefined) out.predicted = check.predicted;
  if (check.range) out.range = check.range;
  return out;
}

function simulationJson(check: SimulationCheck): SimulationJson {
  const out: SimulationJson = { observation: check.observation, status: check.status, orders: check.orders, approximation_error: check.approximationError };
  if (check.message !== undefined) out.message = check.message;
  if (check.initialRate !== undefined) out.initial_rate = Number(check.initialRate.toPrecision(6));
  if (check.time !== undefined) out.time_s = Number(check.time.toPrecision(4));
  return out;
}

function coefficients(m: ReadonlyMap<string, Rational>): Record<string, number | string> {
  return Object.fromEntries([...m].map(([sp, c]) => [sp, c.toJSON()]));
}
